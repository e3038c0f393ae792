import { roadLabel } from '../../../../shared/runs/road-label.ts';
import { formatQuantityText, formatSig } from '../../../lib/format.ts';
import { displayUnitOf, type FigureRow } from './figure-rows.ts';
import type { ChosenUnits } from '../../../lib/units/unit-table.ts';
import type { RunView } from './run-view.ts';

/** What can be put side by side: a setup revision run here, or a saved run. */
export type CompareEntry = { kind: 'setup'; setupId: string; revision: number } | { kind: 'saved'; runId: string };

export const MAX_COMPARED = 4;

export const entryKey = (e: CompareEntry) => (e.kind === 'setup' ? `s:${e.setupId}:${e.revision}` : `r:${e.runId}`);

/** `?s=<setupId>:<rev>&run=<runId>` ↔ entries, so a comparison can be linked and reloaded. */
export function entriesFromParams(params: URLSearchParams): CompareEntry[] {
  const out: CompareEntry[] = [];
  for (const s of params.getAll('s')) {
    const [setupId, rev] = s.split(':');
    if (setupId && Number.isInteger(Number(rev)) && Number(rev) > 0) out.push({ kind: 'setup', setupId, revision: Number(rev) });
  }
  for (const runId of params.getAll('run')) if (runId) out.push({ kind: 'saved', runId });
  return out.slice(0, MAX_COMPARED);
}

export function entriesToParams(entries: CompareEntry[]): URLSearchParams {
  const params = new URLSearchParams();
  for (const e of entries) if (e.kind === 'setup') params.append('s', `${e.setupId}:${e.revision}`);
  for (const e of entries) if (e.kind === 'saved') params.append('run', e.runId);
  return params;
}

/** One compared run: its label, its colour slot (fixed for the page) and what it shows. */
export interface ComparedRun {
  key: string;
  label: string;
  slot: number;
  view: RunView;
}

/**
 * Notes when the runs were not driven alike (saved runs keep their own road and speed): the
 * figures then differ for more reasons than the setup.
 */
export function likeForLikeNotes(runs: ComparedRun[]): string[] {
  if (runs.length < 2) return [];
  const notes: string[] = [];
  const roads = new Set(runs.map((r) => JSON.stringify([r.view.road, r.view.seed ?? null])));
  if (roads.size > 1) notes.push(`different roads (${[...new Set(runs.map((r) => roadLabel(r.view.road, r.view.seed)))].join('; ')})`);
  const speeds = new Set(runs.map((r) => r.view.result.speed));
  if (speeds.size > 1) notes.push(`different speeds (${[...speeds].map((s) => formatQuantityText(s, 'kmph')).join(', ')})`);
  const durations = new Set(runs.map((r) => r.view.result.duration));
  if (durations.size > 1) notes.push(`different durations (${[...durations].map((d) => formatQuantityText(d, 's')).join(', ')})`);
  return notes;
}

/**
 * The difference of `value` against the first run's, in the row's display unit, signed
 * ("+0.042", "−3.1"), and relative when the first is not zero ("+5.2 %"). Null for the first run.
 */
export function differenceText(row: FigureRow, first: number | undefined, value: number | undefined, chosen?: ChosenUnits): { abs: string; rel: string | null } | null {
  if (first === undefined || value === undefined) return null;
  const u = displayUnitOf(row, chosen);
  const d = u ? u.fromSI(value) - u.fromSI(first) : value - first;
  const sign = d > 0 ? '+' : '';
  const abs = `${sign}${formatSig(d, 2)}${u?.symbol ? `\u2009${u.symbol === '%' ? 'pt' : u.symbol}` : ''}`;
  const rel = first !== 0 ? `${(100 * (value - first)) / Math.abs(first) > 0 ? '+' : ''}${formatSig((100 * (value - first)) / Math.abs(first), 2)} %` : null;
  return { abs, rel };
}
