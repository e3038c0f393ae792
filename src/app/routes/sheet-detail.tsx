import { ChartExportProvider } from '../../components/charts/export-context.tsx';
import { exportStem, safeWords } from '../../lib/export-name.ts';
import { useState } from 'react';
import { useParams } from 'react-router';
import { ButtonLink, buttonClass } from '../../components/ui/button.tsx';
import { Caution } from '../../components/ui/notice.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { ResultsCaution } from '../../components/ui/results-caution.tsx';
import { Loading } from '../../components/ui/spinner.tsx';
import { sheetCautions } from '../../../shared/target-sheet/cautions.ts';
import { sheetCsvHref, useChecks } from '../../features/target-sheets/api/get-checks.ts';
import { useSheet } from '../../features/target-sheets/api/get-sheet.ts';
import { useSaveSheet } from '../../features/target-sheets/api/save-sheet.ts';
import { BandPlot } from '../../features/target-sheets/components/band-plot.tsx';
import { CheckResults } from '../../features/target-sheets/components/check-results.tsx';
import { CheckUpload } from '../../features/target-sheets/components/check-upload.tsx';
import { SheetHistory } from '../../features/target-sheets/components/sheet-history.tsx';
import { ReplacementDifference } from '../../features/target-sheets/components/replacement-difference.tsx';
import { SheetIdentity } from '../../features/target-sheets/components/sheet-identity.tsx';
import { StatusBar } from '../../features/target-sheets/components/status-bar.tsx';
import { TargetTableEditor } from '../../features/target-sheets/components/target-table-editor.tsx';
import { TargetTable } from '../../features/target-sheets/components/target-table.tsx';
import { formatDateTime } from '../../lib/format.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';
import { useMe } from '../../features/auth/api/get-me.ts';
import { NotFoundRoute } from './not-found.tsx';

/**
 * `/w/:workspaceId/sheets/:sheetId`: one sheet on one bench: its state and the steps the role
 * may take, the targets (editable while a draft), the band with measured dampers over it, the
 * dyno checks and the history.
 */
export function SheetDetailRoute() {
  const workspace = useWorkspace();
  const me = useMe();
  const { sheetId = '' } = useParams();
  const detail = useSheet(workspace.id, sheetId);
  const checks = useChecks(workspace.id, sheetId);
  const save = useSaveSheet(workspace.id, sheetId);
  const [plotted, setPlotted] = useState<string | null>(null);

  return (
    <QueryGuard query={detail} what="target sheet" notFound={<NotFoundRoute inShell />} errorTitle="This sheet did not load">
      {({ sheet, history, replaces }) => {
        const editable = (sheet.status === 'draft' || sheet.status === 'returned') && workspace.can('engineer');
        const list = checks.data?.checks ?? [];
        const shown = list.find((c) => c.id === plotted) ?? list[0];

        return (
          <ChartExportProvider value={{ stem: `${safeWords(sheet.number, 30)}_${exportStem({ setupName: sheet.setupName, revision: sheet.setupRevision })}`, context: `Target sheet ${sheet.number} · ${sheet.setupName} r${sheet.setupRevision}` }}>
            <PageHeader
              eyebrow="Target sheet"
              title={<span className="figures">{sheet.number}</span>}
              detail={`${sheet.setupName}, revision ${sheet.setupRevision}`}
              actions={
                <>
                  <a className={buttonClass('secondary', 'sm')} href={sheetCsvHref(workspace.id, sheet.id)} download>
                    Download CSV
                  </a>
                  <ButtonLink size="sm" to={`/w/${workspace.id}/sheets/${sheet.id}/print`}>
                    Print view
                  </ButtonLink>
                </>
              }
            />
            <StatusBar sheet={sheet} replaces={replaces} workspaceId={workspace.id} role={workspace.role} secondPerson={workspace.settings.releaseNeedsSecondPerson ? { userId: me.data?.user.id ?? '' } : null} />
            <Section title="Identity">
              <SheetIdentity sheet={sheet} workspaceId={workspace.id} replaces={replaces} />
            </Section>

            {replaces && sheet.status !== 'released' && (
              <Section title="Against the sheet in force">
                <ReplacementDifference sheet={sheet} inForce={replaces} workspaceId={workspace.id} />
              </Section>
            )}

            <Section title="Targets">
              {editable ? (
                <TargetTableEditor
                  key={`${sheet.id}-${sheet.updatedAt}`}
                  initial={{ compression: sheet.compression, rebound: sheet.rebound, gasForce: sheet.gasForce, notes: sheet.notes }}
                  saving={save.isPending}
                  onSave={(content) => save.mutateAsync(content)}
                  reopens={sheet.status === 'returned'}
                />
              ) : (
                <div className="space-y-3">
                  <div className="grid gap-5 lg:grid-cols-2">
                    <TargetTable title="Compression" points={sheet.compression} />
                    <TargetTable title="Rebound" points={sheet.rebound} />
                  </div>
                  <p className="text-sm">
                    Gas force <strong className="figures">{sheet.gasForce} N</strong> <span className="text-ink-soft">(stated on the sheet; the targets exclude it)</span>
                  </p>
                  <Caution>{sheetCautions.gas}</Caution>
                  {sheet.notes.trim() && <p className="whitespace-pre-wrap text-sm text-ink-soft">{sheet.notes}</p>}
                </div>
              )}
            </Section>

            <Section title="Band and measured dampers">
              <BandPlot
                compression={sheet.compression}
                rebound={sheet.rebound}
                measured={shown?.measured ?? []}
                exportName="band"
              />
              <p className="mt-1 text-xs text-ink-faint">
                Shaded: the tolerance band. Piston speed and force are signed, compression positive, so rebound is drawn below the axis on the left.
                {shown ? ` Measured: the check of ${formatDateTime(shown.createdAt)}.` : ' No measured dampers yet.'}
              </p>
            </Section>

            <Section title="Dyno checks">
              {workspace.can('engineer') && <CheckUpload workspaceId={workspace.id} sheetId={sheet.id} gasForce={sheet.gasForce} />}
              <div className="mt-4 space-y-6">
                {checks.isPending && <Loading what="dyno checks" />}
                {checks.data && list.length === 0 && <p className="text-sm text-ink-soft">No dampers have been checked against this sheet yet.</p>}
                {list.map((c) => (
                  <div key={c.id} className="border-t border-rule pt-3">
                    <CheckResults check={c} workspaceId={workspace.id} />
                    {list.length > 1 && (
                      <label className="mt-2 flex items-center gap-2 text-sm">
                        <input type="radio" name="plotted-check" checked={shown?.id === c.id} onChange={() => setPlotted(c.id)} />
                        Show on the band plot
                      </label>
                    )}
                  </div>
                ))}
              </div>
            </Section>

            <Section title="History">
              <SheetHistory history={history} />
            </Section>
            <ResultsCaution />
          </ChartExportProvider>
        );
      }}
    </QueryGuard>
  );
}
