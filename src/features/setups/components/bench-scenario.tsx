import { useId } from 'react';
import type { RoadInput } from '../../../../shared/schemas/road.ts';
import { kmhToMPerS, mPerSToKmh } from '../../../../shared/units.ts';

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

/** Road and speed of the bench's live run. */
export function BenchScenarioPicker({ value, onChange }: { value: BenchScenario; onChange: (s: BenchScenario) => void }) {
  const id = useId();
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
      <select
        id={`${id}-speed`}
        value={Math.round(mPerSToKmh(value.speed))}
        onChange={(e) => onChange({ ...value, speed: kmhToMPerS(Number(e.target.value)) })}
        className="figures h-7 rounded-sm border border-rule-strong bg-paper-raised px-1.5"
      >
        {[30, 50, 60, 80, 100, 130].map((kmh) => (
          <option key={kmh} value={kmh}>
            {kmh} km/h
          </option>
        ))}
      </select>
    </div>
  );
}

export const roadOf = (s: BenchScenario): RoadInput => (benchRoads.find((r) => r.key === s.roadKey) ?? benchRoads[1]).road;
