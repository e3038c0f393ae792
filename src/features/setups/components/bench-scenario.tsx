import { useId, useState } from 'react';
import type { RoadInput } from '../../../../shared/schemas/road.ts';
import type { SpeedUnit } from '../../../../shared/schemas/unit-preferences.ts';
import { kmhToMPerS } from '../../../../shared/units.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { parseTyped } from '../model/setup-units.ts';

/** Roads the bench can try a setup on at once, without choosing from the road library. */
export const benchRoads: Array<{ key: string; words: string; road: RoadInput }> = [
  { key: 'iso-b', words: 'ISO 8608 class B (good)', road: { kind: 'iso8608', name: 'Class B, seed 7', class: 'B', seed: 7 } },
  { key: 'iso-c', words: 'ISO 8608 class C (average)', road: { kind: 'iso8608', name: 'Class C, seed 7', class: 'C', seed: 7 } },
  { key: 'iso-d', words: 'ISO 8608 class D (poor)', road: { kind: 'iso8608', name: 'Class D, seed 7', class: 'D', seed: 7 } },
  { key: 'bump', words: 'Half-sine bump 40 mm × 0.6 m', road: { kind: 'bump', name: 'Bump 40 mm', height: 0.04, length: 0.6, at: 20 } },
];

export interface BenchScenario {
  roadKey: string;
  /** m/s */
  speed: number;
}

export const defaultScenario: BenchScenario = { roadKey: 'iso-c', speed: kmhToMPerS(60) };

/** Round speeds offered beside the field, in each unit the person may read speeds in. */
const presets: Record<SpeedUnit, number[]> = { 'km/h': [30, 50, 60, 80, 100, 130], 'm/s': [10, 15, 20, 25, 30, 35], mph: [20, 30, 40, 50, 60, 80] };
/** Fastest speed a run takes, m/s (360 km/h). */
const MAX_SPEED = 100;

const speedText = (x: number) => String(Number(x.toFixed(2)));

/** Road and speed of the bench's live run: any speed typed in the preferred unit, or a preset. */
export function BenchScenarioPicker({ value, onChange }: { value: BenchScenario; onChange: (s: BenchScenario) => void }) {
  const id = useId();
  const { speed: unit, prefs } = useUnits();
  const [typed, setTyped] = useState<{ text: string; for: number; unit: string } | null>(null);
  // what the field shows: the person's own text while it still stands for the current speed
  const text = typed && typed.for === value.speed && typed.unit === unit.symbol ? typed.text : speedText(unit.fromSI(value.speed));
  const n = parseTyped(text);
  const si = n === undefined || Number.isNaN(n) ? Number.NaN : unit.toSI(n);
  const bad = !(si > 0 && si <= MAX_SPEED);

  const type = (next: string) => {
    const m = parseTyped(next);
    const nextSi = m === undefined || Number.isNaN(m) ? Number.NaN : unit.toSI(m);
    if (nextSi > 0 && nextSi <= MAX_SPEED) {
      setTyped({ text: next, for: nextSi, unit: unit.symbol });
      onChange({ ...value, speed: nextSi });
    } else setTyped({ text: next, for: value.speed, unit: unit.symbol });
  };

  return (
    <div className="flex flex-wrap items-center gap-2 text-sm">
      <label htmlFor={`${id}-road`} className="text-ink-soft">
        Try on
      </label>
      <select id={`${id}-road`} value={value.roadKey} onChange={(e) => onChange({ ...value, roadKey: e.target.value })} className="h-7 rounded-sm border border-rule-strong bg-paper-raised px-1.5">
        {benchRoads.map((r) => (
          <option key={r.key} value={r.key}>
            {r.words}
          </option>
        ))}
      </select>
      <label htmlFor={`${id}-speed`} className="text-ink-soft">
        at
      </label>
      <span className="inline-flex items-center gap-1">
        <input
          id={`${id}-speed`}
          inputMode="decimal"
          aria-invalid={bad || undefined}
          aria-describedby={bad ? `${id}-speed-problem` : undefined}
          value={text}
          onChange={(e) => type(e.target.value)}
          className={`figures h-7 w-16 rounded-sm border bg-paper-raised px-1.5 text-right ${bad ? 'border-danger' : 'border-rule-strong'}`}
        />
        <span className="text-ink-soft">{unit.symbol}</span>
      </span>
      <span role="group" aria-label="Speed presets" className="inline-flex gap-0.5">
        {presets[prefs.speed].map((p) => (
          <button
            key={p}
            type="button"
            onClick={() => {
              setTyped(null);
              onChange({ ...value, speed: unit.toSI(p) });
            }}
            className="figures h-7 rounded-sm px-1.5 text-xs text-ink-soft hover:bg-paper-sunk"
          >
            {p}
          </button>
        ))}
      </span>
      {bad && (
        <span id={`${id}-speed-problem`} role="alert" className="text-xs text-danger">
          a speed above 0 and at most {speedText(unit.fromSI(MAX_SPEED))} {unit.symbol}
        </span>
      )}
    </div>
  );
}

export const roadOf = (s: BenchScenario): RoadInput => (benchRoads.find((r) => r.key === s.roadKey) ?? benchRoads[1]).road;
