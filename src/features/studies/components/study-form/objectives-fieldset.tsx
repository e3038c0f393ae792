import { useFieldArray } from 'react-hook-form';
import { studyFigureKeys, type StudyFigureKey } from '../../../../../shared/schemas/study.ts';
import { studyFigureInfo } from '../../../../../shared/study/figures.ts';
import { Button } from '../../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../../components/ui/field.tsx';
import { useStudyDisplay } from '../../model/display.ts';
import { useFieldError, useStudyFormContext } from './field-error.ts';

const comfortChoices = studyFigureKeys.filter((k) => studyFigureInfo[k].family === 'comfort');
const gripChoices = studyFigureKeys.filter((k) => studyFigureInfo[k].family === 'grip');

function nextFigure(taken: (StudyFigureKey | undefined)[] = []): StudyFigureKey {
  return studyFigureKeys.find((k) => !taken.includes(k)) ?? 'vdv';
}

/** The weighted figures a point is judged by, and the two figures on the trade-off chart's axes. */
export function ObjectivesFieldset({ taken }: { taken: (StudyFigureKey | undefined)[] | undefined }) {
  const { register, control } = useStudyFormContext();
  const objectives = useFieldArray({ control, name: 'objectives' });
  const e = useFieldError();
  const { figureLabel } = useStudyDisplay();
  return (
    <fieldset className="rounded border border-rule p-3" aria-label="Judge by">
      <legend className="px-1 text-sm font-semibold">Judge by</legend>
      <div className="space-y-2">
        {objectives.fields.map((field, i) => (
          <div key={field.id} className="flex items-start gap-2">
            <Field label={`Figure ${i + 1}`} error={e(`objectives.${i}.figure`)} className="flex-1">
              <Select {...register(`objectives.${i}.figure`)}>
                {studyFigureKeys.map((k) => (
                  <option key={k} value={k}>
                    {figureLabel(k)}
                  </option>
                ))}
              </Select>
            </Field>
            <Field label="Weight" error={e(`objectives.${i}.weight`)} className="w-24">
              <Input type="number" min={0} max={100} step="any" {...register(`objectives.${i}.weight`, { valueAsNumber: true })} />
            </Field>
            {objectives.fields.length > 1 && (
              <Button variant="quiet" size="sm" className="mt-6" onClick={() => objectives.remove(i)}>
                Remove
              </Button>
            )}
          </div>
        ))}
        <FormError message={e('objectives')} />
        {objectives.fields.length < 6 && (
          <Button variant="quiet" size="sm" onClick={() => objectives.append({ figure: nextFigure(taken), weight: 1 })}>
            Add a figure
          </Button>
        )}
      </div>
      <div className="mt-3 grid grid-cols-2 gap-2">
        <Field label="Comfort axis">
          <Select {...register('comfortFigure')}>
            {comfortChoices.map((k) => (
              <option key={k} value={k}>
                {figureLabel(k, false)}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Grip axis">
          <Select {...register('gripFigure')}>
            {gripChoices.map((k) => (
              <option key={k} value={k}>
                {figureLabel(k, false)}
              </option>
            ))}
          </Select>
        </Field>
      </div>
    </fieldset>
  );
}
