import { useState } from 'react';
import { useNavigate } from 'react-router';
import type { FieldIssue } from '../../../shared/errors.ts';
import { Button } from '../../components/ui/button.tsx';
import { EmptyState } from '../../components/ui/empty-state.tsx';
import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { useCreateStudy } from '../../features/studies/api/create-study.ts';
import { useStudies } from '../../features/studies/api/get-studies.ts';
import { StudyForm } from '../../features/studies/components/study-form.tsx';
import { StudyList } from '../../features/studies/components/study-list.tsx';
import { isApiError } from '../../lib/api-client.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';

/** `/w/:workspaceId/studies`: saved studies, and (engineers) a new one defined, saved and run. */
export function StudiesRoute() {
  const workspace = useWorkspace();
  const navigate = useNavigate();
  const studies = useStudies(workspace.id);
  const create = useCreateStudy(workspace.id);
  const canDefine = workspace.can('engineer');
  const [open, setOpen] = useState(false);
  const fields: FieldIssue[] | undefined = isApiError(create.error) ? create.error.fields : undefined;

  return (
    <>
      <PageHeader
        title="Studies"
        detail="Sweep one or two parameters of a setup over the roads and speeds that matter, see where comfort costs grip, and find the best compromise within the stroke and lift-off limits."
        actions={
          canDefine && !open ? (
            <Button variant="primary" onClick={() => setOpen(true)}>
              New study
            </Button>
          ) : undefined
        }
      />
      {canDefine && open && (
        <Section title="New study" actions={<Button variant="quiet" size="sm" onClick={() => setOpen(false)}>Close</Button>}>
          <StudyForm
            workspaceId={workspace.id}
            busy={create.isPending}
            error={create.error && !fields?.length ? create.error.message : undefined}
            serverFields={fields}
            onSubmit={(definition) => create.mutate(definition, { onSuccess: (detail) => navigate(`/w/${workspace.id}/studies/${detail.id}?run=1`) })}
          />
        </Section>
      )}
      <Section title="Saved studies">
        <QueryGuard query={studies} what="studies">
          {(data) =>
            data.studies.length === 0 ? (
              <EmptyState title="No studies yet">
                {canDefine ? 'Start one with “New study”: pick a setup revision, what to sweep, the roads and speeds, and what to judge by.' : 'Engineers define and run studies; they appear here for everyone.'}
              </EmptyState>
            ) : (
              <StudyList workspaceId={workspace.id} studies={data.studies} />
            )
          }
        </QueryGuard>
      </Section>
    </>
  );
}
