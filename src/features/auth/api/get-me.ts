import { queryOptions, useQuery } from '@tanstack/react-query';
import { userReply, type User } from '@shared/schemas/auth';
import { apiPaths } from '@/config/paths';
import { api, isApiError } from '@/lib/api-client';
import { sessionQueryKey } from '@/lib/react-query';

export const authKeys = {
  all: ['auth'] as const,
  me: () => sessionQueryKey,
};

/** The signed-in user, or null when anonymous (a 401 here is an answer, not an error). */
export async function getMe(signal?: AbortSignal): Promise<User | null> {
  try {
    const reply = await api.get(apiPaths.auth.me, { signal, schema: userReply });
    return reply.user;
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
  });
}

export function useMe() {
  return useQuery(meQueryOptions());
}
