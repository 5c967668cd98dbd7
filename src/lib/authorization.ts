import type { Role, User } from '@shared/schemas/auth';

// Client-side role checks only decide what to show; the server enforces every permission itself.
export function hasRole(user: User | null | undefined, role: Role): boolean {
  return !!user && user.roles.includes(role);
}
