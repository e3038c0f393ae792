import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ResetConfirmInput } from '../../../../shared/schemas/account.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input } from '../../../components/ui/field.tsx';
import { isApiError } from '../../../lib/api-client.ts';
import { applyServerErrors } from '../../../lib/form-errors.ts';
import { useConfirmReset } from '../api/reset-password.ts';

export function ResetConfirmForm({ token, onDone, onLinkDead }: { token: string; onDone: () => void; onLinkDead: () => void }) {
  const confirm = useConfirmReset();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(ResetConfirmInput),
    defaultValues: { token, password: '' },
  });

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    confirm.mutate(input, {
      onSuccess: onDone,
      onError: (error) => {
        if (isApiError(error, 'gone')) onLinkDead();
        else setFormError(applyServerErrors(error, setError, ['password']));
      },
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Set a new password">
      <input type="hidden" {...register('token')} />
      <Field label="New password" error={formState.errors.password?.message} hint="At least 10 characters.">
        <Input type="password" autoComplete="new-password" {...register('password')} />
      </Field>
      <FormError message={formError || formState.errors.token?.message} />
      <Button type="submit" variant="primary" busy={confirm.isPending}>
        Set password
      </Button>
    </form>
  );
}
