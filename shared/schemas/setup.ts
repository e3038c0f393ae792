import { z } from 'zod';
import { ControlLaw } from './damper-control.ts';
import { plainLine, plainLineMessage, plainText, plainTextMessage } from './fields.ts';
import {
  cubicMeters,
  kilograms,
  meters,
  metersPerSecond,
  newtons,
  newtonSecondsPerMeter,
  newtonsPerMeter,
  pascals,
  asNewtonSecondsPerMeter,
  seconds,
  squareMeters,
} from '../units.ts';

/**
 * One corner of a vehicle, as stored, exchanged and read by `npm run sim --setup`.
 * A plain JSON document in SI units. Positions are measured from the static ride position;
 * travel is positive in compression (wheel towards body).
 */

type Points = ReadonlyArray<readonly [number, number]>;

/** Shared check for (abscissa, force) tables: abscissa strictly rising, force never falling. */
function checkMonotoneTable(pts: Points, ctx: z.RefinementCtx, what: string, unit: string) {
  for (let i = 1; i < pts.length; i++) {
    if (!(pts[i][0] > pts[i - 1][0])) {
      ctx.addIssue({ code: 'custom', path: [i, 0], message: `${what} must rise strictly from point to point (${pts[i][0]} ${unit} after ${pts[i - 1][0]} ${unit})` });
    }
    if (pts[i][1] < pts[i - 1][1]) {
      ctx.addIssue({ code: 'custom', path: [i, 1], message: `force must not fall as ${what} rises (${pts[i][1]} N after ${pts[i - 1][1]} N)` });
    }
  }
}

/**
 * Force-velocity table for one direction, measured at the damper: `[piston velocity m/s, force N]`,
 * both ≥ 0, velocities strictly increasing, forces never decreasing. The curve starts at the
 * origin: a first point at 0 m/s must have 0 N, and when the first point is above 0 m/s the
 * segment from (0, 0) to it is implied. Read piecewise linearly, extrapolated past the last
 * point with the last segment's slope.
 */
export const DamperCurve = z
  .array(z.tuple([metersPerSecond.nonnegative().max(20), newtons.nonnegative().max(1e6)]))
  .min(1)
  .max(64)
  .superRefine((pts, ctx) => {
    // zod runs refinements after a failed .min(1) too: the empty table has its issue already
    if (pts.length === 0) return;
    checkMonotoneTable(pts, ctx, 'velocity', 'm/s');
    if (pts[0][0] === 0 && pts[0][1] !== 0) {
      ctx.addIssue({ code: 'custom', path: [0, 1], message: 'a damper makes no force at rest: the point at 0 m/s must have 0 N' });
    }
    if (pts[pts.length - 1][0] <= 0) {
      ctx.addIssue({ code: 'custom', path: [0, 0], message: 'needs at least one point above 0 m/s' });
    }
  });
export type DamperCurve = z.infer<typeof DamperCurve>;

/**
 * Gas charge pushing the rod out. Give `force` (the rod force at the static ride position),
 * or `pressure` with `rodArea` (force = pressure × rodArea there). With `polytropic`, the
 * force stiffens as the rod enters: F = p0·A·(V0 / (V0 − A·x))^n, x damper compression from
 * static; that needs `rodArea`.
 */
export const GasCharge = z
  .strictObject({
    /** Rod force at the static ride position, N. */
    force: newtons.nonnegative().max(1e5).optional(),
    /** Gas pressure at the static ride position, Pa (absolute charge acting on the rod). */
    pressure: pascals.nonnegative().max(1e8).optional(),
    /** Rod cross-section area, m². */
    rodArea: squareMeters.positive().max(0.01).optional(),
    /** Stiffening of the charge with rod entry. */
    polytropic: z
      .strictObject({
        /** Gas volume at the static ride position, m³. */
        volume: cubicMeters.positive().max(0.01),
        /** Polytropic exponent n, 1 (isothermal) to 1.4 (adiabatic air/nitrogen). */
        exponent: z.number().min(1).max(1.4),
      })
      .optional(),
  })
  .superRefine((g, ctx) => {
    if (g.force === undefined && g.pressure === undefined) {
      ctx.addIssue({ code: 'custom', path: ['force'], message: 'give the gas force, or the pressure with the rod area' });
    }
    if (g.force !== undefined && g.pressure !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['pressure'], message: 'give either the gas force or the pressure, not both' });
    }
    if (g.pressure !== undefined && g.rodArea === undefined) {
      ctx.addIssue({ code: 'custom', path: ['rodArea'], message: 'a gas pressure needs the rod area' });
    }
    if (g.polytropic !== undefined && g.rodArea === undefined) {
      ctx.addIssue({ code: 'custom', path: ['rodArea'], message: 'polytropic stiffening needs the rod area' });
    }
  });
