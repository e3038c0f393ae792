import { readGasDeclaration } from '../dyno/gas-declaration.ts';
import { parseDynoCsv } from '../dyno/parse-dyno-csv.ts';
import { seriesToPeaks } from '../dyno/series-to-peaks.ts';
import { type DynoIssue, type DynoLoop, DynoParseOptions } from '../schemas/dyno.ts';
import type { DynoFileSummary } from '../schemas/dyno-file.ts';

export type DynoReadOutcome =
  | { ok: true; summary: DynoFileSummary; loop: DynoLoop | null; options: DynoParseOptions }
  | { ok: false; errors: DynoIssue[] };

/**
 * One dyno file read the way the server stores it: parsed (`parseDynoCsv`), a raw record turned
 * into its loop and peak points (`seriesToPeaks`), and refused when nothing can be fitted. The
 * upload panel runs the same function on the chosen file first, so what it shows before the
 * upload is what the server will keep.
 */
export function summariseDyno(text: string, given: Partial<DynoParseOptions> = {}): DynoReadOutcome {
  const parsed = parseDynoCsv(text, given);
  if (!parsed.ok) return parsed;
  const options = DynoParseOptions.parse(given);
  const gasDeclaration = readGasDeclaration(text);
  if (parsed.kind === 'peaks') {
    return {
      ok: true,
      options,
      loop: null,
      summary: { kind: 'peaks', layout: parsed.layout, units: parsed.units, rows: parsed.rows, warnings: parsed.warnings, peaks: parsed.data, series: null, gasDeclaration },
    };
  }
  const analysis = seriesToPeaks(parsed.data);
  const found = analysis.peaks.compression.length + analysis.peaks.rebound.length;
  if (found === 0) {
    return { ok: false, errors: [{ message: `no complete stroke found in the record${analysis.warnings.length ? ` (${analysis.warnings.join('; ')})` : ''}` }] };
  }
  const { time } = parsed.data;
  const peakSpeed = analysis.loop.velocity.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  return {
    ok: true,
    options,
    loop: analysis.loop,
    summary: {
      kind: 'series',
      layout: parsed.layout,
      units: parsed.units,
      rows: parsed.rows,
      warnings: parsed.warnings,
      peaks: analysis.peaks,
      series: {
        velocitySource: analysis.velocitySource,
        halfWindow: analysis.halfWindow,
        method: analysis.method,
        halfCycles: analysis.halfCycles.length,
        duration: time[time.length - 1] - time[0],
        peakSpeed,
        warnings: analysis.warnings,
      },
      gasDeclaration,
    },
  };
}
