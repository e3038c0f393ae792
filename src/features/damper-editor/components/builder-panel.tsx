import { useState } from 'react';
import { CurveParameters, curveFromParameters, type DamperShape, damperShapes } from '../../../../shared/sim/damper-builder.ts';
import { curveForce } from '../../../../shared/sim/damper-force.ts';
import type { Damper, DamperCurve } from '../../../../shared/schemas/setup.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, Input, Select } from '../../../components/ui/field.tsx';
import { type DisplayUnit, units } from '../../../lib/format.ts';
import { plainIssue } from '../../../lib/plain-issue.ts';
import { siFromShown } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import type { Direction } from '../model/draft.ts';

type Texts = { lowSpeedSlope: string; kneeVelocity: string; highSpeedSlope: string; shape: DamperShape };

const KNEE_GUESS = 0.1;

const kneeText = (si: number, unit: DisplayUnit) => String(Number(unit.fromSI(si).toPrecision(6)));

/** The builder's fields as their labels say them, for messages. */
const subjects: Record<string, { label: string; unit?: DisplayUnit }> = {
  lowSpeedSlope: { label: 'Low-speed slope', unit: units.Nspm },
  kneeVelocity: { label: 'Knee velocity', unit: units.mps },
  highSpeedSlope: { label: 'High-speed slope', unit: units.Nspm },
  shape: { label: 'Shape' },
};

/** Starting values read off the current curve: slopes below and above a 0.1 m/s knee (shown in `unit`). */
function guess(curve: DamperCurve, unit: DisplayUnit = units.mps): Texts {
  const low = curveForce(curve, KNEE_GUESS) / KNEE_GUESS;
  const high = (curveForce(curve, 0.3) - curveForce(curve, KNEE_GUESS)) / (0.3 - KNEE_GUESS);
  const round = (x: number) => String(Math.max(0, Math.round(x / 10) * 10));
  return { lowSpeedSlope: round(low), kneeVelocity: kneeText(KNEE_GUESS, unit), highSpeedSlope: round(high), shape: 'digressive' };
}

const shapeHints: Record<DamperShape, string> = {
  digressive: 'slope falls above the knee',
  linear: 'slope holds above the knee',
  progressive: 'slope grows above the knee',
};

/**
 * The parametric builder for one direction: a bleed slope up to the knee, then a valve slope
 * that falls, holds or grows (shared/sim/damper-builder.ts). "Fill" replaces that direction's
 * table with the law sampled at the usual dyno speeds plus the knee.
 */
export function BuilderPanel({ direction, damper, onFill }: { direction: Direction; damper: Damper; onFill: (curve: DamperCurve) => void }) {
  const vu = useUnits().damperVelocity;
  const [texts, setTexts] = useState<Texts>(() => guess(damper[direction], vu));
  const [kneeUnit, setKneeUnit] = useState(vu);
  const kneeSI = (text: string, unit: DisplayUnit) => (text.trim() === '' || !Number.isFinite(Number(text)) ? Number.NaN : siFromShown(unit, Number(text)));
  if (kneeUnit !== vu) {
    // another unit chosen: the knee is re-expressed, never reinterpreted
    const before = kneeSI(texts.kneeVelocity, kneeUnit);
    setKneeUnit(vu);
    if (Number.isFinite(before)) setTexts((t) => ({ ...t, kneeVelocity: kneeText(before, vu) }));
  }
  const parsed = CurveParameters.safeParse({
    lowSpeedSlope: Number(texts.lowSpeedSlope),
    kneeVelocity: kneeSI(texts.kneeVelocity, kneeUnit),
    highSpeedSlope: Number(texts.highSpeedSlope),
    shape: texts.shape,
  });
  const errorOf = (key: keyof Texts) => {
    const issue = parsed.success ? undefined : parsed.error.issues.find((i) => i.path[0] === key);
    return issue && plainIssue(issue, key === 'kneeVelocity' ? { ...subjects[key], unit: kneeUnit } : subjects[key]);
  };
  const set = (key: keyof Texts) => (e: { target: { value: string } }) => setTexts((t) => ({ ...t, [key]: e.target.value }));
  const title = direction === 'compression' ? 'Compression' : 'Rebound';
  return (
    <fieldset className="grid gap-2 rounded border border-rule p-3" aria-label={`${title} builder`}>
      <legend className="px-1 text-sm font-semibold text-ink">{title}</legend>
      <div className="grid grid-cols-2 gap-2">
        <Field label="Low-speed slope [N·s/m]" error={errorOf('lowSpeedSlope')}>
          <Input inputMode="decimal" className="figures text-right" value={texts.lowSpeedSlope} onChange={set('lowSpeedSlope')} />
        </Field>
        <Field label={`Knee velocity [${vu.symbol}]`} error={errorOf('kneeVelocity')}>
          <Input inputMode="decimal" className="figures text-right" value={texts.kneeVelocity} onChange={set('kneeVelocity')} />
        </Field>
        <Field label="High-speed slope [N·s/m]" error={errorOf('highSpeedSlope')}>
          <Input inputMode="decimal" className="figures text-right" value={texts.highSpeedSlope} onChange={set('highSpeedSlope')} />
        </Field>
        <Field label="Shape" hint={shapeHints[texts.shape]}>
          <Select value={texts.shape} onChange={set('shape')} className="pr-5 pl-1.5 text-sm">
            {damperShapes.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <div>
        <Button size="sm" variant="secondary" disabled={!parsed.success} onClick={() => parsed.success && onFill(curveFromParameters(parsed.data))}>
          Fill the {direction} table
        </Button>
      </div>
    </fieldset>
  );
}
