import type { SetupSummary } from '../../../../../shared/schemas/setup-record.ts';
import { Field, Input, Select } from '../../../../components/ui/field.tsx';
import { useFieldError, useStudyFormContext } from './field-error.ts';

/** Name, base setup and its revision: what the study starts from. */
export function BaseFields({ setups, chosen, revisionNumbers }: { setups: SetupSummary[]; chosen: SetupSummary | undefined; revisionNumbers: number[] | undefined }) {
  const { register, setValue } = useStudyFormContext();
  const e = useFieldError();
  return (
    <div className="flex flex-wrap gap-3">
      <Field label="Study name" error={e('name')} className="min-w-[16rem] flex-[2]">
        <Input {...register('name')} />
      </Field>
      <Field label="Base setup" error={e('setupId')} className="min-w-[14rem] flex-[2]">
        <Select {...register('setupId', { onChange: () => setValue('revision', '') })}>
          {setups.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Revision" error={e('revision')} className="w-32">
        <Select {...register('revision')} disabled={!chosen}>
          {(revisionNumbers ?? (chosen ? [chosen.latestRevision] : [])).map((n) => (
            <option key={n} value={String(n)}>
              r{n}
            </option>
          ))}
        </Select>
      </Field>
    </div>
  );
}
