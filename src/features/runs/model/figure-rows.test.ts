import { describe, expect, it } from 'vitest';
import { bestIndex, figureRows, rowByKey } from './figure-rows.ts';

describe('figure rows', () => {
  it('rank comfort figures and tyre-load variation lower-is-better, minimum load higher-is-better, modes not at all', () => {
    for (const key of ['aw', 'vdv', 'accelRms', 'accelPeak', 'loadRatio', 'loadRms', 'liftOff']) expect(rowByKey(key).better).toBe('lower');
    expect(rowByKey('loadMin').better).toBe('higher');
    for (const row of figureRows.filter((r) => r.group === 'modal')) expect(row.better).toBe('unranked');
  });

  it('marks the best run by the row’s rule', () => {
    expect(bestIndex(rowByKey('aw'), [0.9, 0.7, 0.8])).toBe(1);
    expect(bestIndex(rowByKey('loadMin'), [1200, 1500, undefined])).toBe(1);
  });

  it('marks nothing when the values read the same at the shown precision, or the row is unranked', () => {
    expect(bestIndex(rowByKey('aw'), [0.70001, 0.70002])).toBeNull();
    expect(bestIndex(rowByKey('bodyHz'), [1.1, 1.3])).toBeNull();
    expect(bestIndex(rowByKey('aw'), [0.5])).toBeNull();
  });
});
