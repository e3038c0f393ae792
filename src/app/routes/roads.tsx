import { useQuery } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { useNavigate } from 'react-router';
import type { RoadListItem } from '../../../shared/schemas/road-record.ts';
import { roadKinds } from '../../../shared/schemas/road-record.ts';
import { Road as RoadSchema, type Road, type RoadKind } from '../../../shared/schemas/road.ts';
import { candidateOf, defaultRoads } from '../../features/roads/model/road-fields.ts';
import { Button } from '../../components/ui/button.tsx';
import { EmptyState } from '../../components/ui/empty-state.tsx';
import { Field, Select } from '../../components/ui/field.tsx';
import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { useCreateRoad } from '../../features/roads/api/create-road.ts';
import { MeasuredUpload } from '../../features/roads/components/measured-upload.tsx';
import { RoadEditor } from '../../features/roads/components/road-editor.tsx';
import { RoadPreview } from '../../features/roads/components/road-preview.tsx';
import { kindWords } from '../../features/roads/components/road-words.ts';
import { RoadsTable } from '../../features/roads/components/roads-table.tsx';
import { isApiError } from '../../lib/api-client.ts';
import { roadsQueryOptions } from '../../lib/queries/roads.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';

/** The preview shown before anything is typed: the kind's starting values. */
function defaultDraft(kind: Exclude<RoadKind, 'measured'>): Road | null {
  const parsed = RoadSchema.safeParse(candidateOf(kind, defaultRoads[kind]));
  return parsed.success ? parsed.data : null;
}

type Adding = null | { kind: Exclude<RoadKind, 'measured'> } | { kind: 'measured' };

function NewRoad({ workspaceId, onDone }: { workspaceId: string; onDone: (roadId?: string) => void }) {
  const navigate = useNavigate();
  const create = useCreateRoad(workspaceId);
  const [adding, setAdding] = useState<Adding>({ kind: 'iso8608' });
  const [draft, setDraft] = useState<Road | null>(() => defaultDraft('iso8608'));
  const open = (roadId: string) => navigate(`/w/${workspaceId}/roads/${roadId}`);
  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,26rem)_minmax(0,1fr)]">
      <div className="grid content-start gap-3">
        <Field label="Kind of road">
          <Select
            value={adding?.kind ?? 'iso8608'}
            onChange={(e) => {
              const kind = e.target.value as RoadKind;
              setAdding({ kind } as Adding);
              setDraft(kind === 'measured' ? null : defaultDraft(kind));
              create.reset();
            }}
          >
            {roadKinds.map((k) => (
              <option key={k} value={k}>
                {k === 'measured' ? 'Measured profile (upload a CSV)' : kindWords[k]}
              </option>
            ))}
          </Select>
        </Field>
        {adding?.kind === 'measured' ? (
          <MeasuredUpload workspaceId={workspaceId} onSaved={open} />
        ) : (
          adding && (
            <RoadEditor
              key={adding.kind}
              kind={adding.kind}
              submitLabel="Save road"
              busy={create.isPending}
              error={isApiError(create.error) ? create.error : null}
              onDraft={setDraft}
              onSubmit={(name, definition) => create.mutate({ name, definition }, { onSuccess: (road) => open(road.id) })}
            />
          )
        )}
        <div>
          <Button variant="quiet" size="sm" onClick={() => onDone()}>
            Close
          </Button>
        </div>
      </div>
      <div className="min-w-0">{adding?.kind !== 'measured' && draft ? <RoadPreview road={draft} figures={null} /> : null}</div>
    </div>
  );
}

/** `/w/:workspaceId/roads`: the road library, and adding a road (defined or uploaded). */
export function RoadsRoute() {
  const workspace = useWorkspace();
  const roads = useQuery(roadsQueryOptions(workspace.id));
  const [adding, setAdding] = useState(false);
  const hrefOf = useCallback((r: RoadListItem) => `/w/${workspace.id}/roads/${r.id}`, [workspace.id]);
  const canEdit = workspace.can('engineer');

  return (
    <>
      <PageHeader
        title="Roads"
        detail="Random roads after ISO 8608, single events, sines, sweeps and measured profiles, each with its profile and spectrum."
        actions={
          canEdit && !adding ? (
            <Button variant="primary" size="sm" onClick={() => setAdding(true)}>
              Add a road
            </Button>
          ) : undefined
        }
      />
      {adding && (
        <Section title="New road">
          <NewRoad workspaceId={workspace.id} onDone={() => setAdding(false)} />
        </Section>
      )}
      <Section title="Library">
        <QueryGuard query={roads} what="roads">
          {(data) =>
            data.roads.length === 0 ? (
              <EmptyState title="No roads yet">{canEdit ? 'Add a random road of an ISO 8608 class, an event, or upload a measured profile.' : 'An engineer can add roads here.'}</EmptyState>
            ) : (
              <RoadsTable roads={data.roads} hrefOf={hrefOf} />
            )
          }
        </QueryGuard>
      </Section>
    </>
  );
}
