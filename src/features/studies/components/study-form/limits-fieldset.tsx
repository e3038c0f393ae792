import { Field, Input } from '../../../../components/ui/field.tsx';
import { formatSig } from '../../../../lib/format.ts';
import { useUnits } from '../../../../lib/units/use-units.tsx';
import { useFieldError, useStudyFormContext } from './field-error.ts';

/** Limits every road and speed must keep for a point to count as acceptable. `baseSag`: the base setup's static sag, m. */
export function LimitsFieldset({ baseSag }: { baseSag?: number }) {
  const { register } = useStudyFormContext();
  const e = useFieldError();
  const { length } = useUnits();
  return (
    <fieldset className="rounded border border-rule p-3" aria-label="Limits">
      <legend className="px-1 text-sm font-semibold">Limits (on every road and speed)</legend>
      <div className="grid grid-cols-3 items-end gap-2">
        <Field label="Most stroke used [%]" error={e('maxStrokeUsed')}>
          <Input inputMode="decimal" {...register('maxStrokeUsed')} />
        </Field>
        <Field label="Most time off the road [%]" error={e('maxLiftOff')}>
          <Input inputMode="decimal" {...register('maxLiftOff')} />
        </Field>
        <Field label="Least tyre load [N]" error={e('minTyreLoad')}>
          <Input inputMode="decimal" {...register('minTyreLoad')} />
        </Field>
        <Field label={`Least static sag [${length.symbol}]`} error={e('minSag')}>
          <Input inputMode="decimal" {...register('minSag')} />
        </Field>
        <Field label={`Most static sag [${length.symbol}]`} error={e('maxSag')}>
          <Input inputMode="decimal" {...register('maxSag')} />
        </Field>
        <p className="self-center text-xs text-ink-soft" data-testid="base-sag">
          {baseSag === undefined ? 'Static sag of the base: loading…' : `Static sag of the base: ${formatSig(length.fromSI(baseSag), 3)} ${length.symbol} (spring and tyre)`}
        </p>
      </div>
      <p className="mt-2 text-xs text-ink-faint">Leave a limit blank for none. A point meets the limits only if every road at every speed does; the others stay on the charts, marked. Sag limits keep the ride height: a softer spring sinks the body and eats compression stroke.</p>
    </fieldset>
  );
}
