import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userReply, type User } from '@shared/schemas/auth';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { authKeys } from './get-me';

export async function verifyEmail(input: { token: string }): Promise<User> {
  const reply = await api.post(apiPaths.auth.verifyEmail, input, { schema: userReply });
  return reply.user;
}

export function useVerifyEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: verifyEmail,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.all }),
  });
}
