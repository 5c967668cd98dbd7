import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { registerInput, type User } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { isApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { useRegister } from '../api/register';

export function RegisterForm({ onSuccess }: { onSuccess: (user: User) => void }) {
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    resolver: zodResolver(registerInput),
    defaultValues: { displayName: '', email: '', password: '' },
  });
  const registerMutation = useRegister();
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    registerMutation.mutate(values, {
      onSuccess,
      onError: (error) => {
        // The address is taken: say so on the field itself.
        if (isApiError(error) && error.code === 'conflict') {
          form.setError('email', { type: 'server', message: error.message || 'An account already uses this e-mail address.' });
          return;
        }
        setProblem(applyServerErrors(error, form.setError, ['displayName', 'email', 'password']));
      },
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Create account">
      <FormAlert message={problem} />
      <TextField
        label="Display name"
        autoComplete="nickname"
        hint="Shown to sellers and buyers you trade with."
        error={errors.displayName?.message}
        {...form.register('displayName')}
      />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register('email')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. A few unrelated words work well."
        error={errors.password?.message}
        {...form.register('password')}
      />
      <Button type="submit" className="w-full" isLoading={registerMutation.isPending}>
        Create account
      </Button>
    </form>
  );
}
