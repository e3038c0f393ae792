import { useState } from 'react';
import type { RoadInput } from '../../../../shared/schemas/road.ts';
import type { SetupInput } from '../../../../shared/schemas/setup.ts';
import { Input } from '../../../components/ui/field.tsx';
import { siFromShown } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { LiveRunPanel } from './live-run-panel.tsx';

type Direction = 'compression' | 'rebound';
type Points = [number, number][];

/** Text of a number for an input: trailing float noise dropped (0.1 m/s → "100" mm/s). */
const show = (x: number) => String(Number(x.toPrecision(6)));

/**
 * A scratch copy of a setup to try changes on: damper points and the spring rate in the
 * person's units, with the live run beside it. Nothing here is saved; a setup changes only through a
 * new revision on its own page.
 */
export function LiveTryout({ initial, road, speed, seed }: { initial: SetupInput; road: RoadInput; speed: number; seed?: number }) {
  const { damperVelocity: vu, rate } = useUnits();
  const [setup, setSetup] = useState<SetupInput>(initial);
  // typed text per cell, kept with the unit it was typed in
  const [texts, setTexts] = useState<Record<string, string>>({});
  const [textsUnit, setTextsUnit] = useState(vu.symbol + rate.symbol);
  if (textsUnit !== vu.symbol + rate.symbol) {
    setTextsUnit(vu.symbol + rate.symbol);
    setTexts({});
  }

  const cell = (dir: Direction, i: number, col: 0 | 1) => {
    const key = `${dir}.${i}.${col}`;
    const value = setup.damper[dir][i][col];
    return texts[key] ?? show(col === 0 ? vu.fromSI(value) : value);
  };
  const edit = (dir: Direction, i: number, col: 0 | 1, text: string) => {
    setTexts((t) => ({ ...t, [`${dir}.${i}.${col}`]: text }));
    const n = Number(text.replace(',', '.'));
    if (text.trim() === '' || !Number.isFinite(n)) return;
    const points = setup.damper[dir].map((p) => [...p]) as Points;
    points[i][col] = col === 0 ? siFromShown(vu, n) : n;
    setSetup({ ...setup, damper: { ...setup.damper, [dir]: points } });
  };
  const springText = texts.spring ?? show(rate.fromSI(setup.springRate));

  return (
    <div className="grid gap-3 lg:grid-cols-[1fr_22rem]">
      <div className="rounded border border-rule bg-paper-raised p-3">
        <p className="mb-2 text-xs text-ink-soft">A scratch copy of {initial.name}: edit a point and the live run follows. Nothing here is saved.</p>
        <label className="mb-3 flex items-center gap-2 text-sm text-ink-soft">
          Spring rate, {rate.symbol}
          <Input
            className="w-28"
            inputMode="decimal"
            value={springText}
            onChange={(e) => {
              setTexts((t) => ({ ...t, spring: e.target.value }));
              const n = Number(e.target.value.replace(',', '.'));
              if (n > 0) setSetup({ ...setup, springRate: siFromShown(rate, n) });
            }}
          />
        </label>
        <div className="grid gap-4 sm:grid-cols-2">
          {(['compression', 'rebound'] as const).map((dir) => (
            <table key={dir} className="text-sm" aria-label={`${dir} damper points`}>
              <caption className="mb-1 text-left text-xs font-semibold tracking-wide text-ink-soft uppercase">{dir}</caption>
              <thead>
                <tr className="text-2xs text-ink-faint">
                  <th className="text-left font-medium">velocity, {vu.symbol}</th>
                  <th className="text-left font-medium">force, N</th>
                </tr>
              </thead>
              <tbody>
                {setup.damper[dir].map((_, i) => (
                  <tr key={i}>
                    {([0, 1] as const).map((col) => (
                      <td key={col} className="pr-2 pb-1">
                        <Input
                          className="figures h-7 w-24 text-sm"
                          inputMode="decimal"
                          aria-label={`${dir} point ${i + 1} ${col === 0 ? 'velocity' : 'force'}`}
                          value={cell(dir, i, col)}
                          onChange={(e) => edit(dir, i, col, e.target.value)}
                        />
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          ))}
        </div>
      </div>
      <LiveRunPanel setup={setup} road={road} speed={speed} seed={seed} />
    </div>
  );
}
