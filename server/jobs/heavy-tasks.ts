// Runs in the server's worker threads (server/jobs/heavy-pool.ts): pure functions from shared/
// that can take seconds on big input, so that they never hold the request thread.
import { Road } from '../../shared/schemas/road.ts';
import type { MeasuredUploadFields } from '../../shared/schemas/road-record.ts';
import type { FieldIssue } from '../../shared/errors.ts';
import { roadFigures as figuresOfRoad, type RoadFiguresOutcome } from '../../shared/road-library/road-figures.ts';
import { parseMeasuredCsv } from '../../shared/sim/roads/measured-csv.ts';
import { fitDamperCurves } from '../../shared/dyno/fit-curve.ts';
import { type DynoReadOutcome, summariseDyno } from '../../shared/dyno-upload/summarise-dyno.ts';
import type { DynoParseOptions, DynoPeakPoints } from '../../shared/schemas/dyno.ts';
import type { ApplyDynoFitInput } from '../../shared/schemas/dyno-file.ts';
import type { DynoCheckFields } from '../../shared/schemas/target-sheet.ts';
import type { StudyDefinition } from '../../shared/schemas/study.ts';
import type { StudyPointResult } from '../../shared/schemas/study-result.ts';
import { studyBestCompromise, studyTradeOff } from '../../shared/study/study-compromise.ts';
import { checkContentJson, readCheckFiles } from '../target-sheets/read-check-files.ts';
import { type DriveReadResult, readDrive } from '../../shared/drive/read-drive.ts';

export type MeasuredUploadResult =
  | { ok: true; definitionBytes: Uint8Array; figures: Extract<RoadFiguresOutcome, { ok: true }>['figures'] }
  | { ok: false; message: string; fields?: FieldIssue[] };

/** A measured-profile CSV → the road definition and its figures, or what is wrong (by line or field). */
export function measuredUpload(input: { content: Uint8Array; filename: string; fields: MeasuredUploadFields; maxRows: number }): MeasuredUploadResult {
  const { filename, fields } = input;
  const text = new TextDecoder().decode(input.content);
  const parsed = parseMeasuredCsv(text, { distanceUnit: fields.distanceUnit, elevationUnit: fields.elevationUnit, maxRows: input.maxRows });
  if (!parsed.ok) return { ok: false, message: `${filename} was not saved: ${parsed.reason}`, fields: parsed.issues };
  const definition = Road.safeParse({
    kind: 'measured',
    name: fields.name,
    points: parsed.profile.points,
    ...(fields.detrend ? { detrend: fields.detrend } : {}),
    ...(fields.spacing ? { spacing: fields.spacing } : {}),
  });
  if (!definition.success) {
    const issues = definition.error.issues.map((i) => ({ path: i.path.map(String).join('.') || '(body)', message: i.message }));
    return { ok: false, message: `${filename} was not saved: the profile does not make a valid road.`, fields: issues };
  }
  const figures = figuresOfRoad(definition.data);
  if (!figures.ok) return { ok: false, message: `${filename} was not saved: ${figures.reason}` };
  // UTF-8 bytes, not the object or a string: they cross to the request thread in one copy and are
  // stored and sent from there without being decoded or encoded again.
  return { ok: true, definitionBytes: new TextEncoder().encode(JSON.stringify(definition.data)), figures: figures.figures };
}

/** A road's figures (resampling, spectrum, class fit). */
export function roadFigures(road: Road): RoadFiguresOutcome {
  return figuresOfRoad(road);
}

/** A dyno file read as the server keeps it: summary, peaks and the thinned loop, or what is wrong by line. */
export function dynoRead(input: { text: string; options: Partial<DynoParseOptions> }): DynoReadOutcome {
  return summariseDyno(input.text, input.options);
}

/** Damper curves fitted through a file's peak points at the chosen knots. */
export function dynoFit(input: { peaks: DynoPeakPoints; knots: ApplyDynoFitInput['knots']; weighting: ApplyDynoFitInput['weighting'] }) {
  return fitDamperCurves(input.peaks, input.knots, { weighting: input.weighting });
}

/**
 * The files of a target-sheet check, sent as bytes, decoded and read as measured dampers (every
 * file, every line); with them the files as they are kept, as UTF-8 JSON bytes, so the request
 * thread neither decodes a dozen megabytes nor writes them into JSON.
 */
export function sheetCheckFiles(input: { files: { content: Uint8Array; filename: string; bytes: number }[]; fields: DynoCheckFields }) {
  const decoder = new TextDecoder();
  const files = input.files.map((f) => ({ text: decoder.decode(f.content), filename: f.filename, bytes: f.bytes }));
  const read = readCheckFiles(files, input.fields);
  if (!read.ok) return read;
  return { ...read, value: { ...read.value, contentBytes: new TextEncoder().encode(checkContentJson(files, read.value.measured)) } };
}

/** The best compromise and the trade-off front over a study's saved points. */
export function studyRunFigures(input: { def: StudyDefinition; points: StudyPointResult[]; base?: StudyPointResult | null }) {
  return { compromise: studyBestCompromise(input.def, input.points, undefined, input.base ?? null), tradeOff: studyTradeOff(input.def, input.points, input.base ?? null) };
}

/** A measured drive log read into SI signals on an even grid, or its problems by line and column. */
export function driveRead(input: { text: string }): DriveReadResult {
  return readDrive(input.text);
}
