import { useId } from 'react';
import { useWatch } from 'react-hook-form';
import type { Stroke } from '../../../../../shared/schemas/setup.ts';
import { Link } from 'react-router';
import { type DisplayUnit, formatSig, units } from '../../../../lib/format.ts';
import { useUnits } from '../../../../lib/units/use-units.tsx';
import type { SetupForm as Form } from '../../model/use-setup-draft.ts';
import { DerivedRow, FormBlock, QuantityRow } from './quantity-row.tsx';
import { StopFields } from './stop-fields.tsx';
import { ControlFields, MountFrictionFields } from './strut-part-fields.tsx';
import { ToggleRow } from './toggle-row.tsx';

function WheelRate({ form, unit }: { form: Form; unit: DisplayUnit }) {
  const [k, mr] = useWatch({ control: form.control, name: ['springRate', 'motionRatio'] });
  const value = typeof k === 'number' && typeof mr === 'number' ? k * mr * mr : Number.NaN;
  return (
    <DerivedRow label="Wheel rate (spring × MR²)">
      <span className="figures text-ink">{formatSig(unit.fromSI(value), 3)}</span> <span className="text-xs font-light text-ink-faint">{unit.symbol}</span>
    </DerivedRow>
  );
}

function StrokeFields({ form }: { form: Form }) {
  const { length } = useUnits();
  const stroke = useWatch({ control: form.control, name: 'stroke' }) as Stroke | undefined;
  return (
    <>
      <ToggleRow
        label="Stroke available"
        hint={stroke ? 'from static' : 'not given'}
        checked={Boolean(stroke)}
        onChange={(on) => form.setValue('stroke', (on ? { compression: 0.085, extension: 0.095 } : undefined) as never, { shouldDirty: true, shouldValidate: true })}
      />
      {stroke && (
        <>
          <QuantityRow control={form.control} name="stroke.compression" label="Towards bump" unit={length} />
          <QuantityRow control={form.control} name="stroke.extension" label="Towards rebound" unit={length} />
        </>
      )}
    </>
  );
}

function Notes({ form }: { form: Form }) {
  const id = useId();
  const error = form.formState.errors.notes?.message;
  return (
    <div>
      <label htmlFor={id} className="sr-only">
        Notes
      </label>
      <textarea
        id={id}
        rows={3}
        {...form.register('notes', { setValueAs: (v: string) => (v === '' ? undefined : v) })}
        placeholder="Trim, tyre, load, anything the numbers do not say"
        className="w-full rounded-sm border border-rule-strong bg-paper-raised px-2 py-1 text-sm hover:border-ink-faint focus-visible:border-accent"
      />
      {error && (
        <p role="alert" className="text-xs text-danger">
          {error}
        </p>
      )}
    </div>
  );
}

/**
 * The corner's numbers, in the units engineers use, stored in SI. The damper (curves and gas
 * charge) is edited in the damper panel beside it; everything else is here.
 */
export function SetupForm({ form }: { form: Form }) {
  const { rate, length } = useUnits();
  const { control } = form;
  return (
    <div aria-label="Setup values" role="group">
      <FormBlock title="Masses">
        <QuantityRow control={control} name="sprungMass" label="Sprung mass" unit={units.kg} />
        <QuantityRow control={control} name="unsprungMass" label="Unsprung mass" unit={units.kg} />
      </FormBlock>
      <FormBlock
        title="Spring"
        aside={
          <Link to="/account" className="text-2xs text-ink-faint hover:text-accent hover:underline" title="Units are chosen on your account page">
            units
          </Link>
        }
      >
        <QuantityRow control={control} name="springRate" label="Spring rate" unit={rate} />
        <QuantityRow control={control} name="motionRatio" label="Motion ratio" unit={units.ratio} hint="damper travel per wheel travel" />
        <WheelRate form={form} unit={rate} />
      </FormBlock>
      <FormBlock title="Tyre">
        <QuantityRow control={control} name="tyreRate" label="Vertical rate" unit={rate} />
        <QuantityRow control={control} name="tyreDamping" label="Damping" unit={units.Nspm} />
        <QuantityRow control={control} name="tyreFootprint" label="Footprint length" unit={length} optional hint="blank: point contact" />
        <QuantityRow control={control} name="tyreRadius" label="Rolling radius (event roads)" unit={length} optional hint="blank: point contact over bumps, potholes and kerbs" />
      </FormBlock>
      <FormBlock title="Strut parts (at the damper)">
        <MountFrictionFields form={form} />
        <ControlFields form={form} />
      </FormBlock>
      <FormBlock title="End stops (at the wheel)">
        <StopFields form={form} which="bumpStop" />
        <StopFields form={form} which="reboundStop" />
      </FormBlock>
      <FormBlock title="Stroke">
        <StrokeFields form={form} />
      </FormBlock>
      <FormBlock title="Notes">
        <Notes form={form} />
      </FormBlock>
    </div>
  );
}
