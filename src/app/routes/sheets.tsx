import { useNavigate } from 'react-router';
import { EmptyState } from '../../components/ui/empty-state.tsx';
import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { useSheets } from '../../features/target-sheets/api/get-sheets.ts';
import { NewSheetForm } from '../../features/target-sheets/components/new-sheet-form.tsx';
import { SheetList } from '../../features/target-sheets/components/sheet-list.tsx';
import { useWorkspace } from '../../lib/workspace-context.tsx';

/** `/w/:workspaceId/sheets`: every damper target sheet, and drafting a new one from a setup revision. */
export function SheetsRoute() {
  const workspace = useWorkspace();
  const navigate = useNavigate();
  const sheets = useSheets(workspace.id);
  return (
    <>
      <PageHeader
        title="Target sheets"
        detail="The forces a damper must make at chosen piston speeds, with the band the supplier builds to, reviewed and released by a lead, and checked against dyno measurements of the parts."
      />
      {workspace.can('engineer') && (
        <Section title="Draft a sheet">
          <NewSheetForm workspaceId={workspace.id} onCreated={(id) => navigate(`/w/${workspace.id}/sheets/${id}`)} />
        </Section>
      )}
      <Section title="Sheets">
        <QueryGuard query={sheets} what="target sheets" errorTitle="The sheets did not load">
          {(data) =>
            data.sheets.length === 0 ? (
              <EmptyState title="No target sheets yet">Draft one from a setup revision: its damper curve gives the forces at the reference speeds.</EmptyState>
            ) : (
              <SheetList sheets={data.sheets} workspaceId={workspace.id} />
            )
          }
        </QueryGuard>
      </Section>
    </>
  );
}
