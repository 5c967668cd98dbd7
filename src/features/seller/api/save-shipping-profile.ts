import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerKeys } from './seller-keys';
import type { ShippingProfile, ShippingRules } from './seller-types';

export type ShippingProfileChange =
  | { kind: 'create'; name: string; rules: ShippingRules; isDefault: boolean }
  | { kind: 'update'; id: string; name?: string; rules?: ShippingRules; isDefault?: boolean }
  | { kind: 'delete'; id: string };

/** POST, PATCH or DELETE /api/me/shipping-profiles[/:id]. */
export async function saveShippingProfile(change: ShippingProfileChange): Promise<ShippingProfile | null> {
  if (change.kind === 'delete') {
    await api.delete(apiPaths.listings.shippingProfile(change.id));
    return null;
  }
  if (change.kind === 'create') {
    const { kind: _k, ...body } = change;
    return (await api.post<{ profile: ShippingProfile }>(apiPaths.listings.shippingProfiles, body)).profile;
  }
  const { kind: _k, id, ...body } = change;
  return (await api.patch<{ profile: ShippingProfile }>(apiPaths.listings.shippingProfile(id), body)).profile;
}

export function useSaveShippingProfile() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: saveShippingProfile, onSuccess: () => queryClient.invalidateQueries({ queryKey: sellerKeys.shippingProfiles() }) });
}
