import { useState } from 'react';
import { useWatch } from 'react-hook-form';
import type { ControlLaw } from '../../../../../shared/schemas/damper-control.ts';
import type { DamperCurve, DamperControl, StrutFriction, TopMount } from '../../../../../shared/schemas/setup.ts';
import { units } from '../../../../lib/format.ts';
import { useUnits } from '../../../../lib/units/use-units.tsx';
import type { SetupForm } from '../../model/use-setup-draft.ts';
import { DerivedRow, QuantityRow } from './quantity-row.tsx';
import { ChoiceRow, ToggleRow } from './toggle-row.tsx';

type LawKind = ControlLaw['kind'];
const lawDefaults: Record<LawKind, ControlLaw> = {
  skyhook: { kind: 'skyhook', mode: 'continuous', gain: 2500 } as ControlLaw,
  groundhook: { kind: 'groundhook', mode: 'continuous', gain: 1500 } as ControlLaw,
  blend: { kind: 'blend', mode: 'continuous', skyGain: 2500, groundGain: 1500, blend: 0.7 } as ControlLaw,
};
/** Firm tables start as the soft ones times this (common practice for a first two-state valve). */
const FIRM_FACTOR = 2.5;
const scaled = (curve: DamperCurve | undefined, k: number) => (curve ?? []).map(([v, f]) => [v, f * k]);

/** The damper's top mount and strut friction: each present or not. */
export function MountFrictionFields({ form }: { form: SetupForm }) {
  const { control, setValue } = form;
  const { rate, damperVelocity } = useUnits();
  const mount = useWatch({ control, name: 'topMount' }) as TopMount | undefined;
  const friction = useWatch({ control, name: 'friction' }) as StrutFriction | undefined;
  const set = (path: string, value: unknown) => setValue(path as never, value as never, { shouldDirty: true, shouldValidate: true });
  return (
    <>
      <ToggleRow label="Top mount" hint={mount ? 'in series with the damper' : 'rigid'} checked={Boolean(mount)} onChange={(on) => set('topMount', on ? { rate: 1.5e6, damping: 0 } : undefined)} />
      {mount && (
        <>
          <QuantityRow control={control} name="topMount.rate" label="Mount rate" unit={rate} hint="along the damper" />
          <QuantityRow control={control} name="topMount.damping" label="Mount damping" unit={units.Nspm} />
        </>
      )}
      <ToggleRow label="Strut friction" hint={friction ? 'smoothed Coulomb' : 'none'} checked={Boolean(friction)} onChange={(on) => set('friction', on ? { breakaway: 80, smoothingSpeed: 0.005 } : undefined)} />
      {friction && (
        <>
          <QuantityRow control={control} name="friction.breakaway" label="Breakaway force" unit={units.N} />
          <QuantityRow control={control} name="friction.smoothingSpeed" label="Smoothing speed" unit={damperVelocity} hint="76 % of breakaway at this speed" />
        </>
      )}
    </>
  );
}

/** A controlled damper: the damper's tables become its soft bound; the firm bound, the law and the valve's response are here. */
export function ControlFields({ form }: { form: SetupForm }) {
  const { control, setValue, getValues } = form;
  const ctl = useWatch({ control, name: 'damper.control' }) as DamperControl | undefined;
  const [factor, setFactor] = useState(FIRM_FACTOR);
  const set = (path: string, value: unknown) => setValue(path as never, value as never, { shouldDirty: true, shouldValidate: true });
  const firmFrom = (k: number) => ({ compression: scaled(getValues('damper.compression') as DamperCurve, k), rebound: scaled(getValues('damper.rebound') as DamperCurve, k) });
  const law = ctl?.law;
  return (
    <>
      <ToggleRow
        label="Controlled damper"
        hint={ctl ? 'damper tables are its soft bound' : 'passive'}
        checked={Boolean(ctl)}
        onChange={(on) => set('damper.control', on ? { firm: firmFrom(FIRM_FACTOR), responseTime: 0.01, bounds: 'tables', law: structuredClone(lawDefaults.skyhook) } : undefined)}
      />
      {ctl && law && (
        <>
          <ChoiceRow<LawKind>
            label="Control law"
            value={law.kind}
            options={[
              ['skyhook', 'skyhook (body)'],
              ['groundhook', 'groundhook (wheel)'],
              ['blend', 'blend of both'],
            ]}
            onChange={(kind) => set('damper.control.law', { ...structuredClone(lawDefaults[kind]), mode: law.mode })}
          />
          <ChoiceRow<ControlLaw['mode']>
            label="Valve use"
            value={law.mode ?? 'continuous'}
            options={[
              ['continuous', 'continuous'],
              ['onOff', 'on / off'],
            ]}
            onChange={(mode) => set('damper.control.law.mode', mode)}
          />
          {law.kind === 'blend' ? (
            <>
              <QuantityRow control={control} name="damper.control.law.skyGain" label="Skyhook gain" unit={units.Nspm} />
              <QuantityRow control={control} name="damper.control.law.groundGain" label="Groundhook gain" unit={units.Nspm} />
              <QuantityRow control={control} name="damper.control.law.blend" label="Skyhook share" unit={units.ratio} hint="0 all groundhook, 1 all skyhook" />
            </>
          ) : (
            <QuantityRow control={control} name="damper.control.law.gain" label={law.kind === 'skyhook' ? 'Skyhook gain' : 'Groundhook gain'} unit={units.Nspm} hint="at the damper, like the tables" />
          )}
          <QuantityRow control={control} name="damper.control.responseTime" label="Valve response time" unit={units.ms} hint="first-order lag; 0: at once" />
          <DerivedRow label="Firm tables">
            <span className="figures text-ink">
              {ctl.firm.compression.length} + {ctl.firm.rebound.length} points
            </span>
          </DerivedRow>
          <div className="flex items-center justify-end gap-2 border-b border-rule/50 py-1 text-xs text-ink-soft">
            <label className="flex items-center gap-1">
              firm = soft ×
              <input
                type="number"
                step="0.1"
                min="1"
                value={factor}
                onChange={(e) => setFactor(Number(e.target.value))}
                aria-label="Firm tables as a multiple of the soft ones"
                className="figures h-6 w-14 rounded-sm border border-rule-strong bg-paper-raised px-1 text-right"
              />
            </label>
            <button type="button" disabled={!(factor >= 1)} onClick={() => set('damper.control.firm', firmFrom(factor))} className="text-accent hover:text-accent-strong disabled:opacity-40">
              set firm tables
            </button>
          </div>
          <ToggleRow
            label="Ideal actuator (no bounds)"
            hint={ctl.bounds === 'none' ? 'reference only: not a damper' : 'between soft and firm'}
            checked={ctl.bounds === 'none'}
            onChange={(on) => set('damper.control.bounds', on ? 'none' : 'tables')}
          />
        </>
      )}
      <p className="pt-1 text-2xs text-ink-faint">Linear figures take the mount in series and the control as its gains without bounds or lag; they leave friction out.</p>
    </>
  );
}
