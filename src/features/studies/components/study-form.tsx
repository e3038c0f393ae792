import { toNestErrors } from '@hookform/resolvers';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useMemo, useRef } from 'react';
import { type FieldErrors, FormProvider, type Resolver, useFieldArray, useForm, useWatch } from 'react-hook-form';
import type { RoadListItem } from '../../../../shared/schemas/road-record.ts';
import type { SetupSummary } from '../../../../shared/schemas/setup-record.ts';
import { StudyDefinition } from '../../../../shared/schemas/study.ts';
import { plannedCounts } from '../../../../shared/study/expand.ts';
import { formatCount } from '../../../lib/format.ts';
import { Button } from '../../../components/ui/button.tsx';
import { FormError } from '../../../components/ui/field.tsx';
import { Loading } from '../../../components/ui/spinner.tsx';
import { latestRevisionsQueryOptions, revisionQueryOptions } from '../../../lib/queries/revisions.ts';
import { staticEquilibrium } from '../../../../shared/sim/quarter-car.ts';
import { roadsQueryOptions } from '../../../lib/queries/roads.ts';
import { setupsQueryOptions } from '../../../lib/queries/setups.ts';
import { useStudyDisplay } from '../model/display.ts';
import { defaultFormValues, fieldOfIssue, formToDefinition, startingRange, type StudyFormValues, sweptAxisCount } from '../model/study-form.ts';
import { AxisFieldset } from './study-form/axis-fieldset.tsx';
import { BaseFields } from './study-form/base-fields.tsx';
import { LimitsFieldset } from './study-form/limits-fieldset.tsx';
import { ObjectivesFieldset } from './study-form/objectives-fieldset.tsx';
import { RoadsFieldset } from './study-form/roads-fieldset.tsx';

