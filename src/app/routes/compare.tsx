import { useQuery } from '@tanstack/react-query';
import type { Road } from '../../../shared/schemas/road.ts';
import { useState } from 'react';
import { useSearchParams } from 'react-router';
import { Button } from '../../components/ui/button.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { ResultsCaution } from '../../components/ui/results-caution.tsx';
import { Spinner } from '../../components/ui/spinner.tsx';
import { useRuns } from '../../features/runs/api/get-runs.ts';
import { CompareCharts } from '../../features/runs/components/compare/compare-charts.tsx';
import { ComparePicker } from '../../features/runs/components/compare/compare-picker.tsx';
import { CompareTable } from '../../features/runs/components/compare/compare-table.tsx';
import { ScenarioFields } from '../../features/runs/components/scenario-fields.tsx';
import { type CompareEntry, entriesFromParams, entriesToParams, likeForLikeNotes } from '../../features/runs/model/compare.ts';
import { figuresCsv } from '../../features/runs/model/export-csv.ts';
import { useComparison } from '../../features/runs/model/use-comparison.ts';
import { useScenario } from '../../features/runs/model/use-scenario.ts';
import { setupsQueryOptions } from '../../lib/queries/setups.ts';
import { downloadText } from '../../lib/download.ts';
import { exportFileName, exportStem } from '../../lib/export-name.ts';
import { formatQuantityText } from '../../lib/format.ts';
import { roadLabel } from '../../../shared/runs/road-label.ts';
import { ChartExportProvider, type ChartExportInfo } from '../../components/charts/export-context.tsx';
import { useWorkspace } from '../../lib/workspace-context.tsx';
import { useUnits } from '../../lib/units/use-units.tsx';

/** `/w/:workspaceId/compare`: two to four setups (run here on one scenario) or saved runs, side by side. */
export function CompareRoute() {
  const workspace = useWorkspace();
  const chosen = useUnits();
  const [params, setParams] = useSearchParams();
  const [entries, setEntries] = useState<CompareEntry[]>(() => entriesFromParams(params));
  const setups = useQuery(setupsQueryOptions(workspace.id));
  const runs = useRuns(workspace.id);
  const scenario = useScenario(workspace.id);
  const { state, compare, cancel } = useComparison(workspace.id);
  const needsScenario = entries.some((e) => e.kind === 'setup');

  const change = (next: CompareEntry[]) => {
    setEntries(next);
    setParams(entriesToParams(next), { replace: true });
  };
  const start = () => {
    let resolved = null;
    if (needsScenario) {
      const out = scenario.resolve();
      if (!out.ok) return;
      resolved = out.scenario;
    }
    void compare(entries, resolved);
  };

  return (
    <>
      <PageHeader title="Compare" detail="Two to four setups on one road and speed, or saved runs, overlaid: curves, responses, traces and every figure with its difference." />
      <ComparePicker entries={entries} onChange={change} setups={setups.data?.setups ?? []} runs={runs.data?.runs ?? []} />
      {needsScenario && (
        <div className="mt-3 rounded border border-rule bg-paper-raised p-3">
          <p className="mb-2 text-xs text-ink-soft">Setups are run here, all on this road at this speed. Saved runs keep the road and speed they were run on.</p>
          <ScenarioFields {...scenario.fieldProps} />
        </div>
      )}
      <div className="mt-3 flex items-center gap-2">
        <Button variant="primary" disabled={entries.length < 2 || state.status === 'running'} onClick={start}>
          Compare
        </Button>
        {state.status === 'running' && (
          <>
            <Button onClick={cancel}>Cancel</Button>
            <Spinner label="Running the comparison" />
            <span className="text-sm text-ink-soft">Running…</span>
          </>
        )}
        {entries.length < 2 && <span className="text-xs text-ink-faint">Add at least two.</span>}
      </div>

      {state.status === 'done' && (
        <div className="mt-5" data-testid="comparison">
          {state.failures.map((f) => (
            <Notice key={f.label} tone="danger" className="mb-2" title={`${f.label} could not be compared`}>
              {f.reason}
            </Notice>
          ))}
          {likeForLikeNotes(state.runs).length > 0 && (
            <Notice tone="signal" className="mb-3" title="Not like for like">
              These runs were driven on {likeForLikeNotes(state.runs).join(' and ')}: their figures differ for more reasons than the setup.
            </Notice>
          )}
          {state.runs.length >= 1 && (
            <ChartExportProvider value={compareExportInfo(state.runs)}>
              <Section
                title="Figures"
                actions={
                  <Button size="sm" onClick={() => downloadText(figuresCsv(state.runs.map((r) => ({ name: r.label, result: r.view.result })), chosen), exportFileName(compareExportInfo(state.runs).stem, 'figures', 'csv'))}>
                    Figures CSV
                  </Button>
                }
              >
                <CompareTable runs={state.runs} />
              </Section>
              <Section title="Charts">
                <CompareCharts runs={state.runs} />
              </Section>
              <ResultsCaution />
            </ChartExportProvider>
          )}
        </div>
      )}
    </>
  );
}

/** File stem and image caption of a comparison: the runs compared, and the first one's road and speed (the like-for-like note says when they differ). */
function compareExportInfo(runs: { label: string; view: { road: Road; seed?: number; result: { speed: number } } }[]): ChartExportInfo {
  const first = runs[0].view;
  const names = runs.map((r) => r.label).join(' vs ');
  return {
    stem: exportStem({ setupName: `compare ${names}`, road: first.road, speed: first.result.speed }),
    context: `${names} · ${roadLabel(first.road, first.seed)} · ${formatQuantityText(first.result.speed, 'kmph')}`,
  };
}
