import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { type VehicleDetail, VehicleName, VehicleNotes } from '../../../../shared/schemas/vehicle.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../components/ui/field.tsx';
import { applyServerErrors } from '../../../lib/form-errors.ts';
import { useCreateVehicle } from '../api/create-vehicle.ts';
import { useUpdateVehicle } from '../api/update-vehicle.ts';

/** A setup that can go into a corner slot (the page passes the workspace's live setups). */
export interface SetupChoice {
  id: string;
  name: string;
  corner: 'front' | 'rear' | null;
  latestRevision: number;
}

const Values = z.object({ name: VehicleName, notes: VehicleNotes, frontSetupId: z.string(), rearSetupId: z.string() });
type Values = z.infer<typeof Values>;

function SlotSelect({ label, choices, corner, error, ...rest }: { label: string; choices: SetupChoice[]; corner: 'front' | 'rear'; error?: string } & React.SelectHTMLAttributes<HTMLSelectElement>) {
  // corners said to be this side first, then the rest
  const sorted = [...choices].sort((a, b) => Number(b.corner === corner) - Number(a.corner === corner) || a.name.localeCompare(b.name));
  return (
    <Field label={label} error={error}>
      <Select {...rest}>
        <option value="">empty</option>
        {sorted.map((s) => (
          <option key={s.id} value={s.id}>
            {s.name} (r{s.latestRevision}){s.corner && s.corner !== corner ? ` — a ${s.corner} corner` : ''}
          </option>
        ))}
      </Select>
    </Field>
  );
}

export interface VehicleFormProps {
  workspaceId: string;
  setupChoices: SetupChoice[];
  /** Editing an existing vehicle; absent for a new one. */
  vehicle?: VehicleDetail;
  onDone: (detail: VehicleDetail) => void;
  onCancel: () => void;
}

/** Name, notes and the two corner slots of a vehicle; a setup placed in a slot leaves its old one. */
export function VehicleForm({ workspaceId, setupChoices, vehicle, onDone, onCancel }: VehicleFormProps) {
  const create = useCreateVehicle(workspaceId);
  const update = useUpdateVehicle(workspaceId, vehicle?.id ?? '');
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(Values),
    defaultValues: { name: vehicle?.name ?? '', notes: vehicle?.notes ?? '', frontSetupId: vehicle?.front?.id ?? '', rearSetupId: vehicle?.rear?.id ?? '' },
  });
  const busy = create.isPending || update.isPending;

  const onSubmit = handleSubmit((v) => {
    setFormError('');
    const body = { name: v.name, notes: v.notes, frontSetupId: v.frontSetupId || null, rearSetupId: v.rearSetupId || null };
    const onError = (error: unknown) => setFormError(applyServerErrors<Values>(error, setError, ['name', 'notes', 'frontSetupId', 'rearSetupId']));
    if (vehicle) update.mutate(body, { onSuccess: onDone, onError });
    else create.mutate(body, { onSuccess: onDone, onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={vehicle ? 'Edit vehicle' : 'New vehicle'} className="mb-5 rounded border border-rule bg-paper-raised p-4">
      <div className="grid grid-cols-1 items-start gap-3 md:grid-cols-3">
        <Field label="Name" error={formState.errors.name?.message}>
          <Input placeholder="e.g. Brume Pipit, sport trim" {...register('name')} />
        </Field>
        <SlotSelect label="Front corner" corner="front" choices={setupChoices} error={formState.errors.frontSetupId?.message} {...register('frontSetupId')} />
        <SlotSelect label="Rear corner" corner="rear" choices={setupChoices} error={formState.errors.rearSetupId?.message} {...register('rearSetupId')} />
      </div>
      <Field label="Notes" className="mt-3" error={formState.errors.notes?.message}>
        <textarea rows={2} {...register('notes')} className="w-full rounded border border-rule-strong bg-paper-raised px-2.5 py-1.5 text-base" />
      </Field>
      <FormError message={formError} />
      <div className="mt-3 flex gap-2">
        <Button type="submit" variant="primary" busy={busy}>
          {vehicle ? 'Save vehicle' : 'Create vehicle'}
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
