import { useState } from 'react';
import { Link } from 'react-router';
import { type Corner, type SetupDetail, SetupName } from '../../../../shared/schemas/setup-record.ts';
import { Button } from '../../../components/ui/button.tsx';
import { useToast } from '../../../components/ui/toast.tsx';
import { useUpdateSetup } from '../api/update-setup.ts';

/** The setup's name, editable in place by engineers (a rename is not a revision). */
export function SetupNameHeading({ workspaceId, detail, canWrite }: { workspaceId: string; detail: SetupDetail; canWrite: boolean }) {
  const update = useUpdateSetup(workspaceId, detail.id);
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(detail.name);
  const [error, setError] = useState('');
  if (!editing) {
    return (
      <span className="inline-flex items-baseline gap-2">
        <span>{detail.name}</span>
        {canWrite && (
          <button type="button" onClick={() => (setText(detail.name), setEditing(true))} className="text-xs font-normal text-accent hover:underline">
            Rename
          </button>
        )}
      </span>
    );
  }
  const save = () => {
    const parsed = SetupName.safeParse(text);
    if (!parsed.success) return setError(parsed.error.issues[0]?.message ?? 'Check the name');
    update.mutate({ name: parsed.data }, { onSuccess: () => setEditing(false), onError: (e) => setError(e.message) });
  };
  return (
    <form
      className="inline-flex flex-wrap items-center gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        save();
      }}
    >
      <input aria-label="Setup name" autoFocus value={text} onChange={(e) => setText(e.target.value)} className="h-8 w-80 rounded-sm border border-rule-strong bg-paper-raised px-2 text-lg font-semibold" />
      <Button type="submit" size="sm" variant="primary" busy={update.isPending}>
        Rename
      </Button>
      <Button size="sm" variant="quiet" onClick={() => setEditing(false)}>
        Cancel
      </Button>
      {error && <span role="alert" className="text-sm font-normal text-danger">{error}</span>}
    </form>
  );
}

function groupWords(detail: SetupDetail) {
  if (detail.vehicle && detail.corner) return `${detail.corner === 'front' ? 'Front' : 'Rear'} corner of`;
  if (detail.corner) return `${detail.corner === 'front' ? 'Front' : 'Rear'} corner, in no vehicle`;
  return 'Not grouped with a vehicle';
}

/** Which vehicle and corner the setup belongs to; engineers change it in place. */
export function GroupingControl({ workspaceId, detail, canWrite, vehicles }: { workspaceId: string; detail: SetupDetail; canWrite: boolean; vehicles: Array<{ id: string; name: string }> }) {
  const update = useUpdateSetup(workspaceId, detail.id);
  const toast = useToast();
  const [editing, setEditing] = useState(false);
  const [vehicleId, setVehicleId] = useState(detail.vehicle?.id ?? '');
  const [corner, setCorner] = useState<Corner | ''>(detail.corner ?? '');
  const [error, setError] = useState('');

  if (!editing) {
    return (
      <span className="inline-flex flex-wrap items-baseline gap-x-1.5">
        <span>{groupWords(detail)}</span>
        {detail.vehicle && (
          <Link className="font-medium text-accent hover:underline" to={`/w/${workspaceId}/vehicles/${detail.vehicle.id}`}>
            {detail.vehicle.name}
          </Link>
        )}
        {canWrite && !detail.archivedAt && (
          <button type="button" className="ml-1 text-xs text-accent hover:underline" onClick={() => (setVehicleId(detail.vehicle?.id ?? ''), setCorner(detail.corner ?? ''), setError(''), setEditing(true))}>
            Change
          </button>
        )}
      </span>
    );
  }
  return (
    <form
      className="inline-flex flex-wrap items-center gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        update.mutate(
          { vehicleId: vehicleId || null, corner: corner || null },
          {
            onSuccess: (d) => {
              setEditing(false);
              toast.show(d.vehicle ? `Now the ${d.corner} corner of ${d.vehicle.name}.` : 'Grouping saved.');
            },
            onError: (err) => setError(err.fields.map((f) => f.message).join(' ') || err.message),
          },
        );
      }}
    >
      <select aria-label="Vehicle" value={vehicleId} onChange={(e) => setVehicleId(e.target.value)} className="h-7 rounded-sm border border-rule-strong bg-paper-raised px-1.5 text-sm">
        <option value="">no vehicle</option>
        {vehicles.map((v) => (
          <option key={v.id} value={v.id}>
            {v.name}
          </option>
        ))}
      </select>
      <select aria-label="Corner" value={corner} onChange={(e) => setCorner(e.target.value as Corner | '')} className="h-7 rounded-sm border border-rule-strong bg-paper-raised px-1.5 text-sm">
        <option value="">corner not said</option>
        <option value="front">front</option>
        <option value="rear">rear</option>
      </select>
      <Button type="submit" size="sm" variant="primary" busy={update.isPending}>
        Save grouping
      </Button>
      <Button size="sm" variant="quiet" onClick={() => setEditing(false)}>
        Cancel
      </Button>
      {vehicleId && <span className="text-xs text-ink-faint">A setup already in that slot moves out of it.</span>}
      {error && <span role="alert" className="text-sm text-danger">{error}</span>}
    </form>
  );
}

/** Archive (out of the list and out of its vehicle; revisions kept) or bring back. */
export function ArchiveButton({ workspaceId, detail }: { workspaceId: string; detail: SetupDetail }) {
  const update = useUpdateSetup(workspaceId, detail.id);
  const toast = useToast();
  const archived = Boolean(detail.archivedAt);
  return (
    <Button
      variant={archived ? 'secondary' : 'quiet'}
      busy={update.isPending}
      onClick={() =>
        update.mutate(
          { archived: !archived },
          { onSuccess: () => toast.show(archived ? `${detail.name} is back in the list.` : `${detail.name} archived; its revisions are kept.`), onError: (e) => toast.show(e.message, 'danger') },
        )
      }
    >
      {archived ? 'Bring back from archive' : 'Archive'}
    </Button>
  );
}
