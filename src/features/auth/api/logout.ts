import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { authKeys } from './get-me';

export async function logout(): Promise<void> {
  await api.post(apiPaths.auth.logout);
}

/**
 * Signs out. `onSuccess` runs first (typically navigating away from a signed-in page), then the cache is
 * cleared of the previous user's data and ['auth'] is refetched.
 */
export function useLogout(options: { onSuccess?: () => void | Promise<void> } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSuccess: async () => {
      await options.onSuccess?.();
      queryClient.setQueryData(authKeys.me(), null);
      // Cart, orders, garage... belong to the person who just left.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
      await queryClient.invalidateQueries({ queryKey: authKeys.all });
    },
  });
}
