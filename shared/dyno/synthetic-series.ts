import seedrandom from 'seedrandom';
import type { DynoTimeSeries } from '../schemas/dyno.ts';

/** One block of a sine dyno programme: x = A·(1 − cos ωt), starting and ending at rest. */
export interface SineBlock {
  /** Displacement amplitude A, m. */
  amplitude: number;
  /** Hz. */
  frequency: number;
  /** Whole cycles. */
  cycles: number;
}

export interface SyntheticOptions {
  /** Samples per second. */
  sampleRate: number;
  /** Gas force added to every force sample, N (pushes the rod out: compression positive). */
  gasForce?: number;
  /** Standard deviation of Gaussian force noise, N; default 0. */
  forceNoise?: number;
  /** Displacement resolution, m (readings are rounded to it); default none. */
  displacementStep?: number;
  seed?: string;
}

/**
 * A made-up dyno record: the rod driven through sine blocks, force = `forceAt(velocity)` (signed,
 * compression positive) plus gas force and optional noise. Peak speed of a block is A·ω. Used to
 * build the example file and to test `seriesToPeaks` and the fit against a known curve.
 */
export function synthesiseDynoSeries(forceAt: (velocity: number) => number, blocks: readonly SineBlock[], opts: SyntheticOptions): DynoTimeSeries {
  const rand = seedrandom(opts.seed ?? 'dyno');
  const gauss = () => {
    const u = Math.max(rand(), 1e-12);
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rand());
  };
  const dt = 1 / opts.sampleRate;
  const time: number[] = [];
  const displacement: number[] = [];
  const force: number[] = [];
  let t0 = 0;
  for (const b of blocks) {
    const w = 2 * Math.PI * b.frequency;
    const samples = Math.round((b.cycles / b.frequency) * opts.sampleRate);
    for (let k = 0; k < samples; k++) {
      const tau = k * dt;
      let x = b.amplitude * (1 - Math.cos(w * tau));
      if (opts.displacementStep) x = Math.round(x / opts.displacementStep) * opts.displacementStep;
      const v = b.amplitude * w * Math.sin(w * tau);
      time.push(t0 + tau);
      displacement.push(x);
      force.push(forceAt(v) + (opts.gasForce ?? 0) + (opts.forceNoise ? opts.forceNoise * gauss() : 0));
    }
    t0 += samples * dt;
  }
  return { time, displacement, force };
}
