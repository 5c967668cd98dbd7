export const sellerOrderKeys = {
  all: ['seller-orders'] as const,
  lists: () => [...sellerOrderKeys.all, 'list'] as const,
  list: (state: string | undefined) => [...sellerOrderKeys.lists(), state ?? 'all'] as const,
  detail: (id: string) => [...sellerOrderKeys.all, 'detail', id] as const,
  payouts: () => [...sellerOrderKeys.all, 'payouts'] as const,
  statement: (month: string) => [...sellerOrderKeys.all, 'statement', month] as const,
};
