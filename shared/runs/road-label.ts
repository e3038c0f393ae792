import type { RoadInput } from '../schemas/road.ts';

const mm = (m: number) => `${+(m * 1000).toPrecision(3)} mm`;
const m = (x: number) => `${+x.toPrecision(3)} m`;

/** A road's own name, or a plain description of it ("ISO 8608 class C, seed 7"). */
export function roadLabel(road: RoadInput, seed?: number): string {
  if (road.name) {
    const reseeded = road.kind === 'iso8608' && seed !== undefined && seed !== road.seed;
    return reseeded ? `${road.name} · seed ${seed}` : road.name;
  }
  switch (road.kind) {
    case 'iso8608':
      return `ISO 8608 class ${road.class}, seed ${seed ?? road.seed}`;
    case 'sine':
      return `Sine ${mm(road.amplitude)} over ${m(road.wavelength)}`;
    case 'sweep':
      return `Sweep ${+road.startFrequency.toPrecision(3)}–${+road.endFrequency.toPrecision(3)} Hz`;
    case 'bump':
      return `Bump ${mm(road.height)} × ${m(road.length)} at ${m(road.at)}`;
    case 'pothole':
      return `Pothole ${mm(road.depth)} × ${m(road.length)} at ${m(road.at)}`;
    case 'kerb':
      return `Kerb ${road.height > 0 ? 'up' : 'down'} ${mm(Math.abs(road.height))} at ${m(road.at)}`;
    case 'measured':
      return `Measured profile, ${road.points.length} points`;
  }
}

/** The seed a run actually used: the run's own for an ISO road, else the road's; null for other roads. */
export function effectiveSeed(road: RoadInput, seed?: number): number | null {
  return road.kind === 'iso8608' ? (seed ?? road.seed) : null;
}
