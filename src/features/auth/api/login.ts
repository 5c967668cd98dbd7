import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userReply, type LoginInput, type User } from '@shared/schemas/auth';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { authKeys } from './get-me';

export async function login(input: LoginInput): Promise<User> {
  const reply = await api.post(apiPaths.auth.login, input, { schema: userReply });
  return reply.user;
}

export function useLogin(options: { onSuccess?: (user: User) => void | Promise<void> } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: async (user) => {
      queryClient.setQueryData(authKeys.me(), user);
      await queryClient.invalidateQueries({ queryKey: authKeys.all });
      await options.onSuccess?.(user);
    },
  });
}
