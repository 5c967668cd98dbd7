import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerKeys } from './seller-keys';
import type { ShippingProfile } from './seller-types';

export async function getShippingProfiles(signal?: AbortSignal): Promise<ShippingProfile[]> {
  return (await api.get<{ profiles: ShippingProfile[] }>(apiPaths.listings.shippingProfiles, { signal })).profiles;
}

export function shippingProfilesQueryOptions() {
  return queryOptions({ queryKey: sellerKeys.shippingProfiles(), queryFn: ({ signal }) => getShippingProfiles(signal) });
}

export function useShippingProfiles() {
  return useQuery(shippingProfilesQueryOptions());
}
