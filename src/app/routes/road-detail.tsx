import { ChartExportProvider } from '../../components/charts/export-context.tsx';
import { safeWords } from '../../lib/export-name.ts';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import type { Road } from '../../../shared/schemas/road.ts';
import { Button } from '../../components/ui/button.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { useToast } from '../../components/ui/toast.tsx';
import { useDeleteRoad } from '../../features/roads/api/delete-road.ts';
import { useUpdateRoad } from '../../features/roads/api/update-road.ts';
import { RoadEditor } from '../../features/roads/components/road-editor.tsx';
import { RoadFiguresList, RoadPreview } from '../../features/roads/components/road-preview.tsx';
import { kindWords } from '../../features/roads/components/road-words.ts';
import { type ApiError, isApiError } from '../../lib/api-client.ts';
import { formatDateTime } from '../../lib/format.ts';
import { roadQueryOptions } from '../../lib/queries/roads.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';

/** `/w/:workspaceId/roads/:roadId`: one road's figures, profile and spectrum; engineers edit or remove it. */
export function RoadDetailRoute() {
  const workspace = useWorkspace();
  const { roadId = '' } = useParams();
  const navigate = useNavigate();
  const toast = useToast();
  const road = useQuery(roadQueryOptions(workspace.id, roadId));
  const update = useUpdateRoad(workspace.id, roadId);
  const remove = useDeleteRoad(workspace.id);
  const [draft, setDraft] = useState<Road | null>(null);
  const [confirming, setConfirming] = useState(false);
  const canEdit = workspace.can('engineer');

  const roadGone = (error: ApiError) => (
    <>
      <PageHeader title="Road" />
      <Notice tone="danger">{error.code === 'not_found' ? 'This road is not in the workspace (it may have been removed).' : error.message}</Notice>
      <p className="mt-3 text-sm">
        <Link className="text-accent hover:underline" to={`/w/${workspace.id}/roads`}>
          Back to the roads
        </Link>
      </p>
    </>
  );
  return (
    <QueryGuard query={road} what="the road" renderError={roadGone}>
      {(r) => {
        const shown = draft ?? r.definition;
        return (
          <ChartExportProvider value={{ stem: `road_${safeWords(r.name, 48) || 'road'}`, context: `Road ${r.name}${draft ? ', unsaved draft' : ''}` }}>
            <PageHeader
              eyebrow={
                <Link className="hover:underline" to={`/w/${workspace.id}/roads`}>
                  Roads
                </Link>
              }
              title={r.name}
              detail={`${kindWords[r.kind]}${r.source === 'measured' ? ', uploaded' : ''} · changed ${formatDateTime(r.changedAt)} by ${r.changedBy.name} · added by ${r.createdBy.name}`}
              actions={
                canEdit &&
                (confirming ? (
                  <span className="flex items-center gap-2 text-sm">
                    Remove this road? Saved runs keep their own copy.
                    <Button
                      variant="danger"
                      size="sm"
                      busy={remove.isPending}
                      onClick={() =>
                        remove.mutate(r.id, {
                          onSuccess: () => {
                            toast.show(`Removed "${r.name}".`);
                            navigate(`/w/${workspace.id}/roads`);
                          },
                        })
                      }
                    >
                      Remove
                    </Button>
                    <Button size="sm" variant="quiet" onClick={() => setConfirming(false)}>
                      Keep
                    </Button>
                  </span>
                ) : (
                  <Button size="sm" variant="secondary" onClick={() => setConfirming(true)}>
                    Remove…
                  </Button>
                ))
              }
            />
            <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_20rem]">
              <div className="min-w-0">
                {draft && <Notice className="mb-3">Preview of the unsaved changes.</Notice>}
                <RoadPreview road={shown} figures={draft ? null : r.figures} />
              </div>
              <div className="grid content-start gap-4">
                <RoadFiguresList figures={r.figures} />
                {canEdit && (
                  <Section title="Change">
                    <RoadEditor
                      key={r.changedAt}
                      kind={r.kind}
                      initial={{ name: r.name, definition: r.definition }}
                      submitLabel="Save changes"
                      busy={update.isPending}
                      error={isApiError(update.error) ? update.error : null}
                      onDraft={setDraft}
                      onSubmit={(name, definition) =>
                        update.mutate(
                          { name, definition },
                          {
                            onSuccess: () => {
                              setDraft(null);
                              toast.show('Road saved.');
                            },
                          },
                        )
                      }
                    />
                  </Section>
                )}
              </div>
            </div>
          </ChartExportProvider>
        );
      }}
    </QueryGuard>
  );
}
