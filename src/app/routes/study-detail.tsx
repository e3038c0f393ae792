import { useState } from 'react';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router';
import { listText } from '../../lib/units/unit-table.ts';
import { useUnits } from '../../lib/units/use-units.tsx';
import { FreshShareLink, MakeShareLink } from '../../components/ui/share-link.tsx';
import { Button, buttonClass } from '../../components/ui/button.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { PageHeader } from '../../components/ui/page-header.tsx';
import { ResultsCaution } from '../../components/ui/results-caution.tsx';
import { Tag } from '../../components/ui/tag.tsx';
import { RunPanel } from '../../features/studies/components/run-panel.tsx';
import { FleetPanel } from '../../features/studies/components/fleet-panel.tsx';
import { useCancelFleetRun, useFleetRun, useStartFleetRun } from '../../features/studies/api/fleet-run.ts';
import { useConfig } from '../../features/auth/api/get-config.ts';
import { FLEET_DEFAULT_FROM_RUNS } from '../../../shared/schemas/fleet.ts';
import { statusWords, sweepWords } from '../../features/studies/components/study-list.tsx';
import { savedPointName, useStudyDisplay } from '../../features/studies/model/display.ts';
import { StudyResults } from '../../features/studies/components/study-results.tsx';
import { useRunWhenAsked, useStudyPage } from '../../features/studies/run/use-study-page.ts';
import { formatDateTime, formatSig } from '../../lib/format.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';
import { NotFoundRoute } from './not-found.tsx';

/**
 * `/w/:workspaceId/studies/:studyId`: the study's results (saved, or the run going on now), run
 * it (engineers save; viewers may preview, nothing saved), pick a point, open it on the corner
 * bench as an unsaved draft (saving is done there), mark the lead's baseline, share it read-only, export.
 */
