import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShopProfileInput } from '@shared/schemas/listings';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerKeys } from './seller-keys';
import type { Shop } from './seller-types';

export async function saveShop(input: ShopProfileInput): Promise<Shop> {
  return (await api.put<{ shop: Shop }>(apiPaths.listings.shop, input)).shop;
}

export function useSaveShop() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: saveShop, onSuccess: (shop) => queryClient.setQueryData(sellerKeys.shop(), shop) });
}
