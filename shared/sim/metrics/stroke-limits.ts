import type { Metrics } from '../../schemas/metrics.ts';
import type { Setup } from '../../schemas/setup.ts';
import { endOfStrokeRate } from '../quarter-car.ts';
import type { TraceColumns } from '../trace.ts';

type LimitFigures = Pick<
  Metrics,
  | 'endOfStrokeDepthCompression'
  | 'endOfStrokeDepthExtension'
  | 'endOfStrokeForcePeak'
  | 'endOfStrokeEnergyPeak'
  | 'damperSpeedPeakCompression'
  | 'damperSpeedPeakRebound'
  | 'damperTableEndCompression'
  | 'damperTableEndRebound'
>;

/**
 * Where a run left what the model can vouch for: how deep travel went into the hard limits at
 * the ends of the stroke (force k·δ and energy ½·k·δ² at the deepest point), and the highest
 * damper speeds beside the last speed of each damper table (beyond it the force is an
 * extrapolation of the last segment, not a measurement).
 */
export function strokeAndTableFigures(trace: TraceColumns, from: number, setup: Setup): LimitFigures {
  let xMax = -Infinity;
  let xMin = Infinity;
  let vMax = 0;
  let vMin = 0;
  for (let i = from; i < trace.travel.length; i++) {
    const x = trace.travel[i];
    if (x > xMax) xMax = x;
    if (x < xMin) xMin = x;
    const v = trace.damperVelocity[i];
    if (v > vMax) vMax = v;
    if (v < vMin) vMin = v;
  }
  const out: LimitFigures = {
    damperSpeedPeakCompression: vMax,
    damperSpeedPeakRebound: -vMin,
    damperTableEndCompression: setup.damper.compression[setup.damper.compression.length - 1][0],
    damperTableEndRebound: setup.damper.rebound[setup.damper.rebound.length - 1][0],
  };
  if (setup.stroke) {
    const k = endOfStrokeRate(setup);
    const inCompression = Math.max(0, xMax - setup.stroke.compression);
    const inExtension = Math.max(0, -xMin - setup.stroke.extension);
    const deepest = Math.max(inCompression, inExtension);
    out.endOfStrokeDepthCompression = inCompression;
    out.endOfStrokeDepthExtension = inExtension;
    out.endOfStrokeForcePeak = k * deepest;
    out.endOfStrokeEnergyPeak = 0.5 * k * deepest ** 2;
  }
  return out;
}
