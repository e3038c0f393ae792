import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ResetRequestInput } from '../../../../shared/schemas/account.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input } from '../../../components/ui/field.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { applyServerErrors } from '../../../lib/form-errors.ts';
import { useRequestReset } from '../api/reset-password.ts';

export function ResetRequestForm() {
  const request = useRequestReset();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState, getValues } = useForm({
    resolver: zodResolver(ResetRequestInput),
    defaultValues: { email: '' },
  });

  if (request.isSuccess) {
    return (
      <Notice tone="ok" title="Check your e-mail">
        If <strong>{getValues('email')}</strong> has an account, a link to set a new password is on its way. The link works once, for 30 minutes.
      </Notice>
    );
  }

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    request.mutate(input, { onError: (error) => setFormError(applyServerErrors(error, setError, ['email'])) });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Ask for a reset link">
      <Field label="E-mail" error={formState.errors.email?.message}>
        <Input type="email" autoComplete="username" {...register('email')} />
      </Field>
      <FormError message={formError} />
      <Button type="submit" variant="primary" busy={request.isPending}>
        Send me a link
      </Button>
    </form>
  );
}
