import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, useSearchParams } from 'react-router';
import { ButtonLink } from '../../components/ui/button.tsx';
import { Select } from '../../components/ui/field.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { ChartExportProvider } from '../../components/charts/export-context.tsx';
import { exportStem } from '../../lib/export-name.ts';
import { ExportButtons, runSubject, runTitle, SaveRunForm, type SaveTarget } from '../../features/runs/components/run-actions.tsx';
import { LiveTryout } from '../../features/runs/components/live-tryout.tsx';
import { RunDashboard } from '../../features/runs/components/run-dashboard.tsx';
import { type RunChoice, RunForm } from '../../features/runs/components/run-form.tsx';
import { RunStatus } from '../../features/runs/components/run-status.tsx';
import { SeedRepeatPanel } from '../../features/studies/components/seed-repeat-panel.tsx';
import { SetupRunsList } from '../../features/runs/components/setup-runs-list.tsx';
import { useSimulation } from '../../features/runs/model/use-simulation.ts';
import { formatQuantityText } from '../../lib/format.ts';
import { setupsQueryOptions } from '../../lib/queries/setups.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';

/** `/w/:workspaceId/runs`: run a setup revision on a road, read the result, save it; saved runs below. */
export function RunsRoute() {
  const workspace = useWorkspace();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const { state, start, cancel } = useSimulation();
  const [target, setTarget] = useState<(SaveTarget & { latestRevision: number }) | null>(null);
  const [trying, setTrying] = useState(false);

  const run = (choice: RunChoice) => {
    setTarget({ setupId: choice.setupId, revisionNumber: choice.revisionNumber, roadId: choice.roadId, latestRevision: choice.latestRevision });
    void start(choice);
  };

  return (
    <>
      <PageHeader
        title="Runs"
        detail="Drive one setup revision over a road at a speed, and read what it does to the ride, the tyre and the stroke."
        actions={
          <ButtonLink to={`/w/${workspace.id}/compare`} size="sm">
            Compare setups
          </ButtonLink>
        }
      />
      <RunForm
        workspaceId={workspace.id}
        initialSetupId={params.get('setup') ?? undefined}
        initialRevision={params.get('rev') ? Number(params.get('rev')) : undefined}
        running={state.status === 'running'}
        onRun={run}
        onCancel={cancel}
      />
      <RunStatus state={state} />

      {state.status === 'done' && target && (
        <section aria-label="Result" className="mt-5" data-testid="current-result">
          <div className="mb-3 flex flex-wrap items-end justify-between gap-3 border-b border-rule pb-2">
            <div className="min-w-0">
              <h2 className="text-lg font-semibold">{runTitle(state.view, target.revisionNumber)}</h2>
              <p className="text-xs text-ink-faint">
                Computed in this browser in <span className="figures">{formatQuantityText(state.elapsedMs / 1000, 's')}</span> ·{' '}
                {state.view.result.timing.steps} integrator steps · output {state.view.result.outputRate} samples/s
              </p>
            </div>
            <div className="flex flex-wrap gap-2">
              <ExportButtons view={state.view} request={state.request} revision={target.revisionNumber} />
            </div>
          </div>
          {target.revisionNumber < target.latestRevision && (
            <Notice tone="signal" className="mb-3">
              This is revision {target.revisionNumber}; the setup has a newer revision, r{target.latestRevision}.
            </Notice>
          )}
          {workspace.can('engineer') && (
            <div className="mb-4">
              <SaveRunForm workspaceId={workspace.id} view={state.view} target={target} onSaved={(id) => navigate(`/w/${workspace.id}/runs/${id}`)} />
            </div>
          )}
          <details className="mb-5 rounded border border-rule bg-paper/60 px-3 py-2" onToggle={(e) => setTrying((e.target as HTMLDetailsElement).open)}>
            <summary className="cursor-pointer text-sm font-medium text-accent">Try a change live</summary>
            {trying && (
              <div className="mt-2">
                <LiveTryout key={state.elapsedMs} initial={state.view.setup} road={state.view.road} speed={state.view.result.speed} seed={state.view.seed} />
              </div>
            )}
          </details>
          <details className="mb-5 rounded border border-rule bg-paper/60 px-3 py-2">
            <summary className="cursor-pointer text-sm font-medium text-accent">Repeat over several road seeds</summary>
            <div className="mt-2">
              <SeedRepeatPanel
                key={state.elapsedMs}
                setup={state.view.setup}
                road={state.view.road}
                speed={state.view.result.speed}
                duration={state.view.result.duration}
                settleTime={state.view.result.settleTime}
                seed={state.view.seed}
              />
            </div>
          </details>
          <ChartExportProvider value={{ stem: exportStem(runSubject(state.view, target.revisionNumber)), context: runTitle(state.view, target.revisionNumber) }}>
            <RunDashboard view={state.view} />
          </ChartExportProvider>
        </section>
      )}

      <Section title="Saved runs" className="mt-8">
        <SavedRuns workspaceId={workspace.id} canDelete={workspace.can('engineer')} />
      </Section>
    </>
  );
}

function SavedRuns({ workspaceId, canDelete }: { workspaceId: string; canDelete: boolean }) {
  const [setupId, setSetupId] = useState('');
  const setups = useQuery(setupsQueryOptions(workspaceId));
  return (
    <>
      <div className="mb-2 flex items-center gap-2 text-sm">
        <label htmlFor="runs-filter" className="text-ink-soft">
          Show
        </label>
        <Select id="runs-filter" className="w-72" value={setupId} onChange={(e) => setSetupId(e.target.value)}>
          <option value="">every setup</option>
          {(setups.data?.setups ?? []).map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </Select>
      </div>
      <SetupRunsList workspaceId={workspaceId} setupId={setupId || undefined} canDelete={canDelete} />
    </>
  );
}
