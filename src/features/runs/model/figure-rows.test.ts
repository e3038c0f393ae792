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

  it('names a best only when it beats the runner-up by more than 1 %', () => {
    // a 0.15 % difference is no winner; 1.5 % is
    expect(bestIndex(rowByKey('aw'), [1.0, 0.9985])).toBeNull();
    expect(bestIndex(rowByKey('aw'), [1.0, 0.985])).toBe(1);
    // the margin is measured against the runner-up, not the worst run
    expect(bestIndex(rowByKey('aw'), [0.9, 0.999, 0.995])).toBe(0);
    expect(bestIndex(rowByKey('aw'), [1.2, 0.999, 0.995])).toBeNull();
    expect(bestIndex(rowByKey('loadMin'), [1500, 1490, 1200])).toBeNull();
    expect(bestIndex(rowByKey('loadMin'), [1500, 1480, 1200])).toBe(0);
  });
});
