// Query keys of the garage, general to specific. Everything under one vehicle shares the prefix
// ['garage', 'vehicle', id], so one invalidation refreshes its progress, checklists, log and needs.
export const garageKeys = {
  all: ['garage'] as const,
  vehicles: () => [...garageKeys.all, 'vehicles'] as const,
  models: () => [...garageKeys.all, 'models'] as const,
  model: (slug: string) => [...garageKeys.all, 'models', slug] as const,
  vehicle: (id: string) => [...garageKeys.all, 'vehicle', id] as const,
  vehicleDetail: (id: string) => [...garageKeys.vehicle(id), 'detail'] as const,
  checklist: (id: string, assemblyId: string) => [...garageKeys.vehicle(id), 'checklist', assemblyId] as const,
  log: (id: string) => [...garageKeys.vehicle(id), 'log'] as const,
  needs: (id: string) => [...garageKeys.vehicle(id), 'needs'] as const,
};

export const alertKeys = {
  all: ['alerts'] as const,
  list: () => [...alertKeys.all, 'list'] as const,
};

export const noticeKeys = {
  all: ['notices'] as const,
  list: () => [...noticeKeys.all, 'list'] as const,
  unreadCount: () => [...noticeKeys.all, 'unread-count'] as const,
};

/**
 * The cart feature's key prefix. Its internals are not ours to import; "put the plan in the cart" only needs
 * every cart query refetched, and ['cart'] is the house's general-to-specific prefix for it.
 */
export const cartKeyPrefix = ['cart'] as const;
