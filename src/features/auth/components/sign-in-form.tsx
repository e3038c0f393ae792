import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { SignInInput, type Me } from '../../../../shared/schemas/account.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input } from '../../../components/ui/field.tsx';
import { applyServerErrors } from '../../../lib/form-errors.ts';
import { useSignIn } from '../api/sign-in.ts';

export interface SignInFormProps {
  onSignedIn: (me: Me) => void;
  /** Values to put in the form (a demo account picked from the list); a new object refills it. */
  fill?: { email: string; password: string };
}

export function SignInForm({ onSignedIn, fill }: SignInFormProps) {
  const signIn = useSignIn();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setValue, setError, setFocus, formState } = useForm({
    resolver: zodResolver(SignInInput),
    defaultValues: { email: '', password: '' },
  });

  useEffect(() => {
    if (!fill) return;
    setValue('email', fill.email, { shouldValidate: true });
    setValue('password', fill.password, { shouldValidate: true });
    setFocus('password');
  }, [fill, setValue, setFocus]);

  const onSubmit = handleSubmit((input) => {
    setFormError('');
    signIn.mutate(input, {
      onSuccess: onSignedIn,
      onError: (error) => setFormError(applyServerErrors(error, setError, ['email', 'password'])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Sign in">
      <Field label="E-mail" error={formState.errors.email?.message}>
        <Input type="email" autoComplete="username" {...register('email')} />
      </Field>
      <Field label="Password" error={formState.errors.password?.message}>
        <Input type="password" autoComplete="current-password" {...register('password')} />
      </Field>
      <FormError message={formError} />
      <Button type="submit" variant="primary" busy={signIn.isPending}>
        Sign in
      </Button>
    </form>
  );
}
