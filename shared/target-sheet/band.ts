import type { TargetPoint } from '../schemas/target-sheet.ts';

export interface Band {
  /** N */
  lower: number;
  /** N */
  upper: number;
  /** max(tolPct·|force|/100, floorN), N. */
  halfWidth: number;
  /** True when the floor, not the percentage, sets the width. */
  floorGoverns: boolean;
}

/**
 * Tolerance band of a reference point: force ± max(tolPct·|force|/100, floorN). The lower edge is
 * not clipped at 0, so a floor wider than a small target shows honestly.
 */
export function toleranceBand(p: Pick<TargetPoint, 'force' | 'tolPct' | 'floorN'>): Band {
  // tolPct·|F| before dividing by 100 keeps round numbers exact (10·1000/100 = 100, not 100.000…01).
  const pct = (p.tolPct * Math.abs(p.force)) / 100;
  const halfWidth = Math.max(pct, p.floorN);
  return { lower: p.force - halfWidth, upper: p.force + halfWidth, halfWidth, floorGoverns: p.floorN > pct };
}

/**
 * True when `measured` lies inside the band, edges included. A relative slack of 1e-12 on the
 * half-width absorbs rounding in values typed or computed to sit exactly on an edge.
 */
export function withinBand(band: Band, measured: number): boolean {
  const slack = 1e-12 * Math.max(1, band.halfWidth, Math.abs(band.upper));
  return measured >= band.lower - slack && measured <= band.upper + slack;
}
