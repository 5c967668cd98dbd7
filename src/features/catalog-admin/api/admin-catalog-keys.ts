// Keys of the editor's own queries. After any change the editor also drops the public catalog's cache
// (['catalog']), so the catalog pages show the edit at once.
export const adminCatalogKeys = {
  all: ['admin', 'catalog'] as const,
  resolve: (number: string) => [...adminCatalogKeys.all, 'resolve', number] as const,
  part: (id: string) => [...adminCatalogKeys.all, 'part', id] as const,
  vehicles: () => [...adminCatalogKeys.all, 'vehicles'] as const,
  vehicle: (slug: string) => [...adminCatalogKeys.all, 'vehicle', slug] as const,
  assembly: (id: string) => [...adminCatalogKeys.all, 'assembly', id] as const,
  dataQuality: () => [...adminCatalogKeys.all, 'data-quality'] as const,
};

export const publicCatalogKey = ['catalog'] as const;
