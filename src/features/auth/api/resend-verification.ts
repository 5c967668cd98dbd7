import { useMutation } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';

export async function resendVerification(): Promise<void> {
  await api.post(apiPaths.auth.resendVerification);
}

export function useResendVerification() {
  return useMutation({ mutationFn: resendVerification });
}
