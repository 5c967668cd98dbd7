import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { catalogModelReply, catalogModelsReply, type CatalogModel, type CatalogModelDetail } from './garage-schemas';

// The add-vehicle form reads the catalog's public model list itself: the catalog feature's own fetchers are
// its internals, and the garage needs only names, serial ranges and variants.

export async function getCatalogModels(signal?: AbortSignal): Promise<CatalogModel[]> {
  const reply = await api.get(apiPaths.catalog.vehicles, { signal, schema: catalogModelsReply });
  return reply.vehicles;
}

export function useCatalogModels() {
  return useQuery(queryOptions({ queryKey: garageKeys.models(), queryFn: ({ signal }) => getCatalogModels(signal), staleTime: 10 * 60_000 }));
}

export async function getCatalogModel(slug: string, signal?: AbortSignal): Promise<CatalogModelDetail> {
  return api.get(apiPaths.catalog.vehicle(slug), { signal, schema: catalogModelReply });
}

export function useCatalogModel(slug: string | null) {
  return useQuery({
    queryKey: garageKeys.model(slug ?? ''),
    queryFn: ({ signal }) => getCatalogModel(slug!, signal),
    enabled: !!slug,
    staleTime: 10 * 60_000,
  });
}
