import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../components/ui/button.tsx';
import { EmptyState } from '../../components/ui/empty-state.tsx';
import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { useToast } from '../../components/ui/toast.tsx';
import { NewSetupForm } from '../../features/setups/components/new-setup-form.tsx';
import { ImportSetupButton } from '../../features/setups/components/setup-file-buttons.tsx';
import { SetupsTable } from '../../features/setups/components/setups-table.tsx';
import { useVehicles } from '../../features/vehicles/api/get-vehicles.ts';
import { VehicleForm } from '../../features/vehicles/components/vehicle-form.tsx';
import { VehicleList } from '../../features/vehicles/components/vehicle-list.tsx';
import { setupsQueryOptions } from '../../lib/queries/setups.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';

/** `/w/:workspaceId/corners`: every corner setup, and the vehicles that group them. */
export function CornersRoute() {
  const workspace = useWorkspace();
  const canWrite = workspace.can('engineer');
  const navigate = useNavigate();
  const toast = useToast();
  const [showArchived, setShowArchived] = useState(false);
  const [adding, setAdding] = useState<'setup' | 'vehicle' | null>(null);
  const setups = useQuery(setupsQueryOptions(workspace.id, showArchived ? 'include' : 'exclude'));
  const live = useQuery(setupsQueryOptions(workspace.id, 'exclude'));
  const vehicles = useVehicles(workspace.id);
  const open = (setupId: string) => navigate(`/w/${workspace.id}/corners/${setupId}`);
  const vehicleRefs = (vehicles.data?.vehicles ?? []).map((v) => ({ id: v.id, name: v.name }));
  const liveSetups = live.data?.setups ?? [];

  return (
    <>
      <PageHeader
        title="Corners"
        detail="Corner setups with every revision kept. Group a front and a rear into a vehicle to compare their body frequencies."
        actions={
          canWrite && (
            <>
              <ImportSetupButton
                workspaceId={workspace.id}
                onImported={(d) => {
                  toast.show(`Imported "${d.name}" as a new setup.`);
                  open(d.id);
                }}
              />
              <Button variant="primary" onClick={() => setAdding('setup')}>
                New setup
              </Button>
            </>
          )
        }
      />
      {adding === 'setup' && <NewSetupForm workspaceId={workspace.id} vehicles={vehicleRefs} setups={liveSetups} onCreated={(d) => open(d.id)} onCancel={() => setAdding(null)} />}

      <Section title="Setups">
        <QueryGuard query={setups} what="setups">
          {(data) =>
            data.setups.length === 0 && !showArchived ? (
              <EmptyState title="No corner setups yet" action={canWrite && <Button onClick={() => setAdding('setup')}>New setup</Button>}>
                A setup holds one corner: masses, spring, tyre, damper curves, stops and stroke.
              </EmptyState>
            ) : (
              <SetupsTable
                workspaceId={workspace.id}
                setups={data.setups}
                extraFilters={
                  <label className="flex items-center gap-1.5 text-ink-soft">
                    <input type="checkbox" checked={showArchived} onChange={(e) => setShowArchived(e.target.checked)} className="accent-accent" />
                    show archived
                  </label>
                }
              />
            )
          }
        </QueryGuard>
      </Section>

      <Section
        title="Vehicles"
        actions={
          canWrite &&
          adding !== 'vehicle' && (
            <Button size="sm" onClick={() => setAdding('vehicle')}>
              New vehicle
            </Button>
          )
        }
      >
        {adding === 'vehicle' && (
          <VehicleForm
            workspaceId={workspace.id}
            setupChoices={liveSetups}
            onDone={(v) => {
              setAdding(null);
              navigate(`/w/${workspace.id}/vehicles/${v.id}`);
            }}
            onCancel={() => setAdding(null)}
          />
        )}
        <QueryGuard query={vehicles} what="vehicles">
          {(data) =>
            data.vehicles.length === 0 ? (
              <p className="text-sm text-ink-faint">No vehicles yet. A vehicle puts a front and a rear setup side by side.</p>
            ) : (
              <VehicleList workspaceId={workspace.id} vehicles={data.vehicles} />
            )
          }
        </QueryGuard>
      </Section>
    </>
  );
}
