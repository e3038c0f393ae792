import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { type SetupDetail, SetupName, type SetupSummary } from '../../../../shared/schemas/setup-record.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../components/ui/field.tsx';
import { applyServerErrors } from '../../../lib/form-errors.ts';
import { getSetup } from '../../../lib/queries/setups.ts';
import { useCreateSetup } from '../api/create-setup.ts';
import { newSetupTemplate } from '../model/setup-template.ts';

const NewSetupValues = z.object({
  name: SetupName,
  corner: z.enum(['', 'front', 'rear']),
  vehicleId: z.string(),
  startFrom: z.string(),
});
type NewSetupValues = z.infer<typeof NewSetupValues>;

export interface NewSetupFormProps {
  workspaceId: string;
  /** Vehicles a new corner can join. */
  vehicles: Array<{ id: string; name: string }>;
  /** Setups whose latest revision can be the starting point. */
  setups: SetupSummary[];
  onCreated: (detail: SetupDetail) => void;
  onCancel: () => void;
}

/** A new setup, started from a plain small-car corner or from another setup's latest revision. */
export function NewSetupForm({ workspaceId, vehicles, setups, onCreated, onCancel }: NewSetupFormProps) {
  const create = useCreateSetup(workspaceId);
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState } = useForm<NewSetupValues>({
    resolver: zodResolver(NewSetupValues),
    defaultValues: { name: '', corner: '', vehicleId: '', startFrom: 'template' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError('');
    let setup = newSetupTemplate(values.name);
    if (values.startFrom !== 'template') {
      try {
        setup = { ...(await getSetup(workspaceId, values.startFrom)).revision.document, name: values.name };
      } catch (error) {
        setFormError((error as Error).message);
        return;
      }
    }
    const from = setups.find((s) => s.id === values.startFrom);
    create.mutate(
      {
        setup,
        corner: values.corner || null,
        vehicleId: values.vehicleId || null,
        message: from ? `Started from ${from.name}, revision ${from.latestRevision}` : 'Started from the plain small-car corner',
      },
      { onSuccess: onCreated, onError: (error) => setFormError(applyServerErrors(error, setError, ['corner', 'vehicleId'])) },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="New setup" className="mb-5 rounded border border-rule bg-paper-raised p-4">
      <div className="grid grid-cols-1 items-start gap-3 md:grid-cols-[minmax(12rem,2fr)_8rem_minmax(9rem,1fr)_minmax(12rem,1.5fr)]">
        <Field label="Name" error={formState.errors.name?.message}>
          <Input autoFocus placeholder="e.g. Brume Pipit front, sport" {...register('name')} />
        </Field>
        <Field label="Corner" error={formState.errors.corner?.message}>
          <Select {...register('corner')}>
            <option value="">not said</option>
            <option value="front">front</option>
            <option value="rear">rear</option>
          </Select>
        </Field>
        <Field label="Vehicle" error={formState.errors.vehicleId?.message}>
          <Select {...register('vehicleId')}>
            <option value="">none</option>
            {vehicles.map((v) => (
              <option key={v.id} value={v.id}>
                {v.name}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Start from" hint="You change every value on the bench afterwards.">
          <Select {...register('startFrom')}>
            <option value="template">a plain small-car corner</option>
            {setups.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name} (r{s.latestRevision})
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <FormError message={formError} />
      <div className="mt-3 flex gap-2">
        <Button type="submit" variant="primary" busy={create.isPending}>
          Create and open
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
