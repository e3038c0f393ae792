import type { EquivalentDampingChoice } from '../schemas/run.ts';
import { Setup, type DamperCurve, type SetupInput } from '../schemas/setup.ts';
import type { StudyPointValues } from '../schemas/study-result.ts';
import { equivalentDampingLeastSquares, equivalentDampingSecant } from '../sim/damper-equivalent.ts';
import { linearCorner } from '../sim/quarter-car.ts';

export type ApplyPointResult = { ok: true; setup: Setup; notes: string[] } | { ok: false; message: string };

const scaleCurve = (curve: DamperCurve, s: number): [number, number][] => curve.map(([v, f]) => [v, f * s]);

/**
 * Classic body damping ratio of a setup, ζ ≈ c/(2·√(ks·ms)) with c and ks at the wheel, exactly
 * as the modal figures state it (shared/sim/linear/modal.ts): c = c_eq·MR² from the chosen
 * equivalent-coefficient definition (default least squares over 0–0.3 m/s), ks = springRate·MR²
 * plus the gas rate at static.
 */
export function classicBodyDampingRatio(setup: Setup, choice?: EquivalentDampingChoice): number {
  const eq =
    choice?.method === 'secant'
      ? equivalentDampingSecant(setup.damper, choice.referenceSpeed)
      : equivalentDampingLeastSquares(setup.damper, { maxSpeed: choice?.method === 'least-squares' ? choice.maxSpeed : undefined });
  const c = linearCorner(setup, eq);
  return c.wheelDamping / (2 * Math.sqrt(c.wheelRate * c.sprungMass));
}

/**
 * The base setup with a point's swept values applied, in this order:
 * 1. `springRate` (at the spring, N/m), `tyreRate`, `unsprungMass` replace the setup's values;
 *    `gasForce` sets the static gas force (a charge given by pressure keeps its rod area and
 *    stiffening, its pressure set to force/area; 0 removes the charge).
 * 2. `damperScale` multiplies every force of both curves; `compressionScale` and `reboundScale`
 *    multiply one direction's forces (speeds unchanged); a controlled damper's firm tables
 *    scale with its soft ones (here and in step 3).
 * 3. `targetBodyDampingRatio` then scales both curves by one factor so the classic estimate
 *    (`classicBodyDampingRatio`) equals it; the curve shapes and the compression/rebound split
 *    are kept. The equivalent coefficient is linear in force, so one factor reaches it exactly.
 * 4. `mountRate`, `frictionBreakaway`, `skyGain`, `groundGain`, `controlBlend` set the strut
 *    parts (applyParts); the gains and the blend need the base's controlled damper.
 * `speed` belongs to the run, not the setup, and is ignored here. The result is parsed by the
 * setup schema, so a value it refuses comes back as a failure naming the field.
 */
export function applyPoint(base: Setup, values: StudyPointValues, opts: { equivalentDamping?: EquivalentDampingChoice } = {}): ApplyPointResult {
  const next: SetupInput = structuredClone(base) as SetupInput;
  const notes: string[] = [];
  if (values.springRate !== undefined) next.springRate = values.springRate;
  if (values.tyreRate !== undefined) next.tyreRate = values.tyreRate;
  if (values.unsprungMass !== undefined) next.unsprungMass = values.unsprungMass;
  if (values.gasForce !== undefined) {
    const gas = base.damper.gas;
    if (values.gasForce === 0) next.damper.gas = undefined;
    else if (gas?.pressure !== undefined && gas.rodArea !== undefined) next.damper.gas = { ...gas, pressure: values.gasForce / gas.rodArea };
    else next.damper.gas = { ...(gas ?? {}), force: values.gasForce };
  }
  const both = values.damperScale ?? 1;
  const c = both * (values.compressionScale ?? 1);
  const r = both * (values.reboundScale ?? 1);
  next.damper.compression = scaleCurve(base.damper.compression, c);
  next.damper.rebound = scaleCurve(base.damper.rebound, r);
  if (base.damper.control) next.damper.control = { ...base.damper.control, firm: { compression: scaleCurve(base.damper.control.firm.compression, c), rebound: scaleCurve(base.damper.control.firm.rebound, r) } };
  const parts = applyParts(next, base, values);
  if (parts) return { ok: false, message: parts };

  let parsed = Setup.safeParse(next);
  if (!parsed.success) return failure(parsed.error);
  if (values.targetBodyDampingRatio !== undefined) {
    const now = classicBodyDampingRatio(parsed.data, opts.equivalentDamping);
    if (!(now > 0)) return { ok: false, message: 'damper: the curves make no force over the fit range, so no scaling reaches a damping ratio' };
    const s = values.targetBodyDampingRatio / now;
    next.damper.compression = scaleCurve(parsed.data.damper.compression, s);
    next.damper.rebound = scaleCurve(parsed.data.damper.rebound, s);
    const ctl = parsed.data.damper.control;
    if (ctl) next.damper.control = { ...ctl, firm: { compression: scaleCurve(ctl.firm.compression, s), rebound: scaleCurve(ctl.firm.rebound, s) } };
    notes.push(`curves scaled ×${s.toFixed(3)} to reach body damping ratio ${values.targetBodyDampingRatio}`);
    parsed = Setup.safeParse(next);
    if (!parsed.success) return failure(parsed.error);
  }
  return { ok: true, setup: parsed.data, notes };
}

function failure(error: { issues: { path: PropertyKey[]; message: string }[] }): ApplyPointResult {
  const i = error.issues[0];
  return { ok: false, message: `${i.path.map(String).join('.')}: ${i.message}` };
}

/** Friction smoothing speed used when a sweep adds friction to a setup without it, m/s. */
const ADDED_FRICTION_SMOOTHING = 0.005;

/** Applies the strut-part values; returns why it cannot, or undefined. */
function applyParts(next: SetupInput, base: Setup, values: StudyPointValues): string | undefined {
  if (values.mountRate !== undefined) next.topMount = { ...(base.topMount ?? {}), rate: values.mountRate };
  if (values.frictionBreakaway !== undefined) {
    next.friction = values.frictionBreakaway === 0 ? undefined : { smoothingSpeed: base.friction?.smoothingSpeed ?? ADDED_FRICTION_SMOOTHING, breakaway: values.frictionBreakaway };
  }
  const { skyGain, groundGain, controlBlend, controlOn } = values;
  if (controlOn !== undefined && controlOn < 0.5) {
    next.damper.control = undefined;
    return undefined;
  }
  if (skyGain === undefined && groundGain === undefined && controlBlend === undefined && controlOn === undefined) return undefined;
  const control = base.damper.control;
  if (!control) return 'damper.control: the base setup has no controlled damper to set gains on';
  const law = { ...control.law };
  if (law.kind === 'blend') {
    if (skyGain !== undefined) law.skyGain = skyGain as typeof law.skyGain;
    if (groundGain !== undefined) law.groundGain = groundGain as typeof law.groundGain;
    if (controlBlend !== undefined) law.blend = controlBlend;
  } else {
    if (controlBlend !== undefined) return 'damper.control.law: a skyhook share needs the blend law';
    const own = law.kind === 'skyhook' ? skyGain : groundGain;
    if ((law.kind === 'skyhook' ? groundGain : skyGain) !== undefined) return `damper.control.law: a ${law.kind} law has no ${law.kind === 'skyhook' ? 'groundhook' : 'skyhook'} gain`;
    if (own !== undefined) law.gain = own as typeof law.gain;
  }
  next.damper.control = { ...(next.damper.control ?? control), law };
  return undefined;
}
