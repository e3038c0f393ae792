import { ChartExportProvider } from '../../components/charts/export-context.tsx';
import { exportStem } from '../../lib/export-name.ts';
import { useQuery } from '@tanstack/react-query';
import { lazy, type ReactNode, Suspense, useEffect, useMemo, useRef, useState } from 'react';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router';
import type { StudyPointDraft } from '../../../shared/schemas/study-record.ts';
import type { SetupDetail } from '../../../shared/schemas/setup-record.ts';
import { Damper, type Setup } from '../../../shared/schemas/setup.ts';
import { staticGasForce } from '../../../shared/sim/damper-gas.ts';
import { Notice } from '../../components/ui/notice.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { Loading } from '../../components/ui/spinner.tsx';
import { PageHeader } from '../../components/ui/page-header.tsx';
import { Tabs } from '../../components/ui/tabs.tsx';
import { ResultsCaution } from '../../components/ui/results-caution.tsx';
import { useToast } from '../../components/ui/toast.tsx';
import { DamperCurveEditor } from '../../features/damper-editor/components/damper-curve-editor.tsx';
import { LiveRunPanel } from '../../features/runs/components/live-run-panel.tsx';
import { exportRevisionUrl } from '../../features/setups/api/export-revision.ts';
import { useSaveRevision } from '../../features/setups/api/save-revision.ts';
import { BenchScenarioPicker, defaultScenario, roadOf } from '../../features/setups/components/bench-scenario.tsx';
import { CornerFiguresStrip } from '../../features/setups/components/corner-figures-strip.tsx';
import { SetupForm } from '../../features/setups/components/form/setup-form.tsx';
import { RevisionHistory, revisionAnchor } from '../../features/setups/components/revision-history.tsx';
import { usePointDraft } from '../../features/studies/api/get-point-draft.ts';
import { SaveBar } from '../../features/setups/components/save-bar.tsx';
import { ArchiveButton, GroupingControl, SetupNameHeading } from '../../features/setups/components/setup-facts.tsx';
import { LoadSetupFileButton } from '../../features/setups/components/setup-file-buttons.tsx';
import { SetupSheet } from '../../features/setups/components/setup-sheet.tsx';
import { UnsavedGuard } from '../../features/setups/components/unsaved-guard.tsx';
import { draftFigures } from '../../features/setups/model/draft-figures.ts';
import { useSetupDraft } from '../../features/setups/model/use-setup-draft.ts';
import { SharePanel } from '../../features/sharing/components/share-panel.tsx';
import { useVehicles } from '../../features/vehicles/api/get-vehicles.ts';
import { buttonClass } from '../../components/ui/button.tsx';
import { formatDateTime } from '../../lib/format.ts';
import { setupQueryOptions } from '../../lib/queries/setups.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';

// below the fold, with the CSV parser: loads after the bench itself so the first view stays light
const DynoPanel = lazy(async () => ({ default: (await import('../../features/dyno/components/dyno-panel.tsx')).DynoPanel }));
const DriveFitPanel = lazy(async () => ({ default: (await import('../../features/drives/components/drive-fit-panel.tsx')).DriveFitPanel }));

/** `/w/:workspaceId/corners/:setupId`: the setup bench. */
export function CornerBenchRoute() {
  const { setupId = '' } = useParams();
  const workspace = useWorkspace();
  const setup = useQuery(setupQueryOptions(workspace.id, setupId));
  const [params] = useSearchParams();
  const studyId = params.get('study');
  const point = Number(params.get('point'));
  const fromStudy = studyId !== null && Number.isInteger(point) && point >= 0 && workspace.can('engineer');
  const pointDraft = usePointDraft(workspace.id, studyId ?? '', point, fromStudy);
  if (fromStudy && pointDraft.isPending) return <Loading what="the study point" />;
  return (
    <>
      {fromStudy && pointDraft.isError && (
        <Notice tone="danger" className="mb-4" title="The study point did not open">
          {pointDraft.error.message}
        </Notice>
      )}
      <QueryGuard query={setup} what="the setup" errorTitle={(e) => (e.code === 'not_found' ? 'No such setup here' : 'The setup did not load')}>
        {(detail) => {
          const studyDraft = fromStudy && pointDraft.data?.setupId === detail.id ? pointDraft.data : undefined;
          return <Bench key={`${detail.id}:${studyId ?? ''}:${studyDraft ? point : ''}`} detail={detail} studyDraft={studyDraft} studyId={studyId ?? undefined} />;
        }}
      </QueryGuard>
    </>
  );
}

