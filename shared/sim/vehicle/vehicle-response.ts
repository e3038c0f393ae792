import type { SeatPosition } from '../../schemas/vehicle-setup.ts';
import { logGrid, type Response } from '../linear/frequency-response.ts';
import { dynamicStiffness, solveComplex, type Complex, type LinearVehicle } from './vehicle-linear.ts';

/**
 * Frequency responses of the linear vehicle from the road under the front axle, the rear
 * meeting the same road L/V later (a factor e^(−jωL/V) on its input). Gains are accelerations
 * per metre of road: heave (1/s²), pitch (rad/s² per m) and the vertical acceleration at each
 * seat (1/s²). The delay alone makes the wheelbase filter: where the two inputs arrive in
 * phase the body cannot pitch, where they arrive in opposition it cannot heave (for a body
 * whose heave and pitch are uncoupled, `wheelbaseFilterZeros`).
 */
export interface VehicleFrequencyResponse {
  freq: Float64Array;
  heave: Response;
  pitch: Response;
  seats: Array<{ name: string; response: Response }>;
}

/** Complex [heave, pitch, front wheel, rear wheel] displacement per metre of road at f Hz. */
export function vehicleDisplacementGains(v: LinearVehicle, speed: number, fHz: number): Complex[] {
  const w = 2 * Math.PI * fHz;
  const delay = v.geometry.wheelbase / speed;
  const G = dynamicStiffness(v, [0, w]);
  const front: Complex = [v.front.tyreRate, w * v.front.tyreDamping];
  const lag: Complex = [Math.cos(w * delay), -Math.sin(w * delay)];
  const rearForce: Complex = [v.rear.tyreRate, w * v.rear.tyreDamping];
  const rear: Complex = [rearForce[0] * lag[0] - rearForce[1] * lag[1], rearForce[0] * lag[1] + rearForce[1] * lag[0]];
  return solveComplex(G, [[0, 0], [0, 0], front, rear]);
}

function fillResponse(out: Response, i: number, re: number, im: number) {
  out.gain[i] = Math.hypot(re, im);
  let ph = Math.atan2(im, re);
  if (i > 0) ph += 2 * Math.PI * Math.round((out.phase[i - 1] - ph) / (2 * Math.PI));
  out.phase[i] = ph;
}

const newResponse = (n: number): Response => ({ gain: new Float64Array(n), phase: new Float64Array(n) });

export function vehicleFrequencyResponse(
  v: LinearVehicle,
  speed: number,
  seats: readonly SeatPosition[],
  freqsHz: Float64Array = logGrid(0.1, 30, 400),
): VehicleFrequencyResponse {
  const n = freqsHz.length;
  const heave = newResponse(n);
  const pitch = newResponse(n);
  const seatResponses = seats.map((s) => ({ name: s.name, ahead: v.geometry.a - s.behindFrontAxle, response: newResponse(n) }));
  for (let i = 0; i < n; i++) {
    const w2 = (2 * Math.PI * freqsHz[i]) ** 2;
    const [z, th] = vehicleDisplacementGains(v, speed, freqsHz[i]);
    fillResponse(heave, i, -w2 * z[0], -w2 * z[1]);
    fillResponse(pitch, i, -w2 * th[0], -w2 * th[1]);
    for (const s of seatResponses) fillResponse(s.response, i, -w2 * (z[0] + s.ahead * th[0]), -w2 * (z[1] + s.ahead * th[1]));
  }
  return { freq: freqsHz, heave, pitch, seats: seatResponses.map(({ name, response }) => ({ name, response })) };
}

/**
 * Wheelbase-filter frequencies up to maxHz, from the delay L/V alone: heave vanishes where the
 * rear input is in opposition to the front, f = (2n+1)·V/(2L); pitch where it is in phase,
 * f = n·V/L (n ≥ 1).
 */
export function wheelbaseFilterZeros(wheelbase: number, speed: number, maxHz: number): { heaveHz: number[]; pitchHz: number[] } {
  const base = speed / wheelbase;
  const heaveHz: number[] = [];
  const pitchHz: number[] = [];
  for (let n = 0; (n + 0.5) * base <= maxHz; n++) heaveHz.push((n + 0.5) * base);
  for (let n = 1; n * base <= maxHz; n++) pitchHz.push(n * base);
  return { heaveHz, pitchHz };
}
