import { toNestErrors } from '@hookform/resolvers';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useMemo, useRef } from 'react';
import { type FieldErrors, type Resolver, useFieldArray, useForm, useWatch } from 'react-hook-form';
import { isoClasses } from '../../../../shared/schemas/road.ts';
import { StudyDefinition, studyFigureKeys, studyParameters, type StudyFigureKey, type StudyParameter } from '../../../../shared/schemas/study.ts';
import { studyFigureInfo } from '../../../../shared/study/figures.ts';
import { plannedCounts } from '../../../../shared/study/expand.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../components/ui/field.tsx';
import { Loading } from '../../../components/ui/spinner.tsx';
import { latestRevisionsQueryOptions } from '../../../lib/queries/revisions.ts';
import { roadsQueryOptions } from '../../../lib/queries/roads.ts';
import { setupsQueryOptions } from '../../../lib/queries/setups.ts';
import type { RoadListItem } from '../../../../shared/schemas/road-record.ts';
import type { SetupSummary } from '../../../../shared/schemas/setup-record.ts';
import { figureLabel, parameterLabel } from '../model/display.ts';
import { axisDefaults, defaultFormValues, fieldOfIssue, formToDefinition, type StudyFormValues } from '../model/study-form.ts';

export interface StudyFormProps {
  workspaceId: string;
  busy: boolean;
  /** A message for the whole form (e.g. the server refused the study). */
  error?: string;
  /** Field problems the server named, by schema path. */
  serverFields?: { path: string; message: string }[];
  onSubmit: (definition: StudyDefinition) => void;
}

const errorAt = (errors: FieldErrors<StudyFormValues>, path: string): string | undefined => {
  let node: unknown = errors;
  for (const part of path.split('.')) node = (node as Record<string, unknown> | undefined)?.[part];
  return (node as { message?: string } | undefined)?.message;
};

/**
 * The study definition: base revision, one or two swept parameters, roads and speeds, the
 * figures to judge by with their weights, and the limits. Checked by the shared study schema
 * (its messages go to the field they concern) before anything is sent.
 */
export function StudyForm(props: StudyFormProps) {
  const setups = useQuery(setupsQueryOptions(props.workspaceId));
  const roads = useQuery({ ...roadsQueryOptions(props.workspaceId), retry: false });
  if (setups.isPending || roads.isPending) return <Loading what="setups and roads" />;
  if (setups.isError) return <FormError message={setups.error.message} />;
  const list = setups.data.setups;
  if (list.length === 0) return <FormError message="There is no setup in this workspace to start a study from. Make one under Corners first." />;
  // Start on a random road of the library when there is one, else a generated class C road.
  const libraryRoads = roads.data?.roads ?? [];
  const iso = libraryRoads.find((r) => r.kind === 'iso8608');
  const firstRoad = iso ? `library:${iso.id}` : 'iso:C';
  return <StudyFormBody {...props} setups={list} libraryRoads={libraryRoads} firstRoad={firstRoad} />;
}