export type GasCharge = z.infer<typeof GasCharge>;

/**
 * A controlled damper (switch: present or absent). The damper's own `compression` and
 * `rebound` tables become its soft bound, `firm` its firm bound; the force at each instant is
 * chosen between the two by `law`, and the valve follows its command with a first-order lag of
 * `responseTime` (0: at once). `bounds: "none"` lifts both bounds: the asked force is added to
 * the soft tables whatever its sign, an idealised actuator for reference checks, not a damper.
 */
export const DamperControl = z.strictObject({
  firm: z.strictObject({ compression: DamperCurve, rebound: DamperCurve }),
  /** First-order response time of the valve (or of the actuator force with no bounds), s. */
  responseTime: seconds.nonnegative().max(1).default(0 as z.infer<typeof seconds>),
  law: ControlLaw,
  bounds: z.enum(['tables', 'none']).default('tables'),
});
export type DamperControl = z.infer<typeof DamperControl>;

/** The damper: one table per direction plus an optional gas charge and an optional control. */
export const Damper = z.strictObject({
  /** Force resisting compression (wheel moving towards the body), at the damper. */
  compression: DamperCurve,
  /** Force resisting extension (rebound), at the damper. */
  rebound: DamperCurve,
  gas: GasCharge.optional(),
  control: DamperControl.optional(),
});
export type Damper = z.infer<typeof Damper>;

/**
 * Force law of an end stop once engaged, as a function of its deflection δ (travel beyond the
 * clearance), at the wheel. `table`: `[δ m, force N]` points, from an implied (0, 0),
 * piecewise linear and extrapolated with the last slope. `polynomial`: coefficients c1, c2, …
 * of F(δ) = c1·δ + c2·δ² + … (c1 in N/m, c2 in N/m², …), all ≥ 0 so the law is progressive.
 */
export const StopLaw = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.literal('table'),
    points: z
      .array(z.tuple([meters.positive().max(1), newtons.nonnegative().max(1e7)]))
      .min(1)
      .max(64)
      .superRefine((pts, ctx) => checkMonotoneTable(pts, ctx, 'deflection', 'm')),
  }),
  z.strictObject({
    kind: z.literal('polynomial'),
    coefficients: z
      .array(z.number().nonnegative().max(1e15))
      .min(1)
      .max(6)
      .refine((c) => c.some((x) => x > 0), 'at least one coefficient must be above 0'),
  }),
]);
export type StopLaw = z.infer<typeof StopLaw>;

/** A bump stop (engages in compression) or rebound stop (engages in extension), at the wheel. */
export const EndStop = z.strictObject({
  /** Free wheel travel from the static position before the stop touches, m. */
  clearance: meters.nonnegative().max(1),
  law: StopLaw,
});
export type EndStop = z.infer<typeof EndStop>;

/** Wheel travel available from the static position, m. */
export const Stroke = z.strictObject({
  /** Towards the body (bump), m. */
  compression: meters.positive().max(1),
  /** Away from the body (rebound), m. */
  extension: meters.positive().max(1),
  /**
   * Stiffness of the hard limit at either end of the stroke, at the wheel, N/m: the damper
   * bottoming or topping out on its own body once the stops are used up. Default: 20 × the
   * tyre rate (a limit much stiffer than anything else in the corner).
   */
  limitRate: newtonsPerMeter.positive().max(1e9).optional(),
});
export type Stroke = z.infer<typeof Stroke>;

/**
 * The damper's top mount (switch: present or absent): a rubber element in series between the
 * damper and the body, along the damper. Its deflection is a state of the model. The whole
 * strut force (damper tables, gas change, friction) passes through it; the spring and the stops
 * bear on the body directly.
 */
