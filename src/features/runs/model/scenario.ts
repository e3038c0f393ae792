import type { Road } from '../../../../shared/schemas/road.ts';
import { kmhToMPerS } from '../../../../shared/units.ts';
import { buildInlineRoad, initialValues, type InlineKind } from './inline-road.ts';

/**
 * The scenario of a run, as typed (strings in display units) and as resolved (SI). Shared by
 * the single-run form and the comparison, so both read a road, a speed and a duration alike.
 */
export const INLINE_ROAD = '__inline__';

export interface ScenarioDraft {
  /** A library road id, or INLINE_ROAD. */
  roadChoice: string;
  kind: InlineKind;
  isoClass: string;
  road: Record<string, string>;
  speed: string;
  speedUnit: 'kmh' | 'mps';
  duration: string;
  /** Replaces the seed of a library ISO road; blank keeps the road's own. */
  seed: string;
}

export interface Scenario {
  road: Road;
  roadId: string | null;
  speed: number;
  duration: number;
  seed?: number;
}

export const initialScenario = (): ScenarioDraft => ({
  roadChoice: INLINE_ROAD,
  kind: 'iso8608',
  isoClass: 'C',
  road: initialValues('iso8608'),
  speed: '60',
  speedUnit: 'kmh',
  duration: '20',
  seed: '',
});

export type ScenarioErrors = Partial<Record<'roadChoice' | 'isoClass' | 'speed' | 'duration' | 'seed' | `road.${string}`, string>>;
export type ScenarioOutcome = { ok: true; scenario: Scenario } | { ok: false; errors: ScenarioErrors };

const num = (text: string) => (text.trim() === '' ? NaN : Number(text.trim().replace(',', '.')));

/** Resolves a draft; `libraryRoad` is the definition of the chosen library road once loaded. */
export function resolveScenario(draft: ScenarioDraft, libraryRoad: Road | undefined): ScenarioOutcome {
  const errors: ScenarioErrors = {};
  let road: Road | undefined;
  if (draft.roadChoice === INLINE_ROAD) {
    const built = buildInlineRoad(draft.kind, draft.road, draft.isoClass);
    if (built.ok) road = built.road;
    else for (const [name, message] of Object.entries(built.errors)) errors[name === 'class' ? 'isoClass' : (`road.${name}` as const)] = message;
  } else if (!libraryRoad) errors.roadChoice = 'The road is still loading';
  else road = libraryRoad;

  const shown = num(draft.speed);
  const speed = draft.speedUnit === 'kmh' ? kmhToMPerS(shown) : shown;
  if (!(speed > 0 && speed <= 100)) errors.speed = 'Between 0 and 360 km/h (100 m/s)';
  const duration = num(draft.duration);
  if (!(duration > 0 && duration <= 600)) errors.duration = 'Between 0 and 600 s';
  let seed: number | undefined;
  if (draft.seed.trim() !== '' && draft.roadChoice !== INLINE_ROAD && road?.kind === 'iso8608') {
    seed = num(draft.seed);
    if (!Number.isInteger(seed) || seed < 0) errors.seed = 'A whole number ≥ 0';
  }
  if (Object.keys(errors).length > 0 || !road) return { ok: false, errors };
  return { ok: true, scenario: { road, roadId: draft.roadChoice === INLINE_ROAD ? null : draft.roadChoice, speed, duration, seed } };
}
