import type { Destination } from '@shared/schemas/orders';
import { destinationKey } from '../utils/destination';

/**
 * The cart belongs to whoever is signed in, or to this browser; `owner` (a user id or 'anonymous') is part of
 * the key so the anonymous cart on screen is not mistaken for the merged one after sign-in.
 */
export const cartKeys = {
  all: ['cart'] as const,
  view: (owner: string, destination: Destination | null) => [...cartKeys.all, owner, destinationKey(destination)] as const,
  openCheckouts: () => [...cartKeys.all, 'open-checkouts'] as const,
};
