import type { z } from 'zod';
import { Setup } from '../../../../shared/schemas/setup.ts';
import { units } from '../../../lib/format.ts';
import type { ChosenUnits } from '../../../lib/units/unit-table.ts';
import { type IssueSubject, plainIssue, type Problem } from '../../../lib/plain-issue.ts';
import { describePath } from './setup-diff.ts';

/** Names for the paths that are not a single number (whole tables, groups). */
const groupLabels: Record<string, string> = {
  damper: 'Damper',
  'damper.compression': 'Compression table',
  'damper.rebound': 'Rebound table',
  'damper.gas': 'Gas charge',
  bumpStop: 'Bump stop',
  reboundStop: 'Rebound stop',
  'bumpStop.law.points': 'Bump stop table',
  'reboundStop.law.points': 'Rebound stop table',
  'bumpStop.law.coefficients': 'Bump stop coefficients',
  'reboundStop.law.coefficients': 'Rebound stop coefficients',
  stroke: 'Stroke',
  '': 'The setup',
};

const cellAt = (values: unknown, path: (string | number)[]): unknown =>
  path.reduce<unknown>((v, k) => (v !== null && typeof v === 'object' ? (v as Record<string | number, unknown>)[k] : undefined), values);

/** What an issue at `path` is about; damper cells are named by their speed ("Rebound force at 0.52 m/s"). */
function subjectOf(path: (string | number)[], values: unknown, u?: ChosenUnits): IssueSubject {
  const dotted = path.map(String).join('.');
  const m = /^damper\.(compression|rebound)\.(\d+)\.([01])$/.exec(dotted);
  if (m) {
    const direction = m[1] === 'compression' ? 'Compression' : 'Rebound';
    const speed = cellAt(values, ['damper', m[1], Number(m[2]), 0]);
    const vu = u?.damperVelocity ?? units.mps;
    const at = typeof speed === 'number' && Number.isFinite(speed) && m[3] === '1' ? ` at ${Number(vu.fromSI(speed).toPrecision(4))} ${vu.symbol}` : `, point ${Number(m[2]) + 1}`;
    return m[3] === '0' ? { label: `${direction} speed${at}`, unit: vu } : { label: `${direction} force${at}`, unit: units.N };
  }
  if (groupLabels[dotted] !== undefined) return { label: groupLabels[dotted] };
  const described = describePath(dotted, u);
  return { label: described.label === dotted ? 'A value' : described.label, unit: described.unit };
}

/** The message of one issue of the setup schema, in words, for the draft `values`, in the person's units `u`. */
export function setupIssueMessage(issue: z.core.$ZodIssue, values: unknown, u?: ChosenUnits): string {
  return plainIssue(issue, subjectOf(issue.path as (string | number)[], values, u));
}

/** Everything wrong with a draft, in page words; empty when it is a valid setup. */
export function setupProblems(values: unknown, u?: ChosenUnits): Problem[] {
  const parsed = Setup.safeParse(values);
  if (parsed.success) return [];
  return parsed.error.issues.map((issue) => {
    const path = issue.path.map(String).join('.');
    return { path, label: subjectOf(issue.path as (string | number)[], values, u).label, message: setupIssueMessage(issue, values, u) };
  });
}
