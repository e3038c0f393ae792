import { studyParameters, type StudyParameter } from '../../../../../shared/schemas/study.ts';
import { Field, Input, Select } from '../../../../components/ui/field.tsx';
import { useStudyDisplay } from '../../model/display.ts';
import type { Setup } from '../../../../../shared/schemas/setup.ts';
import { startingRange } from '../../model/study-form.ts';
import { useFieldError, useStudyFormContext } from './field-error.ts';

/** One swept parameter and its range; picking a parameter fills in a range centred on the base setup's value. */
const ordinal = ['First', 'Second', 'Third', 'Fourth'];

export function AxisFieldset({ index: i, base }: { index: number; base: Setup | undefined }) {
  const { register, setValue } = useStudyFormContext();
  const e = useFieldError();
  const display = useStudyDisplay();
  return (
    <fieldset className="rounded border border-rule p-3" aria-label={`${ordinal[i]} swept parameter`}>
      <legend className="px-1 text-sm font-semibold">{i === 0 ? 'Swept parameter' : `${ordinal[i]} swept parameter`}</legend>
      <Field label="Parameter" error={e(`axes.${i}.parameter`)} className="mb-2">
        <Select
          {...register(`axes.${i}.parameter`, {
            onChange: (ev: React.ChangeEvent<HTMLSelectElement>) => {
              const d = startingRange(ev.target.value as StudyParameter, base, display);
              setValue(`axes.${i}.from`, d.from);
              setValue(`axes.${i}.to`, d.to);
              setValue(`axes.${i}.steps`, d.steps);
            },
          })}
        >
          {studyParameters.map((p) => (
            <option key={p} value={p}>
              {display.parameterLabel(p)}
            </option>
          ))}
        </Select>
      </Field>
      <div className="grid grid-cols-[1fr_1fr_5rem_7rem] items-start gap-2">
        <Field label="From" error={e(`axes.${i}.from`)}>
          <Input type="number" step="any" inputMode="decimal" {...register(`axes.${i}.from`, { valueAsNumber: true })} />
        </Field>
        <Field label="To" error={e(`axes.${i}.to`)}>
          <Input type="number" step="any" inputMode="decimal" {...register(`axes.${i}.to`, { valueAsNumber: true })} />
        </Field>
        <Field label="Steps" error={e(`axes.${i}.steps`)}>
          <Input type="number" min={1} max={100} {...register(`axes.${i}.steps`, { valueAsNumber: true })} />
        </Field>
        <Field label="Spacing" error={e(`axes.${i}.spacing`)}>
          <Select {...register(`axes.${i}.spacing`)}>
            <option value="linear">even</option>
            <option value="log">by ratio</option>
          </Select>
        </Field>
      </div>
    </fieldset>
  );
}
