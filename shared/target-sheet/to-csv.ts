import { commentText, writeCsv } from '../csv/write-csv.ts';
import type { ConformityReport, TargetSheet, TargetSheetContent } from '../schemas/target-sheet.ts';
import { toleranceBand } from './band.ts';

type SheetForCsv = Pick<TargetSheetContent, 'compression' | 'rebound' | 'gasForce'> &
  Partial<Pick<TargetSheet, 'number' | 'setupName' | 'setupRevision' | 'status'>>;

const round = (x: number, digits: number) => Number(x.toFixed(digits));

/**
 * The target table as CSV, one row per direction and speed, SI units named in the header:
 * `direction,velocity [m/s],target force [N],tolerance [%],floor [N],lower [N],upper [N]`.
 * With `preamble` (default true) `#` lines first give the sheet number, setup and revision,
 * status and gas force; `parseDynoCsv` and most tools skip or show them as text.
 */
export function targetSheetToCsv(sheet: SheetForCsv, opts: { preamble?: boolean } = {}): string {
  const rows: (string | number)[][] = [];
  for (const direction of ['compression', 'rebound'] as const) {
    for (const p of sheet[direction]) {
      const b = toleranceBand(p);
      rows.push([direction, p.velocity, round(p.force, 3), p.tolPct, p.floorN, round(b.lower, 3), round(b.upper, 3)]);
    }
  }
  const table = writeCsv(rows, ['direction', 'velocity [m/s]', 'target force [N]', 'tolerance [%]', 'floor [N]', 'lower [N]', 'upper [N]']);
  if (opts.preamble === false) return `${table}\n`;
  const head = [
    sheet.number && `# damper target sheet ${commentText(sheet.number)}`,
    sheet.setupName && `# setup ${commentText(sheet.setupName)}${sheet.setupRevision ? `, revision ${sheet.setupRevision}` : ''}`,
    sheet.status && `# status ${sheet.status.replace('_', ' ')}`,
    `# gas force ${round(sheet.gasForce, 3)} N (not included in the target forces)`,
  ].filter(Boolean);
  return `${head.join('\n')}\n${table}\n`;
}

/** A conformity report as CSV, one row per damper, direction and reference speed. */
export function conformityToCsv(report: ConformityReport): string {
  const rows: (string | number)[][] = [];
  for (const d of report.dampers) {
    for (const direction of ['compression', 'rebound'] as const) {
      for (const p of d[direction].points) {
        const opt = (x: number | null, digits: number) => (x === null ? '' : round(x, digits));
        rows.push([d.label, direction, p.velocity, round(p.target, 3), round(p.lower, 3), round(p.upper, 3), opt(p.measured, 3), opt(p.deviation, 3), opt(p.deviationPct, 2), p.pass ? 'pass' : 'fail', p.verdict]);
      }
    }
  }
  return `${writeCsv(rows, ['damper', 'direction', 'velocity [m/s]', 'target force [N]', 'lower [N]', 'upper [N]', 'measured force [N]', 'deviation [N]', 'deviation [%]', 'result', 'detail'])}\n`;
}
