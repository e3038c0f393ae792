import { useFieldArray } from 'react-hook-form';
import type { RoadListItem } from '../../../../../shared/schemas/road-record.ts';
import { isoClasses } from '../../../../../shared/schemas/road.ts';
import { Button } from '../../../../components/ui/button.tsx';
import { Field, Input, Select } from '../../../../components/ui/field.tsx';
import { useUnits } from '../../../../lib/units/use-units.tsx';
import { useFieldError, useStudyFormContext } from './field-error.ts';

/** Roads from the library or generated, their seeds, the speeds, run length and how they combine. */
export function RoadsFieldset({ libraryRoads, firstRoad, sweptSpeed }: { libraryRoads: RoadListItem[]; firstRoad: string; sweptSpeed: boolean }) {
  const { register, control } = useStudyFormContext();
  const roadRows = useFieldArray({ control, name: 'roads' });
  const e = useFieldError();
  const speed = useUnits().speed;
  return (
    <fieldset className="rounded border border-rule p-3" aria-label="Roads and speeds">
      <legend className="px-1 text-sm font-semibold">Roads and speeds</legend>
      <div className="space-y-2">
        {roadRows.fields.map((field, i) => (
          <div key={field.id} className="flex flex-wrap items-start gap-2">
            <Field label={`Road ${i + 1}`} error={e(`roads.${i}.choice`)} className="min-w-[18rem] flex-[3]">
              <Select {...register(`roads.${i}.choice`)}>
                {libraryRoads.length ? (
                  <optgroup label="Road library">
                    {libraryRoads.map((r) => (
                      <option key={r.id} value={`library:${r.id}`}>
                        {r.name}
                      </option>
                    ))}
                  </optgroup>
                ) : null}
                <optgroup label="Generated ISO 8608 road (seed 7)">
                  {isoClasses.map((c) => (
                    <option key={c} value={`iso:${c}`}>
                      ISO 8608 class {c}
                    </option>
                  ))}
                </optgroup>
              </Select>
            </Field>
            <Field label="Seed" hint="blank: the road's own" error={e(`roads.${i}.seed`)} className="w-32">
              <Input inputMode="numeric" {...register(`roads.${i}.seed`)} />
            </Field>
            {roadRows.fields.length > 1 && (
              <Button variant="quiet" size="sm" className="mt-6" onClick={() => roadRows.remove(i)}>
                Remove
              </Button>
            )}
          </div>
        ))}
        {roadRows.fields.length < 8 && (
          <Button variant="quiet" size="sm" onClick={() => roadRows.append({ choice: firstRoad, seed: '' })}>
            Add a road
          </Button>
        )}
      </div>
      <div className="mt-3 flex flex-wrap gap-3">
        <Field label={`Speeds [${speed.symbol}]`} hint={sweptSpeed ? 'speed is swept' : 'separate several with commas'} error={e('speeds')} className="w-64">
          <Input {...register('speeds')} disabled={sweptSpeed} />
        </Field>
        <Field label="Run length [s]" error={e('duration')} className="w-32">
          <Input type="number" min={1} max={600} step="any" {...register('duration', { valueAsNumber: true })} />
        </Field>
        <Field label="Road seeds per point" hint="ISO 8608 roads only" error={e('seeds')} className="w-40">
          <Input type="number" min={1} max={50} {...register('seeds', { valueAsNumber: true })} />
        </Field>
        <Field label="Over roads and speeds" hint="how each point's figures combine" className="w-52">
          <Select {...register('aggregate')}>
            <option value="mean">take the mean</option>
            <option value="worst">take the worst</option>
          </Select>
        </Field>
      </div>
      <p className="mt-2 text-xs text-ink-soft">
        With several seeds each point runs over as many ISO 8608 profiles (seed 1 is the road&apos;s own, the others derived from it) and shows their mean and spread; event and measured roads are the same for every seed.
      </p>
    </fieldset>
  );
}
