import { describe, expect, it } from 'vitest';
import { TargetSheetContent } from '../../../../shared/schemas/target-sheet.ts';
import { unitTable } from '../../../lib/units/unit-table.ts';
import { nextSpeedShown, sheetContentShown, sheetContentToSI, sheetIssueMessage } from './sheet-units.ts';

const content: TargetSheetContent = {
  compression: [
    { velocity: 0.05, force: 180, tolPct: 10, floorN: 20 },
    { velocity: 0.26, force: 640, tolPct: 10, floorN: 20 },
  ],
  rebound: [{ velocity: 0.1, force: 900, tolPct: 12, floorN: 25 }],
  gasForce: 150,
  notes: '',
};
const mmps = unitTable.damperVelocity['mm/s'];
const inps = unitTable.damperVelocity['in/s'];

describe('target sheet speeds in the chosen unit', () => {
  it('shows speeds in mm/s (×1000) and in/s (÷0.0254 m, NIST SP 811) and leaves forces, tolerances and the gas force alone', () => {
    const shown = sheetContentShown(content, mmps);
    expect(shown.compression.map((p) => p.velocity)).toEqual([50, 260]);
    expect(shown.rebound[0]).toEqual({ velocity: 100, force: 900, tolPct: 12, floorN: 25 });
    expect(shown.gasForce).toBe(150);
    // 0.05 m / 0.0254 m = 1.968503… in, six figures in a cell
    expect(sheetContentShown(content, inps).compression[0].velocity).toBe(1.9685);
  });

  it('reads the shown figures back as the exact SI speeds they came from, and a typed one by its unit', () => {
    expect(sheetContentToSI(sheetContentShown(content, inps), inps)).toEqual(content);
    expect(sheetContentToSI(sheetContentShown(content, mmps), mmps)).toEqual(content);
    const typed = sheetContentToSI({ ...content, rebound: [{ velocity: 4, force: 900, tolPct: 12, floorN: 25 }] }, inps);
    expect(typed.rebound[0].velocity).toBeCloseTo(0.1016, 12);
  });

  it('offers half as fast again for a new row, rounded as typed in the shown unit', () => {
    expect(nextSpeedShown(260, mmps)).toBe(390);
    expect(nextSpeedShown(1.9685, inps)).toBe(2.95);
    expect(nextSpeedShown(undefined, mmps)).toBe(100);
  });

  it('says a bad speed in plain words with the shown unit, and a speed out of order without SI figures', () => {
    const zero = TargetSheetContent.safeParse(sheetContentToSI({ ...content, compression: [{ ...content.compression[0], velocity: 0 }] }, mmps));
    expect(zero.success).toBe(false);
    expect(sheetIssueMessage(zero.error!.issues[0]!, mmps)).toBe('Compression point 1: speed must be above 0 mm/s');
    const order = TargetSheetContent.safeParse(sheetContentToSI({ ...content, compression: [...content.compression].reverse() }, mmps));
    expect(sheetIssueMessage(order.error!.issues[0]!, mmps)).toBe('Compression point 2: speeds must rise from point to point');
    // the schema's limit of 20 m/s said in in/s: 20 / 0.0254 = 787.4
    const fast = TargetSheetContent.safeParse({ ...content, rebound: [{ ...content.rebound[0], velocity: 21 }] });
    expect(sheetIssueMessage(fast.error!.issues[0]!, inps)).toBe('Rebound point 1: speed must be 787.4 in/s or less');
  });
});
