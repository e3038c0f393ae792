import type { VehicleLinearResult } from '../../../../shared/schemas/vehicle-run.ts';

export interface CheckLine {
  key: string;
  /** True when the rule of thumb is met. */
  met: boolean;
  text: string;
}

const hz = (x: number) => `${x.toFixed(2)} Hz`;

/**
 * The flat-ride checks and the pitch-speed coincidence in plain words. `speedText` formats a
 * speed in the person's unit. Rules of thumb (common practice), said as such on the page.
 */
export function vehicleCheckLines(linear: VehicleLinearResult, speed: number, speedText: (mps: number) => string): CheckLine[] {
  const f = linear.flatRide;
  const { heave, pitch } = linear.modes;
  const L = linear.geometry.wheelbase;
  const lines: CheckLine[] = [
    {
      key: 'frontBelowRear',
      met: f.frontBelowRear,
      text: f.frontBelowRear
        ? `The front end (${hz(f.frontHz)}) is slower than the rear (${hz(f.rearHz)}): after a bump the rear catches up with the front and the body settles level.`
        : `The front end (${hz(f.frontHz)}) is faster than the rear (${hz(f.rearHz)}): after a bump the ends drift out of step and the body pitches. A softer front or a stiffer rear turns this round.`,
    },
    {
      key: 'ratio',
      met: f.ratioInBand,
      text: `Rear over front: ${f.ratio.toFixed(3)} (rule of thumb ${f.ratioBand.low.toFixed(1)}–${f.ratioBand.high.toFixed(1)}).`,
    },
    {
      key: 'pitchNearHeave',
      met: f.pitchNearHeave,
      text: f.pitchNearHeave
        ? `Pitch (${hz(pitch.naturalHz)}) and heave (${hz(heave.naturalHz)}) are within 20 % of each other: neither motion stands out.`
        : `Pitch (${hz(pitch.naturalHz)}) and heave (${hz(heave.naturalHz)}) are more than 20 % apart: the ${pitch.naturalHz > heave.naturalHz ? 'pitch' : 'heave'} mode stands out.`,
    },
  ];
  // The rear meets each wave L/V later; half a cycle later the two inputs oppose and feed pitch the most.
  const feedHz = speed / (2 * L);
  const worstSpeed = 2 * L * pitch.naturalHz;
  const near = Math.abs(feedHz / pitch.naturalHz - 1) <= 0.15;
  lines.push({
    key: 'pitchSpeed',
    met: !near,
    text: `The rear meets every wave ${(L / speed).toFixed(3)} s after the front. Waves that arrive half a cycle apart (${hz(feedHz)} at this speed) drive pitch hardest; they fall on the pitch mode near ${speedText(worstSpeed)}${near ? ' — close to this speed, so the body pitches most here' : ''}.`,
  });
  return lines;
}
