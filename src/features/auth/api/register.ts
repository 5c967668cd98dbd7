import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userReply, type RegisterInput, type User } from '@shared/schemas/auth';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { authKeys } from './get-me';

export async function register(input: RegisterInput): Promise<User> {
  const reply = await api.post(apiPaths.auth.register, input, { schema: userReply });
  return reply.user;
}

export function useRegister() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: register,
    // The server may or may not start a session on registration; asking /me settles it.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.all }),
  });
}
