import { z } from 'zod';

/**
 * ISO 2631-1:1997 Annex C comfort reactions (from memory), mildest first. The standard's
 * bands overlap, so one weighted RMS can match two reactions.
 */
export const comfortLabels = [
  'not uncomfortable',
  'a little uncomfortable',
  'fairly uncomfortable',
  'uncomfortable',
  'very uncomfortable',
  'extremely uncomfortable',
] as const;
export const ComfortLabel = z.enum(comfortLabels);
export type ComfortLabel = z.infer<typeof ComfortLabel>;

export const ComfortGrading = z.object({
  /** Every Annex C band that contains the weighted RMS, mildest first. */
  bands: z.array(ComfortLabel).min(1),
  /** The matching band the value sits deepest inside (largest log-distance to its nearer edge). */
  primary: ComfortLabel,
});
export type ComfortGrading = z.infer<typeof ComfortGrading>;

export const Histogram = z.object({
  /** Bin edges, length = counts.length + 1, ascending. */
  edges: z.array(z.number()),
  counts: z.array(z.number().int().nonnegative()),
});
export type Histogram = z.infer<typeof Histogram>;

const share = z.number().min(0).max(1);

export const VelocityBands = z.object({
  /** Edges on |damper velocity| in m/s: low below `lowEdge`, high above `highEdge`. */
  lowEdge: z.number().positive(),
  highEdge: z.number().positive(),
  low: share,
  mid: share,
  high: share,
  /** Share of time moving in compression (velocity > 0). */
  compression: share,
});
export type VelocityBands = z.infer<typeof VelocityBands>;

/**
 * Ride and grip figures of one run, over the samples after the settling time. SI units:
 * m/s², m, N, s, W, J. Travel is positive in compression.
 */
export const Metrics = z.object({
  /** Length of the analysed part of the run, s. */
  analysedTime: z.number().nonnegative(),

  bodyAccelRms: z.number().nonnegative(),
  bodyAccelPeak: z.number().nonnegative(),
  /** Peak / RMS (0 when the RMS is 0). */
  bodyAccelCrest: z.number().nonnegative(),
  /** ISO 2631-1 Wk frequency-weighted RMS `aw`, m/s². */
  bodyAccelWkRms: z.number().nonnegative(),
  /** Vibration dose value of the Wk-weighted acceleration, m/s^1.75. */
  vdv: z.number().nonnegative(),
  comfort: ComfortGrading,

  /** Fz0 = (ms + mu) g, N. */
  tyreLoadStatic: z.number().positive(),
  /** RMS of Fz − Fz0, N. */
  tyreLoadRms: z.number().nonnegative(),
  /** tyreLoadRms / Fz0. */
  tyreLoadRatio: z.number().nonnegative(),
  /** Smallest contact force, N (0 when the wheel left the road). */
  tyreLoadMin: z.number().nonnegative(),
  /** Share of time with zero contact force. */
  liftOffFraction: share,

  /** RMS of travel about its static position, m. */
  travelRms: z.number().nonnegative(),
  /** max(travel), m (positive = compressed beyond static). */
  travelMaxCompression: z.number(),
  /** −min(travel), m (positive = extended beyond static). */
  travelMaxExtension: z.number(),
  /** travelMaxCompression / available compression stroke; absent when no stroke is given. */
  strokeUsedCompression: z.number().optional(),
  /** travelMaxExtension / available extension stroke; absent when no stroke is given. */
  strokeUsedExtension: z.number().optional(),
  /**
   * How far travel went beyond the compression / extension end of the stroke into its hard
   * limit, m (0 when it stayed inside); absent when no stroke is given.
   */
  endOfStrokeDepthCompression: z.number().nonnegative().optional(),
  endOfStrokeDepthExtension: z.number().nonnegative().optional(),
  /** Largest force of the end-of-stroke limit, N, and the energy it held then, J (½·k·δ²). */
  endOfStrokeForcePeak: z.number().nonnegative().optional(),
  endOfStrokeEnergyPeak: z.number().nonnegative().optional(),
  /** Highest damper speed reached in compression and in rebound, m/s (both ≥ 0). */
  damperSpeedPeakCompression: z.number().nonnegative().optional(),
  damperSpeedPeakRebound: z.number().nonnegative().optional(),
  /** Last speed of each damper table, m/s: above it forces are extrapolated from the last segment. */
  damperTableEndCompression: z.number().nonnegative().optional(),
  damperTableEndRebound: z.number().nonnegative().optional(),
  /** Time with the bump stop pushing, s. */
  bumpStopTime: z.number().nonnegative(),
  /** Time with the rebound stop pulling, s. */
  reboundStopTime: z.number().nonnegative(),

  damperVelocityRms: z.number().nonnegative(),
  damperVelocityHistogram: Histogram,
  damperVelocityBands: VelocityBands,
  /** Mean power dissipated in the damper, W. */
  damperPowerMean: z.number(),
  /** Energy dissipated in the damper over the analysed time, J. */
  damperEnergy: z.number(),
});
export type Metrics = z.infer<typeof Metrics>;
