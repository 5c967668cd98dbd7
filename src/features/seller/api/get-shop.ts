import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerKeys } from './seller-keys';
import type { Shop } from './seller-types';

export async function getShop(signal?: AbortSignal): Promise<Shop | null> {
  return (await api.get<{ shop: Shop | null }>(apiPaths.listings.shop, { signal })).shop;
}

export function shopQueryOptions() {
  return queryOptions({ queryKey: sellerKeys.shop(), queryFn: ({ signal }) => getShop(signal) });
}

export function useShop() {
  return useQuery(shopQueryOptions());
}
