import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { InviteInput, roles } from '../../../../shared/schemas/workspace.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../components/ui/field.tsx';
import { useToast } from '../../../components/ui/toast.tsx';
import { applyServerErrors } from '../../../lib/form-errors.ts';
import { useCreateInvitation } from '../api/invitations.ts';
import { roleWords } from './role-words.ts';

/** Invite someone by e-mail; the link in the message lets them join with the chosen role. */
export function InviteForm({ workspaceId }: { workspaceId: string }) {
  const toast = useToast();
  const invite = useCreateInvitation(workspaceId);
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState, reset, watch } = useForm({
    resolver: zodResolver(InviteInput),
    defaultValues: { email: '', role: 'engineer' as const },
  });

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    invite.mutate(input, {
      onSuccess: (sent) => {
        toast.show(`Invitation sent to ${sent.email}.`);
        reset({ email: '', role: input.role });
      },
      onError: (error) => setFormError(applyServerErrors(error, setError, ['email', 'role'])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Invite a member" className="rounded border border-rule bg-paper-raised p-4">
      <div className="grid grid-cols-1 items-start gap-3 sm:grid-cols-[minmax(14rem,1fr)_10rem_auto]">
        <Field label="E-mail address" error={formState.errors.email?.message}>
          <Input type="email" placeholder="name@example.com" {...register('email')} />
        </Field>
        <Field label="Role" error={formState.errors.role?.message}>
          <Select {...register('role')}>
            {roles.map((role) => (
              <option key={role} value={role}>
                {role}
              </option>
            ))}
          </Select>
        </Field>
        <div className="sm:pt-[1.45rem]">
          <Button type="submit" variant="primary" busy={invite.isPending}>
            Send invitation
          </Button>
        </div>
      </div>
      <p className="mt-2 text-xs text-ink-faint">
        {roleWords[watch('role')]} The link in the e-mail works for 7 days.
      </p>
      <FormError message={formError} />
    </form>
  );
}
