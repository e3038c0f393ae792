import { useMemo } from 'react';
import { useParams } from 'react-router';
import { Button, ButtonLink } from '../../components/ui/button.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { useSheet } from '../../features/target-sheets/api/get-sheet.ts';
import { PrintSheet } from '../../features/target-sheets/components/print-sheet.tsx';
import { useWorkspace } from '../../lib/workspace-context.tsx';
import { NotFoundRoute } from './not-found.tsx';

/** `/w/:workspaceId/sheets/:sheetId/print`: the sheet on A4 paper; printing draws only the paper. */
export function SheetPrintRoute() {
  const workspace = useWorkspace();
  const { sheetId = '' } = useParams();
  const detail = useSheet(workspace.id, sheetId);
  const printedAt = useMemo(() => new Date(), []);

  return (
    <QueryGuard query={detail} what="target sheet" notFound={<NotFoundRoute inShell />} errorTitle="This sheet did not load">
      {({ sheet }) => {
        return (
          <>
            <div className="mb-4 flex flex-wrap items-center gap-3">
              <ButtonLink size="sm" variant="quiet" to={`/w/${workspace.id}/sheets/${sheet.id}`}>
                ← Back to {sheet.number}
              </ButtonLink>
              <Button size="sm" variant="primary" onClick={() => window.print()}>
                Print
              </Button>
              <span className="text-sm text-ink-soft">A4, portrait. Only the sheet below is printed.</span>
            </div>
            <PrintSheet sheet={sheet} workspaceId={workspace.id} printedAt={printedAt} />
          </>
        );
      }}
    </QueryGuard>
  );
}
