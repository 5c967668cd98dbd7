// Query keys of the catalog, general to specific. The admin editor invalidates ['catalog'] after a change.
export const catalogKeys = {
  all: ['catalog'] as const,
  vehicles: () => [...catalogKeys.all, 'vehicles'] as const,
  vehicle: (slug: string) => [...catalogKeys.all, 'vehicle', slug] as const,
  assembly: (id: string, filter: { serial: string | null }) => [...catalogKeys.all, 'assembly', id, filter] as const,
  part: (id: string) => [...catalogKeys.all, 'part', id] as const,
};