export function StudyDetailRoute() {
  const workspace = useWorkspace();
  const speedUnit = useUnits().speed;
  const display = useStudyDisplay();
  const { studyId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const canSave = workspace.can('engineer');
  const isLead = workspace.can('lead');
  const { study, state, cancel, run, running, view, roadNames, baseline, share, remove, canStart } = useStudyPage({ workspaceId: workspace.id, studyId, canSave });
  const [sharing, setSharing] = useState(false);
  const teamWorkers = useConfig().data?.teamWorkers ?? false;
  const fleet = useFleetRun(workspace.id, studyId);
  const startFleet = useStartFleetRun(workspace.id, studyId);
  const cancelFleet = useCancelFleetRun(workspace.id, studyId);
  const [place, setPlace] = useState<'browser' | 'workers' | null>(null);
  useRunWhenAsked(params.get('run') === '1', canStart, run, () => setParams({}, { replace: true }));

  return (
    <QueryGuard query={study} what="the study" notFound={<NotFoundRoute inShell />}>
      {(s) => {
        const status = statusWords[s.status];
        const hasSaved = s.points.length > 0;
        const fleetRun = fleet.data?.run ?? null;
        const onWorkers = fleetRun?.state === 'running' || fleetRun?.state === 'finishing';
        // the team's workers are offered to those who save, when the server has them; big studies go there unless asked
        const offerWorkers = teamWorkers && canSave;
        const where = offerWorkers ? (place ?? (s.plannedRuns > FLEET_DEFAULT_FROM_RUNS ? 'workers' : 'browser')) : 'browser';

        const pointActions = (index: number) => (
          <>
            {canSave && s.base.setupId && !running && (
              <Link
                className={buttonClass('primary', 'sm')}
                to={`/w/${workspace.id}/corners/${s.base.setupId}?study=${encodeURIComponent(s.id)}&point=${index}`}
                title="Opens the corner bench with this point as unsaved changes; nothing is saved until you save it there."
              >
                Open as setup draft
              </Link>
            )}
            {isLead && hasSaved && s.points.some((p) => p.index === index) && (
              <Button size="sm" busy={baseline.isPending} disabled={running} onClick={() => baseline.mutate(s.baseline?.pointIndex === index ? null : index)}>
                {s.baseline?.pointIndex === index ? 'Clear the baseline' : 'Mark as baseline'}
              </Button>
            )}
          </>
        );

        return (
          <>
            <PageHeader
              eyebrow={
                <Link to={`/w/${workspace.id}/studies`} className="hover:text-ink">
                  Studies
                </Link>
              }
              title={s.name}
              detail={
                <>
                  <p>
                    From{' '}
                    {s.base.setupId && s.base.setupName ? (
                      <Link to={`/w/${workspace.id}/corners/${s.base.setupId}`} className="text-accent hover:underline">
                        {s.base.setupName}
                      </Link>
                    ) : (
                      'a setup that no longer exists'
                    )}{' '}
                    <span className="figures">r{s.base.revisionNumber}</span> · {sweepWords(s.axes, display)} · {roadNames.join(', ')}
                    {s.speeds.length > 0 && <span className="figures"> at {listText(s.speeds, speedUnit)}</span>} · <span className="figures">{s.definition.duration}</span> s runs
                    {s.definition.seeds > 1 && (
                      <>
                        {' '}
                        · over <span className="figures">{s.definition.seeds}</span> road seeds
                      </>
                    )}
                  </p>
                  <p className="mt-1 flex flex-wrap items-center gap-2">
                    <Tag tone={status.tone}>{status.text}</Tag>
                    {s.results && (
                      <span className="text-xs text-ink-faint">
                        {s.results.savedPoints} of {s.results.plannedPoints} points saved by {s.results.ranBy.name}, {formatDateTime(s.results.ranAt)}, in{' '}
                        <span className="figures">{formatSig(s.results.elapsedMs / 1000, 3)}</span> s
                      </span>
                    )}
                    {s.baseline && (
                      <Tag tone="accent">
                        baseline: {savedPointName(display, s.definition.axes, s.baseline)} (by {s.baseline.chosenBy.name})
                      </Tag>
                    )}
                  </p>
                </>
              }
              actions={
                <>
                  {!running && !onWorkers && offerWorkers && (
                    <label className="flex items-center gap-2 text-sm text-ink-soft">
                      Run in
                      <select className="rounded border border-rule bg-paper px-2 py-1 text-sm text-ink" value={where} onChange={(e) => setPlace(e.target.value as 'browser' | 'workers')}>
                        <option value="browser">this browser</option>
                        <option value="workers">the team’s workers</option>
                      </select>
                    </label>
                  )}
                  {!running && !onWorkers && where === 'workers' && (
                    <Button variant="primary" busy={startFleet.isPending} onClick={() => startFleet.mutate()}>
                      {s.status === 'partial' ? 'Run the rest on the workers' : 'Run on the workers'}
                    </Button>
                  )}
                  {!running && !onWorkers && where === 'browser' && (
                    <Button variant={canSave ? 'primary' : 'secondary'} onClick={run} title={canSave ? undefined : 'Viewers can watch a run here; the results stay in this browser and are not saved.'}>
                      {canSave ? (hasSaved ? 'Run again and save' : 'Run and save') : 'Preview a run (not saved)'}
                    </Button>
                  )}
                  {canSave && (
                    <Button aria-expanded={sharing} onClick={() => setSharing((v) => !v)}>
                      Share read-only link
                    </Button>
                  )}
                  {canSave && (
                    <Button
                      variant="danger"
                      disabled={running}
                      onClick={() => {
                        if (window.confirm(`Delete the study “${s.name}” and its saved results?`)) remove.mutate(s.id, { onSuccess: () => navigate(`/w/${workspace.id}/studies`) });
                      }}
                    >
                      Delete
                    </Button>
                  )}
                </>
              }
            />

            <div className="space-y-4">
              {!canSave && <p className="text-sm text-ink-soft">A preview run happens in this browser and is not saved; saving results and making revisions is for engineers.</p>}
              {share.data ? (
                <FreshShareLink
                  label={`the study ${s.name}`}
                  path={share.data.path}
                  expiresAt={share.data.link.expiresAt}
                  onDone={() => {
                    share.reset();
                    setSharing(false);
                  }}
                />
              ) : (
                sharing &&
                canSave && (
                  <div className="rounded border border-rule bg-paper-raised px-3 py-2">
                    <MakeShareLink what="this study" busy={share.isPending} error={share.error ? (share.error.fieldMessage('expiresAt') ?? share.error.message) : undefined} onMake={(expiresAt) => share.mutate(expiresAt)} />
                  </div>
                )
              )}
              {baseline.error && <Notice tone="danger">{baseline.error.message}</Notice>}
              {startFleet.error && <Notice tone="danger">{startFleet.error.message}</Notice>}
              {cancelFleet.error && <Notice tone="danger">{cancelFleet.error.message}</Notice>}
              {fleetRun && state.phase === 'idle' && <FleetPanel run={fleetRun} canStop={canSave} stopping={cancelFleet.isPending} onStop={() => cancelFleet.mutate()} />}
              <RunPanel state={state} onCancel={cancel} />
              {s.status === 'partial' && state.phase === 'idle' && (
                <Notice tone="signal">Partial results: the last run was stopped after {s.results?.savedPoints} of {s.plannedPoints} points. Figures and the best compromise cover only those.</Notice>
              )}
              {view && (view.points.length > 0 || state.phase !== 'idle') ? (
                <StudyResults
                  view={view}
                  roadNames={roadNames}
                  baselineIndex={s.baseline?.pointIndex ?? null}
                  running={state.phase === 'running'}
                  base={s.base.setupName ? { setupName: s.base.setupName, revisionNumber: s.base.revisionNumber } : undefined}
                  pointActions={state.phase === 'idle' || state.phase === 'finished' ? pointActions : undefined}
                />
              ) : (
                <Notice>
                  {onWorkers
                    ? 'The results appear here when the workers have run every point.'
                    : `This study has not been run yet. ${canSave ? 'Run it to see the trade-off.' : 'An engineer runs and saves it; you can preview a run here.'}`}
                </Notice>
              )}
            </div>
            <ResultsCaution />
          </>
        );
      }}
    </QueryGuard>
  );
}
