import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api, isApiError } from '@/lib/api-client';
import { listingKeys } from './listing-keys';
import type { PartSummary } from './listing-types';

export interface PartCandidate {
  partId: string;
  name: string;
  number: string;
  /** exact, alternate_number, replaced_by, replaces, or the suggester's own word (e.g. name). */
  matchedBy: string;
}

interface ResolveReply {
  matches: Array<{ partId: string; number: string; matchedBy: string; depth: number }>;
  fillers: string[];
  parts: PartSummary[];
}

interface SuggestReply {
  suggestions: Array<{ type: string; partId?: string; number?: string; name?: string; matchedBy?: string }>;
}

/**
 * Candidates for the part picker. The number resolver walks supersessions (an old number also offers the
 * parts that replace it); the search suggester adds name matches where it is available.
 */
export async function searchParts(q: string, signal?: AbortSignal): Promise<PartCandidate[]> {
  const [resolved, suggested] = await Promise.all([
    api.get<ResolveReply>(apiPaths.catalog.resolve(q), { signal }).catch((e: unknown) => {
      // A query that is not shaped like a number is refused with 400: no number matches, names may.
      if (isApiError(e) && e.status === 400) return null;
      throw e;
    }),
    api.get<SuggestReply>(apiPaths.listings.suggest(q), { signal }).catch((e: unknown) => {
      // The suggester is optional here: its absence (404) or failure must not hide number matches.
      if (isApiError(e)) return null;
      throw e;
    }),
  ]);
  const out = new Map<string, PartCandidate>();
  if (resolved) {
    const byId = new Map(resolved.parts.map((p) => [p.id, p]));
    for (const m of [...resolved.matches].sort((a, b) => a.depth - b.depth)) {
      const p = byId.get(m.partId);
      if (p && !out.has(p.id)) out.set(p.id, { partId: p.id, name: p.name, number: m.number || p.primaryNumber || '', matchedBy: m.matchedBy });
    }
  }
  for (const s of suggested?.suggestions ?? []) {
    if (s.partId && !out.has(s.partId)) out.set(s.partId, { partId: s.partId, name: s.name ?? '', number: s.number ?? '', matchedBy: s.matchedBy ?? s.type });
  }
  return [...out.values()].slice(0, 12);
}

export function partSearchQueryOptions(q: string) {
  return queryOptions({
    queryKey: listingKeys.partSearch(q),
    queryFn: ({ signal }) => searchParts(q, signal),
    enabled: q.trim().length >= 2,
    staleTime: 5 * 60_000,
  });
}

export function usePartSearch(q: string) {
  return useQuery(partSearchQueryOptions(q.trim()));
}