/** The tabs of the page, kept in the address (`?part=dyno`) so a reload or a link opens the same one. */
const parts = ['bench', 'dyno', 'drive', 'revisions', 'links'] as const;
type Part = (typeof parts)[number];

function Bench({ detail, studyDraft, studyId }: { detail: SetupDetail; studyDraft?: StudyPointDraft; studyId?: string }) {
  const workspace = useWorkspace();
  const canWrite = workspace.can('engineer') && !detail.archivedAt;
  const vehicles = useVehicles(workspace.id).data?.vehicles.map((v) => ({ id: v.id, name: v.name })) ?? [];
  const draft = useSetupDraft(detail.revision);
  const save = useSaveRevision(workspace.id, detail.id);
  const toast = useToast();
  const [saveError, setSaveError] = useState<ReactNode>(null);
  const [params, setParams] = useSearchParams();
  const part = parts.find((p) => p === params.get('part')) ?? 'bench';
  // only `part` changes: a study point's own parameters stay until it is saved
  const setPart = (next: Part) =>
    setParams(
      (prev) => {
        const out = new URLSearchParams(prev);
        if (next === 'bench') out.delete('part');
        else out.set('part', next);
        return out;
      },
      { replace: true },
    );
  const navigate = useNavigate();
  /** Opens the revisions tab at one revision, with its anchor in the address (the panel stays mounted, so the row is there to scroll to). */
  const showRevision = (n: number) => {
    const next = new URLSearchParams(params);
    next.set('part', 'revisions');
    navigate({ search: `?${next}`, hash: revisionAnchor(n) }, { replace: true });
    requestAnimationFrame(() => document.getElementById(revisionAnchor(n))?.scrollIntoView({ block: 'center' }));
  };

  // A study point arrives as unsaved changes on top of the latest revision; nothing is stored until the engineer saves.
  const { load } = draft;
  useEffect(() => {
    if (studyDraft && canWrite) load(studyDraft.setup);
  }, [studyDraft, canWrite, load]);
  const [scenario, setScenario] = useState(defaultScenario);

  // The panels on the right follow the draft; while a field is wrong they keep the last valid state.
  const lastValid = useRef<Setup>(detail.revision.document);
  if (draft.valid) lastValid.current = draft.valid;
  const shown = canWrite ? lastValid.current : detail.revision.document;
  const figures = useMemo(() => draftFigures(shown), [shown]);
  const damper = useMemo(() => {
    const parsed = Damper.safeParse(canWrite ? draft.values.damper : shown.damper);
    return parsed.success ? parsed.data : shown.damper;
  }, [canWrite, draft.values.damper, shown.damper]);

  const onSave = (setup: Setup, message: string) => {
    setSaveError(null);
    save.mutate(
      { setup, message, basedOn: draft.baseRevision },
      {
        onSuccess: (d) => {
          draft.resetTo(d.revision);
          // A reload must not bring the saved study point back as a fresh draft.
          if (studyDraft) setParams({}, { replace: true });
          toast.show(`Saved as revision ${d.latestRevision}.`);
        },
        onError: (error) => {
          for (const f of error.fields) if (f.path.startsWith('setup.')) draft.form.setError(f.path.slice(6) as never, { type: 'server', message: f.message });
          const see = error.see;
          setSaveError(
            see?.kind === 'setup_revision' && see.setupId === detail.id ? (
              <>
                {error.message}{' '}
                <a
                  className="font-semibold underline"
                  href={`#${revisionAnchor(see.number)}`}
                  onClick={(e) => {
                    e.preventDefault();
                    showRevision(see.number);
                  }}
                >
                  See revision {see.number}
                </a>
              </>
            ) : (
              error.message
            ),
          );
        },
      },
    );
  };

  const r = detail.revision;
  return (
    <ChartExportProvider value={{ stem: exportStem({ setupName: detail.name, revision: detail.latestRevision }), context: `${detail.name} r${detail.latestRevision}${draft.isDirty ? ', with unsaved edits' : ''}` }}>
      <PageHeader
        eyebrow={`Corner setup · revision ${detail.latestRevision}`}
        title={<SetupNameHeading workspaceId={workspace.id} detail={detail} canWrite={canWrite} />}
        detail={
          <>
            <span className="block">
              r{r.number} “{r.message}” — {r.author.name}, <span className="figures">{formatDateTime(r.createdAt)}</span>
            </span>
            <GroupingControl workspaceId={workspace.id} detail={detail} canWrite={canWrite} vehicles={vehicles} />
          </>
        }
        actions={
          <>
            <a className={buttonClass('secondary')} href={exportRevisionUrl(workspace.id, detail.id, detail.latestRevision)} download>
              Export JSON
            </a>
            {canWrite && (
              <LoadSetupFileButton
                onLoad={(setup, fileName) => {
                  draft.load(setup);
                  toast.show(`Loaded ${fileName} into the form: review it, then save it as revision ${detail.latestRevision + 1}.`, 'info');
                }}
              />
            )}
            {workspace.can('engineer') && <ArchiveButton workspaceId={workspace.id} detail={detail} />}
          </>
        }
      />
      {detail.archivedAt && (
        <Notice className="mb-4" title="Archived">
          This setup is archived: it is out of the list and of its vehicle. Its revisions are kept; bring it back to change it.
        </Notice>
      )}

      {studyDraft && canWrite && (
        <Notice className="mb-4" title="A study point, not saved yet">
          The form holds point {studyDraft.pointLabel} from{' '}
          <Link to={`/w/${workspace.id}/studies/${studyId}`} className="text-accent underline">
            the study
          </Link>
          , built on revision <span className="figures">{studyDraft.baseRevisionNumber}</span>
          {studyDraft.baseRevisionNumber !== detail.latestRevision && (
            <>
              {' '}
              (the latest is revision <span className="figures">{detail.latestRevision}</span>: every value comes from revision{' '}
              <span className="figures">{studyDraft.baseRevisionNumber}</span>, so check what changed since)
            </>
          )}
          .{' '}
          {draft.isDirty ? (
            'Review it, run it, and save it as a revision when you are sure; or discard the changes.'
          ) : (
            <strong>
              Revision {detail.latestRevision}, the latest, already holds exactly this point: there is nothing to save.
            </strong>
          )}
        </Notice>
      )}
      {/* The bench and the dyno fit each save a revision of their own: they get separate tabs, each
          with its button beside what it saves. Tabs also keep each view a screen or two long. */}
      <Tabs
        label="Parts of this setup"
        value={part}
        onChange={setPart}
        items={[
          {
            key: 'bench',
            label: 'Bench',
            count: canWrite && draft.hasChanges ? 'unsaved edits' : undefined,
            keepMounted: true,
            panel: (
              <div className="grid items-start gap-6 lg:grid-cols-[21rem_minmax(0,1fr)]">
                <div className="min-w-0">
                  {canWrite ? (
                    <>
                      <div className="sticky top-0 z-10 -mx-1 mb-3 bg-paper px-1 pt-1 pb-2">
                        <SaveBar
                          draft={draft}
                          nextNumber={detail.latestRevision + 1}
                          saving={save.isPending}
                          error={saveError}
                          initialMessage={studyDraft?.message}
                          onSave={onSave}
                        />
                      </div>
                      <SetupForm form={draft.form} />
                    </>
                  ) : (
                    <SetupSheet setup={detail.revision.document} />
                  )}
                </div>

                <div className="flex min-w-0 flex-col gap-5">
                  <CornerFiguresStrip modal={figures.modal} wheelRate={figures.analysisWheelRate} sprungMass={shown.sprungMass} stale={canWrite && !draft.valid} />
                  <section aria-label="Damper">
                    <h2 className="mb-2 text-sm font-semibold text-ink">Damper</h2>
                    <DamperCurveEditor
                      key={draft.generation}
                      value={damper}
                      onChange={draft.setDamper}
                      onProblemsChange={draft.setTableProblems}
                      readOnly={!canWrite}
                      motionRatio={shown.motionRatio}
                      sprungMass={shown.sprungMass}
                      wheelRate={figures.analysisWheelRate}
                      unsprungMass={shown.unsprungMass}
                      tyreRate={shown.tyreRate}
                      tyreDamping={shown.tyreDamping}
                    />
                  </section>
                  <section aria-label="Live run">
                    <div className="mb-2 flex flex-wrap items-baseline justify-between gap-2">
                      <h2 className="text-sm font-semibold text-ink">Live run{canWrite && draft.hasChanges ? ' of the unsaved draft' : ''}</h2>
                      <BenchScenarioPicker value={scenario} onChange={setScenario} />
                    </div>
                    <LiveRunPanel setup={canWrite ? draft.values : detail.revision.document} road={roadOf(scenario)} speed={scenario.speed} hideTitle />
                  </section>
                </div>
              </div>
            ),
          },
          {
            key: 'dyno',
            label: 'Dyno fit',
            panel: (
              <Suspense fallback={<Loading what="dyno files" />}>
              <DynoPanel
                workspaceId={workspace.id}
                setupId={detail.id}
                latestRevision={detail.latestRevision}
                readOnly={!canWrite}
                draftHasChanges={canWrite && draft.hasChanges}
                gasForceHint={staticGasForce(detail.revision.document.damper.gas)}
                onApplied={(n) => toast.show(`Saved the fitted dyno curve as revision ${n}.`)}
              />
              </Suspense>
            ),
          },
          {
            key: 'drive',
            label: 'Drive fit',
            panel: (
              <Suspense fallback={<Loading what="drives" />}>
                <DriveFitPanel
                  workspaceId={workspace.id}
                  setupId={detail.id}
                  setup={detail.revision.document}
                  latestRevision={detail.latestRevision}
                  readOnly={!canWrite}
                  draftHasChanges={canWrite && draft.hasChanges}
                  onApplied={(n) => toast.show(`Saved the corner fitted to the drive as revision ${n}.`)}
                />
              </Suspense>
            ),
          },
          {
            key: 'revisions',
            label: 'Revisions',
            count: detail.latestRevision,
            keepMounted: true,
            panel: <RevisionHistory workspaceId={workspace.id} setupId={detail.id} latest={detail.latestRevision} canWrite={canWrite} draftDirty={draft.hasChanges} onRestored={(d) => draft.resetTo(d.revision)} />,
          },
          {
            key: 'links',
            label: 'Read-only links',
            panel: <SharePanel workspaceId={workspace.id} setupId={detail.id} revision={{ id: r.id, number: r.number }} canWrite={workspace.can('engineer')} />,
          },
        ]}
      />
      <ResultsCaution />
      <UnsavedGuard when={canWrite && draft.hasChanges && !save.isPending} invalid={draft.tableProblems.length > 0 || (draft.isDirty && !draft.valid)} />
    </ChartExportProvider>
  );
}
