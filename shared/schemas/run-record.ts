import { z } from 'zod';
import { Id, IsoDateTime, plainLine, plainLineMessage } from './fields.ts';
import { Road } from './road.ts';
import { ComfortLabel, Histogram } from './metrics.ts';
import { EquivalentDampingChoice, IntegratorName, RunRequest, RunResult } from './run.ts';
import { Setup } from './setup.ts';

/**
 * A run saved on the server: what was driven (setup revision, road with its seed, speed,
 * duration, options), the figures the browser computed, and thinned traces to re-draw the
 * charts without running again. Figures are kept as JSON numbers, exactly as computed.
 */

/** Most points stored per trace column (see shared/runs/thin-trace.ts for how they are picked). */
export const TRACE_POINT_CAP = 2000;
/** Most spectrum bins stored per column. */
export const SPECTRUM_BIN_CAP = 4097;

/** Stored trace columns, in storage order. Time in s from the start; the rest as in TraceColumns. */
export const storedTraceColumns = ['time', 'bodyAccel', 'travel', 'tyreLoad', 'damperVelocity', 'damperForce', 'road'] as const;
export type StoredTraceColumn = (typeof storedTraceColumns)[number];

/** Stored spectrum columns: frequency (Hz) then the Welch PSDs of body acceleration, travel and tyre load. */
export const storedSpectrumColumns = ['freq', 'bodyAccel', 'travel', 'tyreLoad'] as const;
export type StoredSpectrumColumn = (typeof storedSpectrumColumns)[number];

const base64 = z.string().regex(/^[A-Za-z0-9+/]*={0,2}$/, 'must be base64 text');

/** Thinned time histories: Float32 little-endian columns, base64 (shared/runs/float-codec.ts). */
export const StoredTraces = z
  .strictObject({
    method: z.enum(['all-samples', 'bucket-extremes']),
    /** Samples in the full run. */
    fullLength: z.number().int().positive(),
    /** Points per stored column. */
    length: z.number().int().min(2).max(TRACE_POINT_CAP),
    data: base64,
    /**
     * Tyre load distribution over the analysed part, from the full trace: the thinned columns
     * keep each bucket's extremes and would over-count the tails.
     */
    tyreLoadHistogram: Histogram,
  })
  .refine((t) => t.data.length === Math.ceil((storedTraceColumns.length * t.length * 4) / 3) * 4, {
    path: ['data'],
    message: `must hold ${storedTraceColumns.length} Float32 columns of \`length\` values`,
  });
export type StoredTraces = z.infer<typeof StoredTraces>;

export const StoredSpectra = z
  .strictObject({
    length: z.number().int().min(2).max(SPECTRUM_BIN_CAP),
    data: base64,
  })
  .refine((t) => t.data.length === Math.ceil((storedSpectrumColumns.length * t.length * 4) / 3) * 4, {
    path: ['data'],
    message: `must hold ${storedSpectrumColumns.length} Float32 columns of \`length\` values`,
  });
export type StoredSpectra = z.infer<typeof StoredSpectra>;

/** Options of a run beyond setup, road, speed and duration (all optional, defaults as in RunRequest). */
export const RunOptions = z.strictObject({
  settleTime: z.number().nonnegative().optional(),
  outputRate: z.number().min(200).max(5000).optional(),
  integrator: IntegratorName.optional(),
  tolerance: z.number().min(1e-12).max(1e-3).optional(),
  equivalentDamping: EquivalentDampingChoice.optional(),
  velocityBands: z.strictObject({ low: z.number().positive(), high: z.number().positive() }).optional(),
  histogramBins: z.number().int().min(4).max(400).optional(),
});
export type RunOptions = z.infer<typeof RunOptions>;

/** POST /api/workspaces/:workspaceId/runs */
export const SaveRunInput = z.strictObject({
  name: z.string().trim().min(1, 'Required').max(120, 'At most 120 characters').regex(plainLine, plainLineMessage),
  setupId: Id,
  /** The revision that was run; its document must equal `setup`. */
  revisionNumber: z.number().int().positive(),
  /** The setup as it was run, checked against the revision's document. */
  setup: Setup,
  /** The road library entry the road came from, if any. */
  roadId: Id.nullable().optional(),
  /** The road as run; may be left out when `roadId` names it (keeps long measured profiles off the wire). */
  road: Road.optional(),
  speed: z.number().positive().max(100),
  duration: z.number().positive().max(600),
  seed: z.number().int().min(0).max(4294967295).optional(),
  options: RunOptions.optional(),
  result: RunResult,
  traces: StoredTraces,
  spectra: StoredSpectra.optional(),
}).refine((r) => r.road !== undefined || Boolean(r.roadId), { path: ['road'], message: 'give the road, or the roadId of a library road' });
export type SaveRunInput = z.infer<typeof SaveRunInput>;
export type SaveRunInputIn = z.input<typeof SaveRunInput>;

/** One line of a runs list: enough to choose a run without loading its traces. */
export const RunSummary = z.object({
  id: Id,
  name: z.string(),
  setupId: Id,
  setupName: z.string(),
  revisionNumber: z.number().int().positive(),
  /** Newest revision of the setup now; above `revisionNumber` when the setup has changed since. */
  latestRevision: z.number().int().positive(),
  roadId: Id.nullable(),
  roadName: z.string(),
  roadKind: z.string(),
  speed: z.number(),
  duration: z.number(),
  seed: z.number().int().nullable(),
  headline: z.object({
    bodyAccelWkRms: z.number(),
    /** ISO 2631-1 Annex C reaction; null when the RMS method does not apply (single event, crest factor above 9). */
    comfort: ComfortLabel.nullable(),
    /** `event`: a bump, pothole or kerb, judged by peak, VDV, MTVV and settling rather than RMS. */
    lead: z.enum(['event', 'rms']),
    bodyAccelPeak: z.number(),
    vdv: z.number(),
    /** Absent on runs saved before it was kept. */
    mtvv: z.number().optional(),
    tyreLoadRatio: z.number(),
    liftOffFraction: z.number(),
    bodyHz: z.number(),
  }),
  createdBy: z.object({ id: Id, name: z.string() }),
  createdAt: IsoDateTime,
});
export type RunSummary = z.infer<typeof RunSummary>;

export const RunList = z.object({ runs: z.array(RunSummary) });
export type RunList = z.infer<typeof RunList>;

/** GET /api/workspaces/:workspaceId/runs/:runId */
export const SavedRun = RunSummary.extend({
  /** The full request as run (setup document included): run it again to get the same figures. */
  request: RunRequest,
  result: RunResult,
  traces: StoredTraces,
  spectra: StoredSpectra.nullable(),
});
export type SavedRun = z.infer<typeof SavedRun>;

/** GET …/runs?setupId=… */
export const RunListQuery = z.strictObject({
  setupId: Id.optional(),
  limit: z.coerce.number().int().min(1).max(500).optional(),
});
export type RunListQuery = z.infer<typeof RunListQuery>;
