import { z } from 'zod';
import { plainLine, plainLineMessage } from './fields.ts';
import { cyclesPerMeter, hertz, meters, metersPerSecond, seconds } from '../units.ts';

/**
 * A road the corner drives over, as a plain JSON object with a `kind`. Distances in m,
 * elevations in m (positive up). Speed is not part of the road: it belongs to the run.
 */

const name = z.string().trim().max(120).regex(plainLine, plainLineMessage).optional();

/** Most samples one ISO 8608 profile may have (2 per shortest wavelength over its period). */
export const ISO_MAX_SAMPLES = 1_048_576;

export const isoClasses = ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H'] as const;
export const IsoClass = z.enum(isoClasses);
export type IsoClass = z.infer<typeof IsoClass>;

/**
 * Random road after ISO 8608: displacement PSD Gd(n) = Gd(n0)·(n/n0)^−w with n0 = 0.1 cycle/m
 * and Gd(n0) the class's geometric mean. Made from harmonics with seeded random phases, so the
 * same seed gives the same road everywhere. The profile repeats every `length` metres.
 */
export const Iso8608Road = z
  .strictObject({
    kind: z.literal('iso8608'),
    name,
    class: IsoClass,
    /** Seed of the random phases (integer ≥ 0). */
    seed: z.number().int().min(0).max(4294967295),
    /** Lowest spatial frequency generated, cycle/m; default 0.011. */
    nMin: cyclesPerMeter.positive().max(100).optional(),
    /** Highest spatial frequency generated, cycle/m; default 2.83. */
    nMax: cyclesPerMeter.positive().max(100).optional(),
    /** Waviness exponent w; default 2. */
    waviness: z.number().min(1).max(4).optional(),
    /** Period of the generated profile, m; default 1024. */
    length: meters.min(10).max(100000).optional(),
    /**
     * Harmonic amplitudes: `fixed` (default) gives each harmonic exactly its share of the PSD, so
     * every seed has the same RMS; `random` draws them from a Rayleigh distribution with the same
     * mean square, which makes the road a Gaussian process and seeds scatter as real roads do.
     */
    amplitudes: z.enum(['fixed', 'random']).optional(),
  })
  .refine((r) => (r.nMin ?? 0.011) < (r.nMax ?? 2.83), { path: ['nMax'], message: 'nMax must be above nMin' })
  // Two samples per shortest wavelength over one period: bounded so one road stays a cheap object.
  .refine((r) => 2 * (r.length ?? 1024) * (r.nMax ?? 2.83) <= ISO_MAX_SAMPLES, {
    path: ['length'],
    message: `length × nMax makes too many samples: 2 × length × nMax must stay at or below ${ISO_MAX_SAMPLES} (e.g. 100 km at the default 2.83 cycle/m)`,
  });

/** Endless sine, faded in over its first two wavelengths. */
export const SineRoad = z.strictObject({
  kind: z.literal('sine'),
  name,
  /** Peak elevation, m. */
  amplitude: meters.positive().max(1),
  /** m. */
  wavelength: meters.positive().max(10000),
});

/**
 * Swept sine defined in time (a shaker-rig style input, independent of speed), with short
 * cosine fades at both ends. Give `amplitude` (constant displacement) or `velocityAmplitude`
 * (constant vertical velocity: displacement amplitude = velocityAmplitude / 2πf).
 */
export const SweepRoad = z
  .strictObject({
    kind: z.literal('sweep'),
    name,
    /** Peak elevation, m. */
    amplitude: meters.positive().max(1).optional(),
    /** Peak vertical road velocity, m/s. */
    velocityAmplitude: metersPerSecond.positive().max(10).optional(),
    /** Hz. */
    startFrequency: hertz.positive().max(200),
    /** Hz. */
    endFrequency: hertz.positive().max(200),
    /** Length of the sweep, s; the road is flat afterwards. */
    duration: seconds.positive().max(3600),
    /** Frequency change with time: `log` (default, equal time per octave) or `linear`. */
    law: z.enum(['log', 'linear']).optional(),
  })
  .superRefine((r, ctx) => {
    if ((r.amplitude === undefined) === (r.velocityAmplitude === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['amplitude'], message: 'give either amplitude or velocityAmplitude' });
    }
  });

/** Half-sine bump on a flat road. */
export const BumpRoad = z.strictObject({
  kind: z.literal('bump'),
  name,
  /** m. */
  height: meters.positive().max(1),
  /** Length along the road, m. */
  length: meters.positive().max(100),
  /** Distance from the start to the bump's leading edge, m. */
  at: meters.nonnegative().max(100000),
});

/** Half-sine dip on a flat road. */
export const PotholeRoad = z.strictObject({
  kind: z.literal('pothole'),
  name,
  /** m, positive downwards. */
  depth: meters.positive().max(1),
  length: meters.positive().max(100),
  at: meters.nonnegative().max(100000),
});

/** Step up (height > 0) or down (height < 0) with a straight ramp, the road staying at the new level. */
export const KerbRoad = z.strictObject({
  kind: z.literal('kerb'),
  name,
  /** Signed step, m: positive up, negative down. */
  height: meters.min(-1).max(1).refine((h) => h !== 0, 'height must not be 0'),
  /** Horizontal length of the ramp, m. */
  rampLength: meters.positive().max(100),
  /** Distance to the foot of the ramp, m. */
  at: meters.nonnegative().max(100000),
});

/**
 * Measured profile: `[distance m, elevation m]` points with rising distance (not necessarily
 * evenly spaced). Resampled to an even grid and, by default, detrended (a straight line
 * removed) so a long grade does not read as a bump.
 */
export const MeasuredRoad = z.strictObject({
  kind: z.literal('measured'),
  name,
  points: z
    .array(z.tuple([meters, meters.min(-1000).max(1000)]))
    .min(2)
    .max(5_000_000)
    .superRefine((pts, ctx) => {
      for (let i = 1; i < pts.length; i++) {
        if (!(pts[i][0] > pts[i - 1][0])) {
          ctx.addIssue({ code: 'custom', path: [i, 0], message: `distance must rise from point to point (${pts[i][0]} m after ${pts[i - 1][0]} m)` });
          return;
        }
      }
    }),
  /** Remove nothing, the mean, or a least-squares straight line; default `linear`. */
  detrend: z.enum(['none', 'mean', 'linear']).optional(),
  /** Resampling step, m; default the median spacing of the points. */
  spacing: meters.positive().max(10).optional(),
});

export const Road = z.discriminatedUnion('kind', [Iso8608Road, SineRoad, SweepRoad, BumpRoad, PotholeRoad, KerbRoad, MeasuredRoad]);
export type Road = z.infer<typeof Road>;
export type RoadInput = z.input<typeof Road>;
export type Iso8608Road = z.infer<typeof Iso8608Road>;
export type SineRoad = z.infer<typeof SineRoad>;
export type SweepRoad = z.infer<typeof SweepRoad>;
export type BumpRoad = z.infer<typeof BumpRoad>;
export type PotholeRoad = z.infer<typeof PotholeRoad>;
export type KerbRoad = z.infer<typeof KerbRoad>;
export type MeasuredRoad = z.infer<typeof MeasuredRoad>;
export type RoadKind = Road['kind'];
