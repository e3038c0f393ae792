import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { SignUpInput, type SignUpAnswer } from '../../../../shared/schemas/account.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input } from '../../../components/ui/field.tsx';
import { applyServerErrors } from '../../../lib/form-errors.ts';
import { useSignUp } from '../api/sign-up.ts';

export function SignUpForm({ onSignedUp }: { onSignedUp: (answer: SignUpAnswer) => void }) {
  const signUp = useSignUp();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(SignUpInput),
    defaultValues: { name: '', email: '', password: '', workspaceName: '' },
  });
  const errors = formState.errors;

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    signUp.mutate(input, {
      onSuccess: onSignedUp,
      onError: (error) => setFormError(applyServerErrors(error, setError, ['name', 'email', 'password', 'workspaceName'])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Create an account">
      <Field label="Your name" error={errors.name?.message}>
        <Input autoComplete="name" {...register('name')} />
      </Field>
      <Field label="E-mail" error={errors.email?.message}>
        <Input type="email" autoComplete="email" {...register('email')} />
      </Field>
      <Field label="Password" error={errors.password?.message} hint="At least 10 characters.">
        <Input type="password" autoComplete="new-password" {...register('password')} />
      </Field>
      <Field label="Workspace name" error={errors.workspaceName?.message} hint="Your team's shared bench, e.g. “Chassis — rear axle”. You will administer it.">
        <Input {...register('workspaceName')} />
      </Field>
      <FormError message={formError} />
      <Button type="submit" variant="primary" busy={signUp.isPending}>
        Create account and workspace
      </Button>
    </form>
  );
}