export interface StudyFormProps {
  workspaceId: string;
  busy: boolean;
  /** A message for the whole form (e.g. the server refused the study). */
  error?: string;
  /** Field problems the server named, by schema path. */
  serverFields?: { path: string; message: string }[];
  onSubmit: (definition: StudyDefinition) => void;
}

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
  const d = useStudyDisplay();

  const resolver: Resolver<StudyFormValues, unknown, StudyDefinition> = useMemo(
    () => async (values, _ctx, options) => {
      const parsed = StudyDefinition.safeParse(formToDefinition(values, revisionIds.current, d));
      if (parsed.success) return { values: parsed.data, errors: {} };
      const flat: Record<string, { type: string; message: string }> = {};
      for (const issue of parsed.error.issues) {
        const field = fieldOfIssue(issue.path);
        flat[field] ??= { type: 'schema', message: issue.message };
      }
      return { values: {}, errors: toNestErrors(flat as FieldErrors, options) };
    },
    [d],
  );

  const form = useForm<StudyFormValues, unknown, StudyDefinition>({
    defaultValues: { ...defaultFormValues(firstRoad, d), setupId: live[0].id, revision: String(live[0].latestRevision) },
    resolver,
  });
  const { register, control, handleSubmit, setValue, setError, getValues, getFieldState } = form;
  const axes = useFieldArray({ control, name: 'axes' });
  const watched = useWatch({ control });

  const setupId = watched.setupId ?? '';
  const chosen = live.find((s) => s.id === setupId);
  const revisions = useQuery(latestRevisionsQueryOptions(workspaceId, chosen?.id));
  revisionIds.current = (n) => revisions.data?.revisions.find((r) => r.number === n)?.id;
  const baseRevision = useQuery(revisionQueryOptions(workspaceId, chosen?.id, Number(watched.revision) || undefined));
  const baseSetup = baseRevision.data?.document;
  const baseSag = useMemo(() => {
    if (!baseSetup) return undefined;
    const s = staticEquilibrium(baseSetup);
    return s.ok ? s.state.bodySag : undefined;
  }, [baseSetup]);

  // Once the base is known, ranges nobody has typed into start centred on its values.
  useEffect(() => {
    if (!baseSetup) return;
    for (const i of [0, 1, 2, 3] as const) {
      const touched = (['from', 'to', 'steps'] as const).some((k) => getFieldState(`axes.${i}.${k}`).isDirty);
      const parameter = getValues(`axes.${i}.parameter`);
      if (touched || !parameter) continue;
      const r = startingRange(parameter, baseSetup, d);
      setValue(`axes.${i}.from`, r.from);
      setValue(`axes.${i}.to`, r.to);
      setValue(`axes.${i}.steps`, r.steps);
    }
  }, [baseSetup, getFieldState, getValues, setValue, d]);

  useEffect(() => {
    if (chosen && !watched.revision) setValue('revision', String(chosen.latestRevision));
  }, [chosen, watched.revision, setValue]);
  useEffect(() => {
    for (const f of serverFields ?? []) setError(fieldOfIssue(f.path.replace(/^definition\./, '').split('.')) as never, { type: 'server', message: f.message });
  }, [serverFields, setError]);

  const twoAxes = watched.twoAxes ?? true;
  const axisCount = sweptAxisCount({ twoAxes, moreAxes: watched.moreAxes ?? 0 });
  const counts = useMemo(() => {
    const r = StudyDefinition.safeParse(formToDefinition(watched as StudyFormValues, () => 'x', d));
    return r.success ? plannedCounts(r.data) : null;
  }, [watched, d]);
  const sweptSpeed = (watched.axes ?? []).slice(0, axisCount).some((a) => a?.parameter === 'speed');

  return (
    <FormProvider {...form}>
      <form onSubmit={handleSubmit(onSubmit)} noValidate aria-label="Define a study" className="space-y-4 rounded border border-rule bg-paper-raised p-4">
        <BaseFields setups={live} chosen={chosen} revisionNumbers={revisions.data?.revisions.map((r) => r.number)} />

        <div className="grid gap-3 lg:grid-cols-2">
          {axes.fields.slice(0, axisCount).map((field, i) => (
            <AxisFieldset key={field.id} index={i} base={baseSetup} />
          ))}
        </div>
        <div className="flex flex-wrap items-center gap-4">
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" {...register('twoAxes')} className="size-4 accent-[var(--color-accent)]" />
            Sweep a second parameter (a grid of points)
          </label>
          {twoAxes && axisCount < 4 && (
            <Button variant="quiet" size="sm" onClick={() => setValue('moreAxes', axisCount - 1)}>
              Sweep a {axisCount === 2 ? 'third' : 'fourth'} parameter
            </Button>
          )}
          {axisCount > 2 && (
            <Button variant="quiet" size="sm" onClick={() => setValue('moreAxes', axisCount - 3)}>
              Drop the {axisCount === 3 ? 'third' : 'fourth'} parameter
            </Button>
          )}
        </div>

        <RoadsFieldset libraryRoads={libraryRoads} firstRoad={firstRoad} sweptSpeed={sweptSpeed} />

        <div className="grid gap-3 lg:grid-cols-2">
          <ObjectivesFieldset taken={watched.objectives?.map((o) => o?.figure)} />
          <LimitsFieldset baseSag={baseSag} />
        </div>

        <FormError message={error} />
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" variant="primary" busy={busy}>
            Save and run
          </Button>
          <p className="text-sm text-ink-soft" aria-live="polite">
            {counts ? (
              <>
                <span className="figures">{formatCount(counts.points)}</span> points, <span className="figures">{formatCount(counts.runs)}</span> runs of <span className="figures">{watched.duration}</span> s
                {(watched.seeds ?? 1) > 1 ? <> ({watched.seeds} road seeds a point)</> : null}, in this browser.
              </>
            ) : (
              'Fill in the study to see how many runs it makes.'
            )}
          </p>
        </div>
      </form>
    </FormProvider>
  );
}
