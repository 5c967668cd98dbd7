import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { authKeys } from './get-me';

export async function resetPassword(input: { token: string; password: string }): Promise<void> {
  await api.post(apiPaths.auth.resetPassword, input);
}

export function useResetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resetPassword,
    // A reset may end other sessions, including this one.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.all }),
  });
}
