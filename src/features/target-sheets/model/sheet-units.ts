import type { TargetPoint, TargetSheetContent } from '../../../../shared/schemas/target-sheet.ts';
import type { z } from 'zod';
import { type DisplayUnit, units } from '../../../lib/format.ts';
import { plainIssue } from '../../../lib/plain-issue.ts';
import { siFromShown } from '../../../lib/units/unit-table.ts';

/**
 * A sheet's editable body in the piston-speed unit a person reads, and back. Only the speeds
 * change: forces, tolerances and floors stay in N and %, and what is saved is SI (m/s).
 */

/** Six figures, as a field shows them: no float noise from the conversion reaches the cells. */
const shown = (unit: DisplayUnit, si: number) => Number(unit.fromSI(si).toPrecision(6));

const mapSpeeds = (content: TargetSheetContent, f: (v: number) => number): TargetSheetContent => {
  const each = (points: readonly TargetPoint[]) => points.map((p) => ({ ...p, velocity: Number.isFinite(p.velocity) ? f(p.velocity) : p.velocity }));
  return { ...content, compression: each(content.compression), rebound: each(content.rebound) };
};

export const sheetContentShown = (content: TargetSheetContent, unit: DisplayUnit): TargetSheetContent => mapSpeeds(content, (v) => shown(unit, v));

/** Typed speeds back to SI: a shown figure left as it was returns the exact speed it came from. */
export const sheetContentToSI = (content: TargetSheetContent, unit: DisplayUnit): TargetSheetContent => mapSpeeds(content, (v) => siFromShown(unit, v));

/**
 * The next speed a new row offers: half as fast again as the last, rounded to what a person
 * would type in the unit shown (three figures), or a round starting value when there is none.
 */
export function nextSpeedShown(lastShown: number | undefined, unit: DisplayUnit): number {
  if (lastShown === undefined || !Number.isFinite(lastShown) || lastShown <= 0) return shown(unit, 0.1);
  return Number((lastShown * 1.5).toPrecision(3));
}

const fieldWords: Record<string, string> = { velocity: 'speed', force: 'target force', tolPct: 'tolerance', floorN: 'floor' };

/**
 * One validation issue of a sheet's body in plain words, bounds in the unit the field shows
 * ("Compression point 2: speed must be above 0 mm/s"). A speed out of order is said without the
 * schema's SI figures, which the person did not type.
 */
export function sheetIssueMessage(issue: z.core.$ZodIssue, speedUnit: DisplayUnit): string {
  const [direction, index, field] = issue.path.map(String);
  if (direction === 'gasForce') return plainIssue(issue, { label: 'Gas force', unit: units.N });
  if (direction === 'notes') return plainIssue(issue, { label: 'Notes' });
  const side = direction === 'rebound' ? 'Rebound' : 'Compression';
  if (index === undefined) return plainIssue(issue, { label: `${side} targets` });
  const where = `${side} point ${Number(index) + 1}`;
  if (field === 'velocity' && issue.code === 'custom') return `${where}: speeds must rise from point to point`;
  const unit = field === 'velocity' ? speedUnit : field === 'force' || field === 'floorN' ? units.N : undefined;
  const text = plainIssue(issue, { label: fieldWords[field ?? ''] ?? 'value', unit });
  return `${where}: ${field === 'tolPct' && /\d$/.test(text) ? `${text} %` : text}`;
}
