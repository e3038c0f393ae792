import { Link } from 'react-router';
import type { VehicleSummary } from '../../../../shared/schemas/vehicle.ts';
import { formatSig } from '../../../lib/format.ts';

function Slot({ workspaceId, slot, corner }: { workspaceId: string; slot: VehicleSummary['front']; corner: string }) {
  return (
    <div className="min-w-0 text-sm">
      <span className="text-2xs tracking-wide text-ink-faint uppercase">{corner}</span>
      {slot ? (
        <Link to={`/w/${workspaceId}/corners/${slot.id}`} className="block truncate text-ink hover:text-accent hover:underline">
          {slot.name} <span className="figures text-xs text-ink-faint">r{slot.latestRevision}</span>
        </Link>
      ) : (
        <span className="block text-ink-faint">empty</span>
      )}
    </div>
  );
}

/** Vehicles as compact rows: both corners and the rear/front body-frequency ratio. */
export function VehicleList({ workspaceId, vehicles }: { workspaceId: string; vehicles: VehicleSummary[] }) {
  return (
    <ul className="divide-y divide-rule/80 rounded border border-rule bg-paper-raised" aria-label="Vehicles">
      {vehicles.map((v) => (
        <li key={v.id} className="grid grid-cols-[minmax(8rem,1fr)_minmax(0,1.4fr)_minmax(0,1.4fr)_6rem] items-center gap-4 px-3 py-2">
          <Link to={`/w/${workspaceId}/vehicles/${v.id}`} className="font-medium text-ink hover:text-accent hover:underline">
            {v.name}
          </Link>
          <Slot workspaceId={workspaceId} slot={v.front} corner="front" />
          <Slot workspaceId={workspaceId} slot={v.rear} corner="rear" />
          <div className="text-right">
            <span className="block text-2xs tracking-wide text-ink-faint uppercase">rear/front</span>
            <span className="figures text-sm">{v.bodyRatio === null ? '—' : formatSig(v.bodyRatio, 3)}</span>
          </div>
        </li>
      ))}
    </ul>
  );
}
