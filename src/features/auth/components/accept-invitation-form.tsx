import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { Me } from '../../../../shared/schemas/account.ts';
import { AcceptInvitationInput } from '../../../../shared/schemas/workspace.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input } from '../../../components/ui/field.tsx';
import { applyServerErrors } from '../../../lib/form-errors.ts';
import { useAcceptInvitation } from '../api/invitation.ts';

/** Both fields are needed when the invitation creates the account. */
const NewAccount = AcceptInvitationInput.required();

/** For an address with no account yet: choose a name and password, then join. */
export function AcceptAsNewAccount({ token, email, onAccepted }: { token: string; email: string; onAccepted: (me: Me) => void }) {
  const accept = useAcceptInvitation(token);
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(NewAccount),
    defaultValues: { name: '', password: '' },
  });

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    accept.mutate(input, {
      onSuccess: onAccepted,
      onError: (error) => setFormError(applyServerErrors(error, setError, ['name', 'password'])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Accept the invitation">
      <Field label="E-mail">
        <Input type="email" value={email} readOnly autoComplete="username" className="text-ink-soft" />
      </Field>
      <Field label="Your name" error={formState.errors.name?.message}>
        <Input autoComplete="name" {...register('name')} />
      </Field>
      <Field label="Choose a password" error={formState.errors.password?.message} hint="At least 10 characters.">
        <Input type="password" autoComplete="new-password" {...register('password')} />
      </Field>
      <FormError message={formError} />
      <Button type="submit" variant="primary" busy={accept.isPending}>
        Create account and join
      </Button>
    </form>
  );
}

/** For someone already signed in as the invited address: one button. */
export function AcceptAsSignedIn({ token, onAccepted }: { token: string; onAccepted: (me: Me) => void }) {
  const accept = useAcceptInvitation(token);
  return (
    <div className="flex flex-col gap-3">
      <FormError message={accept.error?.message} />
      <Button variant="primary" busy={accept.isPending} onClick={() => accept.mutate({}, { onSuccess: onAccepted })}>
        Join the workspace
      </Button>
    </div>
  );
}
