import Papa from 'papaparse';
import { DamperCurve } from '../schemas/setup.ts';
import { damperForce } from '../sim/damper-force.ts';
import { synthesiseDynoSeries, type SineBlock } from './synthetic-series.ts';

/**
 * The invented damper behind `examples/dyno/pipit-front-sine-record.csv` (a Brume Pipit front
 * damper of the fictional Tallis & Brume Motor Works), and the programme that "measured" it.
 * Kept here so tests can check the example file against the curve it was made from.
 */
export const exampleDamperCurves = {
  compression: DamperCurve.parse([
    [0.05, 250],
    [0.1, 350],
    [0.3, 750],
    [1.0, 1310],
  ]),
  rebound: DamperCurve.parse([
    [0.05, 600],
    [0.1, 825],
    [0.3, 1725],
    [1.0, 2985],
  ]),
};

/** Gas force in the example record, N. */
export const exampleGasForce = 150;

/** One cycle per target peak speed: 5 mm stroke amplitude up to 0.1 m/s, then 25 mm. */
export const exampleProgramme: SineBlock[] = [0.025, 0.05, 0.1, 0.2, 0.3, 0.5, 0.8].map((v) => {
  const amplitude = v <= 0.1 ? 0.005 : 0.025;
  return { amplitude, frequency: v / (2 * Math.PI * amplitude), cycles: 1 };
});

/** Peak speeds of the programme, m/s. */
export const exampleProgrammeSpeeds = exampleProgramme.map((b) => b.amplitude * 2 * Math.PI * b.frequency);

/**
 * The example record as CSV text: 1 kHz, force noise σ = 3 N, displacement to 1 µm, gas force
 * included, columns `time [s], displacement [mm], force [N]`, compression positive.
 */
export function exampleRecordCsv(): string {
  const s = synthesiseDynoSeries((v) => damperForce(exampleDamperCurves, v), exampleProgramme, {
    sampleRate: 1000,
    gasForce: exampleGasForce,
    forceNoise: 3,
    displacementStep: 1e-6,
    seed: 'pipit-front-sine',
  });
  const rows = s.time.map((t, i) => [t.toFixed(3), (s.displacement[i] * 1000).toFixed(3), s.force[i].toFixed(1)]);
  const head = [
    '# Tallis & Brume Motor Works - Brume Pipit front damper, unit PF-0142 (invented example data)',
    '# sine programme, one cycle per speed, gas force included, compression positive',
  ].join('\n');
  return `${head}\n${Papa.unparse({ fields: ['time [s]', 'displacement [mm]', 'force [N]'], data: rows }, { newline: '\n' })}\n`;
}
