import { describe, expect, it } from 'vitest';
import { gridEdges } from './grid-edge.ts';

const rebound = { parameter: 'reboundScale' as const, from: 0.7, to: 1.6, steps: 4, spacing: 'linear' as const };
const spring = { parameter: 'springRate' as const, from: 26000, to: 38000, steps: 4, spacing: 'linear' as const };

describe('best point on the edge of the grid', () => {
  it('at the highest value tried: says so and to widen upward', () => {
    const edges = gridEdges([rebound, spring], { reboundScale: 1.6, springRate: 30000 });
    expect(edges).toHaveLength(1);
    expect(edges[0]).toMatchObject({ parameter: 'reboundScale', side: 'highest' });
    expect(edges[0].sentence).toBe('Best point at the highest rebound scale tried (rebound ×1.60) — widen the range upward.');
  });

  it('at the lowest value of a falling sweep: lowest is by value, not by the end given first', () => {
    const falling = { ...spring, from: 38000, to: 26000 };
    const edges = gridEdges([rebound, falling], { reboundScale: 1.0, springRate: 26000 });
    expect(edges.map((e) => [e.parameter, e.side])).toEqual([['springRate', 'lowest']]);
    expect(edges[0].sentence).toMatch(/widen the range downward\.$/);
  });

  it('on a corner of the grid: both axes named', () => {
    expect(gridEdges([rebound, spring], { reboundScale: 0.7, springRate: 38000 }).map((e) => e.side)).toEqual(['lowest', 'highest']);
  });

  it('inside the grid, a single-value axis, or a swept speed: nothing to say', () => {
    expect(gridEdges([rebound, spring], { reboundScale: 1.0, springRate: 30000 })).toEqual([]);
    expect(gridEdges([{ ...rebound, steps: 1 }], { reboundScale: 0.7 })).toEqual([]);
    expect(gridEdges([{ parameter: 'speed', from: 10, to: 30, steps: 3, spacing: 'linear' }], { speed: 30 })).toEqual([]);
  });

  it('uses the caller’s format for the value', () => {
    const [edge] = gridEdges([spring], { springRate: 38000 }, { springRate: (x) => `${x / 1000} N/mm` });
    expect(edge.sentence).toContain('(38 N/mm)');
  });
});
