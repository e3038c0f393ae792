import { summariseDyno } from '../../shared/dyno-upload/summarise-dyno.ts';
import type { FieldIssue } from '../../shared/errors.ts';
import type { DynoParseOptions } from '../../shared/schemas/dyno.ts';
import type { DynoCheckFields, MeasuredDamper } from '../../shared/schemas/target-sheet.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';

// Pure: runs in the server's worker threads (server/jobs/heavy-tasks.ts) for uploads, and inline
// for the demo seed.

/** One uploaded file, as the upload middleware hands it over. */
export interface UploadedText {
  text: string;
  filename: string;
  bytes: number;
}

/** A file name without folders or its extension: the default label of the damper it measured. */
export function labelFromFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? name;
  return (base.replace(/\.[A-Za-z0-9]{1,5}$/, '').trim() || base).slice(0, 120);
}

/** The files of an upload read as measured dampers, or the reasons they cannot be. */
export function readCheckFiles(files: UploadedText[], fields: DynoCheckFields): Outcome<{ measured: MeasuredDamper[]; options: Partial<DynoParseOptions> }> {
  if (files.length === 0) return fail('bad_request', 'Choose at least one dyno file.', [{ path: 'file', message: 'Required' }]);
  const { label: labels, fileVelocityUnit = [], fileForceUnit = [], fileSign = [], ...given } = fields;
  const options = Object.fromEntries(Object.entries(given).filter(([, v]) => v !== undefined)) as Partial<DynoParseOptions>;
  // a file's own settings win over the batch-wide ones
  const optionsOf = (i: number): Partial<DynoParseOptions> => ({
    ...options,
    ...(fileVelocityUnit[i] ? { velocityUnit: fileVelocityUnit[i] } : {}),
    ...(fileForceUnit[i] ? { forceUnit: fileForceUnit[i] } : {}),
    ...(fileSign[i] ? { forceSign: fileSign[i], motionSign: fileSign[i] } : {}),
  });
  const problems: { file: string; line?: number; message: string }[] = [];
  const measured: MeasuredDamper[] = [];
  files.forEach((file, i) => {
    const read = summariseDyno(file.text, optionsOf(i));
    if (!read.ok) {
      for (const e of read.errors) problems.push({ file: file.filename, line: e.line, message: e.message });
      return;
    }
    const warnings = [...read.summary.warnings.map((w) => (w.line !== undefined ? `line ${w.line}: ${w.message}` : w.message)), ...(read.summary.series?.warnings ?? [])];
    measured.push({ label: labels[i]?.trim() || labelFromFileName(file.filename), fileName: file.filename, peaks: read.summary.peaks, warnings, units: read.summary.units });
  });
  if (problems.length) {
    const where = (p: (typeof problems)[number]) => `${p.file}${p.line !== undefined ? `, line ${p.line}` : ''}`;
    const fieldIssues: FieldIssue[] = problems.map((p) => ({ path: p.line !== undefined ? `line ${p.line}` : 'file', message: `${where(p)}: ${p.message}` }));
    return fail('bad_request', `Nothing was saved: ${where(problems[0])}: ${problems[0].message}`, fieldIssues);
  }
  const seen = new Set<string>();
  for (const m of measured) {
    if (seen.has(m.label)) return fail('bad_request', `Two dampers are labelled "${m.label}"; give each its own label. Nothing was saved.`, [{ path: 'label', message: `"${m.label}" twice` }]);
    seen.add(m.label);
  }
  return ok({ measured, options });
}

/** The files of a check as kept with it: JSON of `{ label, filename, text }` in upload order. */
export function checkContentJson(files: UploadedText[], measured: MeasuredDamper[]): string {
  return JSON.stringify(files.map((f, i) => ({ label: measured[i].label, filename: f.filename, text: f.text })));
}
