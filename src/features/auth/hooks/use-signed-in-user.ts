import type { User } from '@shared/schemas/auth';
import { useMe } from '../api/get-me';

/** The signed-in user, for components rendered inside a RequireAuth area. */
export function useSignedInUser(): User {
  const me = useMe();
  if (!me.data) throw new Error('useSignedInUser used outside a signed-in area');
  return me.data;
}