export const TopMount = z.strictObject({
  /** Stiffness along the damper, N/m. */
  rate: newtonsPerMeter.positive().max(1e9),
  /** Damping in parallel with that stiffness, N·s/m, default none. */
  damping: newtonSecondsPerMeter.nonnegative().max(1e6).default(asNewtonSecondsPerMeter(0)),
});
export type TopMount = z.infer<typeof TopMount>;

/**
 * Friction in the strut (switch: present or absent), at the damper: a Coulomb force of
 * `breakaway` N smoothed as breakaway × tanh(v / smoothingSpeed), so it reaches 76 % of the
 * breakaway at the smoothing speed and is a steep but finite damping below it.
 */
export const StrutFriction = z.strictObject({
  breakaway: newtons.positive().max(1e4),
  smoothingSpeed: metersPerSecond.min(1e-4).max(0.5),
});
export type StrutFriction = z.infer<typeof StrutFriction>;

/** True when a table's force rises on every segment from the implied origin (and so past its end). */
function risesEverywhere(curve: DamperCurve): boolean {
  let v0 = 0;
  let f0 = 0;
  for (const [v, f] of curve) {
    if (v > v0 && !(f > f0)) return false;
    v0 = v;
    f0 = f;
  }
  return true;
}

const SetupFields = z.strictObject({
  /** Display name, e.g. "Pipit front, baseline". */
  name: z.string().trim().min(1).max(120).regex(plainLine, plainLineMessage),
  /** The corner's share of the body mass, kg. */
  sprungMass: kilograms.positive().max(5000),
  /** Wheel, hub, brake and the moving part of the links, kg. */
  unsprungMass: kilograms.positive().max(1000),
  /** Coil spring rate at the spring, N/m; the wheel rate is springRate × motionRatio². */
  springRate: newtonsPerMeter.positive().max(1e7),
  /** Damper and spring travel per unit wheel travel (dimensionless), default 1. */
  motionRatio: z.number().min(0.1).max(3).default(1),
  /** Tyre vertical rate, N/m. */
  tyreRate: newtonsPerMeter.positive().max(1e8),
  /** Tyre vertical damping, N·s/m, default 0. */
  tyreDamping: newtonSecondsPerMeter.nonnegative().max(1e5).default(asNewtonSecondsPerMeter(0)),
  /**
   * Length over which the tyre averages the road (a simple enveloping filter), m.
   * Omit for point contact.
   */
  tyreFootprint: meters.positive().max(1).optional(),
  /**
   * Loaded tyre radius, m. Given, the tyre rolls over bumps, potholes and kerbs as a circle of
   * this radius (enveloping: it meets a step before reaching it and bridges part of a short
   * pothole) instead of touching the road at one point; random, sine and measured roads are not
   * affected. On event roads it takes the place of the footprint.
   */
  tyreRadius: meters.positive().max(1).optional(),
  damper: Damper,
  bumpStop: EndStop.optional(),
  reboundStop: EndStop.optional(),
  /** Wheel travel available from static, used for the stroke-used figures. */
  stroke: Stroke.optional(),
  /** Series stiffness between damper and body; absent: the damper bears on the body directly. */
  topMount: TopMount.optional(),
  /** Smoothed Coulomb friction of the strut; absent: none. */
  friction: StrutFriction.optional(),
  /** Free text. */
  notes: z.string().max(4000).regex(plainText, plainTextMessage).optional(),
});

export const Setup = SetupFields.superRefine((s, ctx) => {
  // A mount without damping in series with a table that goes flat would have no defined damper
  // speed where the mount force exceeds the flat force: ask for mount damping then.
  if (s.topMount && !(s.topMount.damping > 0)) {
    const tables = [
      ['compression', s.damper.compression],
      ['rebound', s.damper.rebound],
      ...(s.damper.control ? [['control.firm.compression', s.damper.control.firm.compression] as const, ['control.firm.rebound', s.damper.control.firm.rebound] as const] : []),
    ] as const;
    for (const [path, curve] of tables) {
      if (!risesEverywhere(curve)) {
        ctx.addIssue({ code: 'custom', path: ['topMount', 'damping'], message: `a top mount without damping needs every damper table to rise on each segment (damper.${path} has a flat one): give the mount some damping` });
        return;
      }
    }
  }
});
/** A parsed setup (branded SI numbers, defaults filled). */
export type Setup = z.infer<typeof Setup>;
/** What a file or form may contain before parsing (plain numbers, defaults optional). */
export type SetupInput = z.input<typeof Setup>;
