import { describe, expect, it } from 'vitest';
import { aggregateFigures } from './aggregate.ts';

const a = { bodyAccelWkRms: 0.4, tyreLoadRatio: 0.1, tyreLoadMin: 1500, strokeUsed: 0.5 };
const b = { bodyAccelWkRms: 0.8, tyreLoadRatio: 0.3, tyreLoadMin: 900 };

describe('aggregateFigures', () => {
  it('averages each figure over the runs', () => {
    const m = aggregateFigures([a, b], 'mean');
    expect(m.bodyAccelWkRms).toBeCloseTo(0.6, 12);
    expect(m.tyreLoadRatio).toBeCloseTo(0.2, 12);
    expect(m.tyreLoadMin).toBe(1200);
  });

  it('takes the worst by each figure’s sense: highest, but lowest for minimum tyre load', () => {
    expect(aggregateFigures([a, b], 'worst')).toEqual({ bodyAccelWkRms: 0.8, tyreLoadRatio: 0.3, tyreLoadMin: 900 });
  });

  it('drops a figure some run lacks, and gives nothing for no runs', () => {
    expect(aggregateFigures([a, b], 'mean').strokeUsed).toBeUndefined();
    expect(aggregateFigures([a], 'mean').strokeUsed).toBe(0.5);
    expect(aggregateFigures([], 'worst')).toEqual({});
  });
});
