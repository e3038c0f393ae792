import type { TargetPoint } from '../../../../shared/schemas/target-sheet.ts';
import { toleranceBand } from '../../../../shared/target-sheet/band.ts';

/** One speed of one direction, in the sheet in force and in its replacement (either may lack it). */
export interface PointDifference {
  velocity: number;
  before: { force: number; lower: number; upper: number; tolPct: number; floorN: number } | null;
  after: { force: number; lower: number; upper: number; tolPct: number; floorN: number } | null;
  /** 100·(after − before)/before for the target force; null when either side lacks the speed or before is 0. */
  forceChangePct: number | null;
  /** Anything differs at this speed: target, band, or the speed itself is new or dropped. */
  changed: boolean;
}

const side = (p: TargetPoint | undefined) => {
  if (!p) return null;
  const b = toleranceBand(p);
  return { force: p.force, lower: b.lower, upper: b.upper, tolPct: p.tolPct, floorN: p.floorN };
};

/** The two sheets' points of one direction side by side, every speed of either, slowest first. */
export function directionDifference(before: readonly TargetPoint[], after: readonly TargetPoint[]): PointDifference[] {
  const speeds = [...new Set([...before, ...after].map((p) => p.velocity))].sort((a, b) => a - b);
  return speeds.map((velocity) => {
    const b = before.find((p) => p.velocity === velocity);
    const a = after.find((p) => p.velocity === velocity);
    const changed = !a || !b || a.force !== b.force || a.tolPct !== b.tolPct || a.floorN !== b.floorN;
    return { velocity, before: side(b), after: side(a), forceChangePct: a && b && b.force !== 0 ? (100 * (a.force - b.force)) / b.force : null, changed };
  });
}
