import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { resetPasswordInput } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { isApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { useResetPassword } from '../api/reset-password';

export function ResetPasswordForm({ token, onSuccess }: { token: string; onSuccess: () => void }) {
  const [problem, setProblem] = useState<string | null>(null);
  // The token rides along as a form value so the whole request is checked by the shared schema.
  const form = useForm({ resolver: zodResolver(resetPasswordInput), defaultValues: { token, password: '' } });
  const reset = useResetPassword();
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    reset.mutate(values, {
      onSuccess,
      onError: (error) => {
        const left = applyServerErrors(error, form.setError, ['password']);
        const linkDead = isApiError(error) && ['not_found', 'invalid_state', 'unauthenticated'].includes(error.code);
        setProblem(linkDead ? `${left ?? 'This link no longer works.'} Ask for a new reset link.` : left);
      },
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Set new password">
      <FormAlert message={problem ?? (errors.token ? 'This reset link is not valid. Ask for a new one.' : null)} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...form.register('password')}
      />
      <Button type="submit" className="w-full" isLoading={reset.isPending}>
        Set new password
      </Button>
    </form>
  );
}