function StudyFormBody({
  workspaceId,
  busy,
  error,
  serverFields,
  onSubmit,
  setups: live,
  libraryRoads,
  firstRoad,
}: StudyFormProps & { setups: SetupSummary[]; libraryRoads: RoadListItem[]; firstRoad: string }) {
  const revisionIds = useRef<(n: number) => string | undefined>(() => undefined);

  const resolver: Resolver<StudyFormValues, unknown, StudyDefinition> = useMemo(
    () => async (values, _ctx, options) => {
      const parsed = StudyDefinition.safeParse(formToDefinition(values, revisionIds.current));
      if (parsed.success) return { values: parsed.data, errors: {} };
      const flat: Record<string, { type: string; message: string }> = {};
      for (const issue of parsed.error.issues) {
        const field = fieldOfIssue(issue.path);
        flat[field] ??= { type: 'schema', message: issue.message };
      }
      return { values: {}, errors: toNestErrors(flat as FieldErrors, options) };
    },
    [],
  );

  const form = useForm<StudyFormValues, unknown, StudyDefinition>({
    defaultValues: { ...defaultFormValues(firstRoad), setupId: live[0].id, revision: String(live[0].latestRevision) },
    resolver,
  });
  const { register, control, handleSubmit, setValue, setError, formState } = form;
  const axes = useFieldArray({ control, name: 'axes' });
  const roadRows = useFieldArray({ control, name: 'roads' });
  const objectives = useFieldArray({ control, name: 'objectives' });
  const watched = useWatch({ control });

  const setupId = watched.setupId ?? '';
  const chosen = live.find((s) => s.id === setupId);
  const revisions = useQuery(latestRevisionsQueryOptions(workspaceId, chosen?.id));
  revisionIds.current = (n) => revisions.data?.revisions.find((r) => r.number === n)?.id;

  useEffect(() => {
    if (chosen && !watched.revision) setValue('revision', String(chosen.latestRevision));
  }, [chosen, watched.revision, setValue]);
  useEffect(() => {
    for (const f of serverFields ?? []) setError(fieldOfIssue(f.path.replace(/^definition\./, '').split('.')) as never, { type: 'server', message: f.message });
  }, [serverFields, setError]);

  const twoAxes = watched.twoAxes ?? true;
  const counts = useMemo(() => {
    const r = StudyDefinition.safeParse(formToDefinition(watched as StudyFormValues, () => 'x'));
    return r.success ? plannedCounts(r.data) : null;
  }, [watched]);
  const sweptSpeed = (watched.axes ?? []).slice(0, twoAxes ? 2 : 1).some((a) => a?.parameter === 'speed');
  const e = (path: string) => errorAt(formState.errors, path);
  const comfortChoices = studyFigureKeys.filter((k) => studyFigureInfo[k].family === 'comfort');
  const gripChoices = studyFigureKeys.filter((k) => studyFigureInfo[k].family === 'grip');

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate aria-label="Define a study" className="space-y-4 rounded border border-rule bg-paper-raised p-4">
      <div className="flex flex-wrap gap-3">
        <Field label="Study name" error={e('name')} className="min-w-[16rem] flex-[2]">
          <Input {...register('name')} />
        </Field>
        <Field label="Base setup" error={e('setupId')} className="min-w-[14rem] flex-[2]">
          <Select {...register('setupId', { onChange: () => setValue('revision', '') })}>
            {live.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Revision" error={e('revision')} className="w-32">
          <Select {...register('revision')} disabled={!chosen}>
            {(revisions.data?.revisions.map((r) => r.number) ?? (chosen ? [chosen.latestRevision] : [])).map((n) => (
              <option key={n} value={String(n)}>
                r{n}
              </option>
            ))}
          </Select>
        </Field>
      </div>

      <div className="grid gap-3 lg:grid-cols-2">
        {axes.fields.slice(0, twoAxes ? 2 : 1).map((field, i) => (
          <fieldset key={field.id} className="rounded border border-rule p-3" aria-label={i === 0 ? 'First swept parameter' : 'Second swept parameter'}>
            <legend className="px-1 text-sm font-semibold">{i === 0 ? 'Swept parameter' : 'Second swept parameter'}</legend>
            <Field label="Parameter" error={e(`axes.${i}.parameter`)} className="mb-2">
              <Select
                {...register(`axes.${i}.parameter`, {
                  onChange: (ev: React.ChangeEvent<HTMLSelectElement>) => {
                    const d = axisDefaults(ev.target.value as StudyParameter);
                    setValue(`axes.${i}.from`, d.from);
                    setValue(`axes.${i}.to`, d.to);
                    setValue(`axes.${i}.steps`, d.steps);
                  },
                })}
              >
                {studyParameters.map((p) => (
                  <option key={p} value={p}>
                    {parameterLabel(p)}
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
        ))}
      </div>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" {...register('twoAxes')} className="size-4 accent-[var(--color-accent)]" />
        Sweep a second parameter (a grid of points)
      </label>

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
          <Field label="Speeds [m/s]" hint={sweptSpeed ? 'speed is swept' : '20 m/s = 72 km/h; separate several with commas'} error={e('speeds')} className="w-64">
            <Input {...register('speeds')} disabled={sweptSpeed} />
          </Field>
          <Field label="Run length [s]" error={e('duration')} className="w-32">
            <Input type="number" min={1} max={600} step="any" {...register('duration', { valueAsNumber: true })} />
          </Field>
          <Field label="Over roads and speeds" hint="how each point's figures combine" className="w-52">
            <Select {...register('aggregate')}>
              <option value="mean">take the mean</option>
              <option value="worst">take the worst</option>
            </Select>
          </Field>
        </div>
      </fieldset>

      <div className="grid gap-3 lg:grid-cols-2">
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
              <Button variant="quiet" size="sm" onClick={() => objectives.append({ figure: nextFigure(watched.objectives?.map((o) => o?.figure)), weight: 1 })}>
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
          </div>
          <p className="mt-2 text-xs text-ink-faint">Leave a limit blank for none. A point meets the limits only if every road at every speed does; the others stay on the charts, marked.</p>
        </fieldset>
      </div>

      <FormError message={error} />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="primary" busy={busy}>
          Save and run
        </Button>
        <p className="text-sm text-ink-soft" aria-live="polite">
          {counts ? (
            <>
              <span className="figures">{counts.points}</span> points, <span className="figures">{counts.runs}</span> runs of <span className="figures">{watched.duration}</span> s, in this browser.
            </>
          ) : (
            'Fill in the study to see how many runs it makes.'
          )}
        </p>
      </div>
    </form>
  );
}

function nextFigure(taken: (StudyFigureKey | undefined)[] = []): StudyFigureKey {
  return studyFigureKeys.find((k) => !taken.includes(k)) ?? 'vdv';
}
