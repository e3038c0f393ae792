import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { Button } from '../../components/ui/button.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { PageHeader } from '../../components/ui/page-header.tsx';
import { ResultsCaution } from '../../components/ui/results-caution.tsx';
import { useToast } from '../../components/ui/toast.tsx';
import { useDeleteVehicle } from '../../features/vehicles/api/delete-vehicle.ts';
import { useVehicle } from '../../features/vehicles/api/get-vehicle.ts';
import { VehicleForm } from '../../features/vehicles/components/vehicle-form.tsx';
import { VehicleLivePanel } from '../../features/vehicles/components/vehicle-live-panel.tsx';
import { VehicleSummaryPanel } from '../../features/vehicles/components/vehicle-summary.tsx';
import { setupQueryOptions, setupsQueryOptions } from '../../lib/queries/setups.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';

/** `/w/:workspaceId/vehicles/:vehicleId`: both corners' modes and the front/rear comparison. */
export function VehicleRoute() {
  const { vehicleId = '' } = useParams();
  const workspace = useWorkspace();
  const canWrite = workspace.can('engineer');
  const vehicle = useVehicle(workspace.id, vehicleId);
  const setups = useQuery(setupsQueryOptions(workspace.id, 'exclude'));
  const remove = useDeleteVehicle(workspace.id);
  const navigate = useNavigate();
  const toast = useToast();
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);

  return (
    <QueryGuard query={vehicle} what="the vehicle" errorTitle={(e) => (e.code === 'not_found' ? 'No such vehicle here' : 'The vehicle did not load')}>
      {(v) => {

        return (
          <>
            <PageHeader
              eyebrow="Vehicle"
              title={v.name}
              detail={v.notes || undefined}
              actions={
                canWrite &&
                !editing && (
                  <>
                    <Button onClick={() => setEditing(true)}>Edit vehicle</Button>
                    {!confirming ? (
                      <Button variant="quiet" onClick={() => setConfirming(true)}>
                        Remove…
                      </Button>
                    ) : (
                      <span className="flex items-center gap-2 text-sm text-ink-soft">
                        Remove the vehicle? Its setups stay, ungrouped.
                        <Button
                          size="sm"
                          variant="danger"
                          busy={remove.isPending}
                          onClick={() =>
                            remove.mutate(v.id, {
                              onSuccess: () => {
                                toast.show(`${v.name} removed; its setups are kept.`);
                                navigate(`/w/${workspace.id}/corners`);
                              },
                              onError: (e) => toast.show(e.message, 'danger'),
                            })
                          }
                        >
                          Remove
                        </Button>
                        <Button size="sm" variant="quiet" onClick={() => setConfirming(false)}>
                          Keep
                        </Button>
                      </span>
                    )}
                  </>
                )
              }
            />
            {editing && (
              <VehicleForm
                workspaceId={workspace.id}
                vehicle={v}
                setupChoices={setups.data?.setups ?? []}
                onDone={() => {
                  setEditing(false);
                  toast.show('Vehicle saved.');
                }}
                onCancel={() => setEditing(false)}
              />
            )}
            <VehicleSummaryPanel workspaceId={workspace.id} vehicle={v} />
            {v.front && v.rear && <WholeVehicle workspaceId={workspace.id} frontId={v.front.id} rearId={v.rear.id} />}
            <ResultsCaution model="simplified models: one corner, and the body on two axles in the pitch plane" />
          </>
        );
      }}
    </QueryGuard>
  );
}

/** The live pitch-plane run, once both corners' latest revisions have loaded. */
function WholeVehicle({ workspaceId, frontId, rearId }: { workspaceId: string; frontId: string; rearId: string }) {
  const front = useQuery(setupQueryOptions(workspaceId, frontId));
  const rear = useQuery(setupQueryOptions(workspaceId, rearId));
  if (!front.data || !rear.data) return null;
  return <VehicleLivePanel front={front.data.revision.document} rear={rear.data.revision.document} />;
}
