// Query keys of the listings feature, general to specific.
export const listingKeys = {
  all: ['listings'] as const,
  detail: (id: string) => [...listingKeys.all, 'detail', id] as const,
  partSearch: (q: string) => [...listingKeys.all, 'part-search', q] as const,
};
