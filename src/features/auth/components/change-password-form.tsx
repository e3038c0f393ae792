import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { PasswordChangeInput } from '../../../../shared/schemas/account.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input } from '../../../components/ui/field.tsx';
import { isApiError } from '../../../lib/api-client.ts';
import { applyServerErrors } from '../../../lib/form-errors.ts';
import { useChangePassword } from '../api/change-password.ts';

export function ChangePasswordForm({ onChanged }: { onChanged: () => void }) {
  const change = useChangePassword();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState, reset } = useForm({
    resolver: zodResolver(PasswordChangeInput),
    defaultValues: { currentPassword: '', newPassword: '' },
  });

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    change.mutate(input, {
      onSuccess: () => {
        reset();
        onChanged();
      },
      onError: (error) => {
        // the server answers 401 for a wrong current password; say which field is wrong
        if (isApiError(error, 'unauthenticated') && error.fields.length === 0) {
          setError('currentPassword', { type: 'server', message: 'This is not your current password' });
        } else setFormError(applyServerErrors(error, setError, ['currentPassword', 'newPassword']));
      },
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex max-w-sm flex-col gap-4" aria-label="Change password">
      <Field label="Current password" error={formState.errors.currentPassword?.message}>
        <Input type="password" autoComplete="current-password" {...register('currentPassword')} />
      </Field>
      <Field label="New password" error={formState.errors.newPassword?.message} hint="At least 10 characters. Other signed-in browsers will be signed out.">
        <Input type="password" autoComplete="new-password" {...register('newPassword')} />
      </Field>
      <FormError message={formError} />
      <div>
        <Button type="submit" variant="primary" busy={change.isPending}>
          Change password
        </Button>
      </div>
    </form>
  );
}
