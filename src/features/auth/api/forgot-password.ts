import { useMutation } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';

export async function forgotPassword(input: { email: string }): Promise<void> {
  // Always 202, whether or not the address has an account, so the form cannot be used to probe for users.
  await api.post(apiPaths.auth.forgotPassword, input);
}

export function useForgotPassword() {
  return useMutation({ mutationFn: forgotPassword });
}
