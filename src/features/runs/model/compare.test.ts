import { describe, expect, it } from 'vitest';
import { differenceText, entriesFromParams, entriesToParams } from './compare.ts';
import { rowByKey } from './figure-rows.ts';

describe('compare helpers', () => {
  it('round-trips entries through the address', () => {
    const entries = [
      { kind: 'setup', setupId: 'a', revision: 3 },
      { kind: 'saved', runId: 'r1' },
    ] as const;
    expect(entriesFromParams(entriesToParams([...entries]))).toEqual(entries);
    expect(entriesFromParams(new URLSearchParams('s=a:0&s=b:x&s=c:2'))).toEqual([{ kind: 'setup', setupId: 'c', revision: 2 }]);
  });

  it('writes differences in the row’s display unit, signed, with the relative change', () => {
    expect(differenceText(rowByKey('aw'), 0.8, 0.9)).toEqual({ abs: '+0.10\u2009m/s²', rel: '+12 %' });
    expect(differenceText(rowByKey('travelRms'), 0.01, 0.0085)).toEqual({ abs: '\u22121.5\u2009mm', rel: '\u221215 %' });
    // a share's difference is in percentage points
    expect(differenceText(rowByKey('loadRatio'), 0.2, 0.25)?.abs).toBe('+5.0\u2009pt');
    expect(differenceText(rowByKey('aw'), 0, 0.2)?.rel).toBeNull();
  });
});
