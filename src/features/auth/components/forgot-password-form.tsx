import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { forgotPasswordInput } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/form-field';
import { FormAlert, Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useForgotPassword } from '../api/forgot-password';

export function ForgotPasswordForm() {
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(forgotPasswordInput), defaultValues: { email: '' } });
  const forgot = useForgotPassword();
  const { errors } = form.formState;

  if (forgot.isSuccess) {
    return (
      <Notice tone="ok" role="status" title="Check your e-mail">
        If an account uses {forgot.variables.email}, we have sent it a link to set a new password. The link works
        for a limited time.
      </Notice>
    );
  }

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    forgot.mutate(values, { onError: (error) => setProblem(applyServerErrors(error, form.setError, ['email'])) });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Reset password">
      <FormAlert message={problem} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register('email')} />
      <Button type="submit" className="w-full" isLoading={forgot.isPending}>
        Send reset link
      </Button>
    </form>
  );
}
