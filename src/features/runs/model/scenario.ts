import type { Road } from '../../../../shared/schemas/road.ts';
import type { SpeedUnit } from '../../../../shared/schemas/unit-preferences.ts';
import { convertShown, unitTable } from '../../../lib/units/unit-table.ts';
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
  speedUnit: SpeedUnit;
  /** The speed in m/s while it is only re-expressed in another unit (not retyped), so km/h → m/s → km/h gives back 60, not 60.0001. */
  exactSpeed?: number;
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

/** Text of a speed for the field: at most 4 decimals, no float noise (60 km/h → "16.6667" m/s). */
const speedText = (x: number) => String(Number(x.toFixed(4)));

/** The starting scenario: class C at 60 km/h, the speed shown in `speedUnit`. */
export const initialScenario = (speedUnit: SpeedUnit = 'km/h'): ScenarioDraft => ({
  roadChoice: INLINE_ROAD,
  kind: 'iso8608',
  isoClass: 'C',
  road: initialValues('iso8608'),
  speed: speedText(convertShown('speed', 60, 'km/h', speedUnit)),
  speedUnit,
  duration: '20',
  seed: '',
});

export type ScenarioErrors = Partial<Record<'roadChoice' | 'isoClass' | 'speed' | 'duration' | 'seed' | `road.${string}`, string>>;
export type ScenarioOutcome = { ok: true; scenario: Scenario } | { ok: false; errors: ScenarioErrors };

/** Fastest road speed a run takes, m/s (360 km/h). */
const MAX_SPEED = 100;

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
  const speed = draft.exactSpeed ?? unitTable.speed[draft.speedUnit].toSI(shown);
  if (!(speed > 0 && speed <= MAX_SPEED)) errors.speed = `A speed above 0 and at most ${speedText(unitTable.speed[draft.speedUnit].fromSI(MAX_SPEED))} ${draft.speedUnit}`;
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

/**
 * The draft with its speed shown in another unit: the number is converted (60 km/h becomes
 * 16.6667 m/s), never kept. Text that is not a number is left as typed.
 */
export function switchSpeedUnit(draft: ScenarioDraft, to: SpeedUnit): ScenarioDraft {
  const shown = num(draft.speed);
  if (!Number.isFinite(shown)) return { ...draft, speedUnit: to };
  const exactSpeed = draft.exactSpeed ?? unitTable.speed[draft.speedUnit].toSI(shown);
  return { ...draft, speed: speedText(unitTable.speed[to].fromSI(exactSpeed)), speedUnit: to, exactSpeed };
}
