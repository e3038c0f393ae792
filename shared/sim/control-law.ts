import type { ControlLaw } from '../schemas/damper-control.ts';

/**
 * The force a control law asks of the damper, N at the damper, positive resisting compression
 * (the damper's own sign). `vs`, `vu`: body and wheel velocity, m/s, up positive; `mr`: motion
 * ratio. Skyhook asks for a force −c·MR·vs on the body (the damper pushes the body by MR × its
 * force), groundhook for −c·MR·vu on the wheel, which the damper pushes the other way.
 */
export function compileControlDemand(law: ControlLaw, mr: number): (vs: number, vu: number) => number {
  switch (law.kind) {
    case 'skyhook': {
      const c = law.gain * mr;
      return (vs) => -c * vs;
    }
    case 'groundhook': {
      const c = law.gain * mr;
      return (_vs, vu) => c * vu;
    }
    case 'blend': {
      const a = law.blend * law.skyGain * mr;
      const b = (1 - law.blend) * law.groundGain * mr;
      return (vs, vu) => -a * vs + b * vu;
    }
  }
}

/**
 * Valve setting (0 soft, 1 firm) that delivers `demand` at strut rate `u` between the soft
 * force `lo` and the firm force `hi` read there. `continuous`: the share that gives the asked
 * force, clipped to the tables (a force the strut's motion cannot resist gives the soft table,
 * as Karnopp's semi-active skyhook does); `onOff`: firm whenever the asked force resists the
 * strut's motion.
 */
export function targetSetting(mode: ControlLaw['mode'], demand: number, u: number, lo: number, hi: number): number {
  if (mode === 'onOff') return demand * u > 0 ? 1 : 0;
  const span = hi - lo;
  if (!(Math.abs(span) > 1e-9)) return 0;
  const s = (demand - lo) / span;
  return s < 0 ? 0 : s > 1 ? 1 : s;
}
