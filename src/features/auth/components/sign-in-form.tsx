import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { loginInput, type User } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { isApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { useLogin } from '../api/login';

function signInProblem(error: unknown, fallback: string | null): string | null {
  if (isApiError(error) && error.code === 'unauthenticated') return error.message || 'That e-mail and password do not match an account.';
  if (isApiError(error) && error.code === 'rate_limited') return error.message || 'Too many attempts. Wait a little and try again.';
  return fallback;
}

export function SignInForm({ onSuccess }: { onSuccess: (user: User) => void | Promise<void> }) {
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(loginInput), defaultValues: { email: '', password: '' } });
  const login = useLogin({ onSuccess });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    login.mutate(values, {
      onError: (error) => setProblem(signInProblem(error, applyServerErrors(error, form.setError, ['email', 'password']))),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Sign in">
      <FormAlert message={problem} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register('email')} />
      <TextField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...form.register('password')} />
      <Button type="submit" className="w-full" isLoading={login.isPending}>
        Sign in
      </Button>
    </form>
  );
}
