/**
 * The number branch of search: a typed part number in any shape -> the parts that carry it (exact key, then
 * the O/0 I/1 folded key, then a key prefix, then numbers one typo away, all in one indexed statement) -> everything
 * that fills a need for those parts (the supersession rules of server/domain/supersession.ts: a one-way step is
 * never walked backwards) -> a score and a note per part saying how it relates to what was typed.
 */
import { sql } from 'drizzle-orm';
import { interchangeLabels } from '../../shared/schemas/catalog';
import { parsePartNumber } from '../domain/part-number';
import { fillersForPart, indexEdges, resolve, type FillerSet, type Interchange, type PartNumberRow, type SupersessionIndex } from '../domain/supersession';
import { subgraphFromRow, subgraphStatement, type Subgraph, type SubgraphRow } from './catalog-graph';
import { run } from '../db/run';
import { nearFoldedKeys, nearLookupKeys } from './search-text';

export type NumberMatch = 'exact' | 'alternate' | 'prefix' | 'near';

export interface NumberHitPart {
  partId: string;
  score: number;
  matchedNumber: string | null;
  fitNote: string | null;
}

export interface NumberResolution {
  /** Lower-case keys of the typed number, as the search rows' `simple` lexemes store them. */
  key: string;
  folded: string;
  via: NumberMatch | null;
  parts: NumberHitPart[];
}

const KIND_ORDER = ['maker', 'ordnance', 'nsn', 'hardware_standard', 'reproduction', 'vendor'];
const SEED_LIMIT = 50;
/** Candidates of the typo level, before the exact edit check (most searches have a handful). */
const NEAR_CANDIDATES = 400;

interface NumberRow {
  part_id: string;
  printed: string;
  key: string;
  folded: string;
}

interface SeedRow extends NumberRow {
  via: 'exact' | 'prefix' | 'near';
}

const byKey = (a: NumberRow, b: NumberRow) => (a.key < b.key ? -1 : a.key > b.key ? 1 : a.printed.localeCompare(b.printed));

/**
 * Finds the parts a typed number names and loads their supersession component, in one round trip: the exact
 * or folded key, else a key prefix, else the keys one typo away (each level runs only when the ones before it
 * found nothing). Btree indexes for the first two, the deletions index for typos; `notFound` is called as soon
 * as none of them finds anything.
 */
async function findSeeds(key: string, folded: string, notFound?: (folded: string) => void): Promise<{ via: NumberMatch; rows: NumberRow[]; graph: Subgraph } | null> {
  // A key prefix as a range on the C-ordered index (text_pattern_ops): in the generic plan this prepared
  // statement keeps, a LIKE with a parameter could not use that index. Keys are capital letters and digits, so
  // the key with its last character moved up by one bounds every key that starts with it.
  const upper = key.slice(0, -1) + String.fromCharCode(key.charCodeAt(key.length - 1) + 1);
  const levels = sql`
    exact AS MATERIALIZED (SELECT part_id, printed, key, folded FROM part_numbers WHERE key = ${key} OR folded = ${folded} LIMIT 200),
    prefix AS MATERIALIZED (SELECT part_id, printed, key, folded FROM part_numbers
      WHERE ${key.length >= 3 ? sql`NOT EXISTS (SELECT 1 FROM exact)` : sql`false`} AND key ~>=~ ${key} AND key ~<~ ${upper} LIMIT ${SEED_LIMIT}),
    near AS MATERIALIZED (SELECT part_id, printed, key, folded FROM part_numbers
      WHERE NOT EXISTS (SELECT 1 FROM exact) AND NOT EXISTS (SELECT 1 FROM prefix)
        AND number_key_deletions(folded) && ${sql.param(nearLookupKeys(folded))}::text[] LIMIT ${NEAR_CANDIDATES}),
    seeds AS MATERIALIZED (SELECT 'exact' AS via, * FROM exact UNION ALL SELECT 'prefix', * FROM prefix UNION ALL SELECT 'near', * FROM near),`;
  const [row] = await run<SubgraphRow & { seeds: SeedRow[] | null } & Record<string, unknown>>(
    subgraphStatement(sql`SELECT part_id FROM seeds`, levels, sql`, (SELECT json_agg(seeds) FROM seeds) AS seeds`),
    { prepare: 'number_seeds' },
  );
  let rows = (row.seeds ?? []).sort(byKey);
  if (rows[0]?.via === 'near') rows = nearest(folded, rows);
  if (!rows.length) {
    notFound?.(folded);
    return null;
  }
  const level = rows[0].via;
  const via: NumberMatch = level === 'exact' ? (rows.some((r) => r.key === key) ? 'exact' : 'alternate') : level;
  return { via, rows, graph: subgraphFromRow(row) };
}

/**
 * Of the candidates the deletions index found (keys sharing a deletion with the typed one, so up to two edits
 * away), those exactly one edit away: the likely typos when there are any, else the others.
 */
function nearest(folded: string, candidates: SeedRow[]): SeedRow[] {
  for (const which of ['likely', 'rest'] as const) {
    const near = new Set(nearFoldedKeys(folded, which));
    const rows = candidates.filter((r) => near.has(r.folded));
    if (rows.length) return rows.slice(0, SEED_LIMIT);
  }
  return [];
}

function primaryNumbers(numbers: PartNumberRow[]): Map<string, string> {
  const sorted = [...numbers].sort((a, b) => KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) || a.number.localeCompare(b.number));
  const out = new Map<string, string>();
  for (const n of sorted) if (!out.has(n.partId)) out.set(n.partId, n.number);
  return out;
}

function direction(path: string[], index: SupersessionIndex): 'forward' | 'backward' | 'mixed' {
  let fwd = 0;
  let back = 0;
  for (let i = 0; i + 1 < path.length; i++) {
    if ((index.out.get(path[i]) ?? []).some((e) => e.toPartId === path[i + 1])) fwd++;
    else back++;
  }
  return back === 0 ? 'forward' : fwd === 0 ? 'backward' : 'mixed';
}

function relation(interchange: Interchange, conditions: string[]): string {
  if (interchange === 'conditional') return `${interchangeLabels.conditional}${conditions.length ? ` (${conditions.join('; ')})` : ''}`;
  return interchangeLabels[interchange];
}

/**
 * Resolves a typed number to scored hit parts; null when the text is not a number. `notFound` is called with the
 * folded key as soon as the number is not known in any shape (the caller may start on close numbers meanwhile).
 */
export async function resolveNumberHits(typed: string, notFound?: (folded: string) => void): Promise<NumberResolution | null> {
  const parsed = parsePartNumber(typed);
  if (!parsed.ok) return null;
  const { key, folded } = parsed.value;
  const lower = { key: key.toLowerCase(), folded: folded.toLowerCase() };
  const seeds = await findSeeds(key, folded, notFound);
  if (!seeds) return { ...lower, via: null, parts: [] };

  const seedIds = [...new Set(seeds.rows.map((r) => r.part_id))];
  const graph = seeds.graph;
  const index = indexEdges(graph.edges);
  const primary = primaryNumbers(graph.numbers);

  let sets: FillerSet[];
  let seedSet: Set<string>;
  if (seeds.via === 'exact' || seeds.via === 'alternate') {
    const r = resolve({ query: typed, numbers: graph.numbers, edges: index });
    sets = r.fillerSets;
    seedSet = new Set(r.matches.filter((m) => m.matchedBy === 'exact' || m.matchedBy === 'alternate_number').map((m) => m.partId));
  } else {
    sets = seedIds.flatMap((id) => fillersForPart(id, index).fillerSets);
    seedSet = new Set(seedIds);
  }

  const matchedPrinted = new Map<string, string>();
  for (const r of seeds.rows) if (!matchedPrinted.has(r.part_id) || r.key === key) matchedPrinted.set(r.part_id, r.printed);
  const seedScore: Record<NumberMatch, number> = { exact: 100, alternate: 95, prefix: 90, near: 85 };

  const out = new Map<string, NumberHitPart>();
  const add = (hit: NumberHitPart) => {
    const prev = out.get(hit.partId);
    if (!prev || prev.score < hit.score) out.set(hit.partId, hit);
  };
  for (const id of seedSet) {
    const printed = matchedPrinted.get(id) ?? primary.get(id) ?? null;
    const exactHere = seeds.rows.some((r) => r.part_id === id && r.key === key);
    const how: NumberMatch = seeds.via === 'exact' || seeds.via === 'alternate' ? (exactHere ? 'exact' : 'alternate') : seeds.via;
    const fitNote =
      how === 'alternate'
        ? `matched ${printed}: O and 0, I and 1 and leading zeros read alike`
        : how === 'near'
          ? `closest number to what you typed: ${printed}`
          : null;
    add({ partId: id, score: seedScore[how], matchedNumber: printed, fitNote });
  }
  for (const set of sets) {
    const members = set.kitOf ? set.parts.flatMap((m) => m.alternatives) : [set.parts[0].alternatives[0]];
    for (const f of members) {
      if (seedSet.has(f.partId) && f.depth === 0) continue;
      const number = primary.get(f.partId) ?? null;
      const dir = direction(f.path, index);
      const word = dir === 'forward' ? 'replacement' : dir === 'backward' ? 'earlier' : 'related';
      const rel = relation(f.interchange, f.conditions);
      const fitNote = set.kitOf
        ? `listed under ${number ?? 'a kit part'}, one of ${set.parts.length} parts of the kit that replaces ${primary.get(set.kitOf) ?? 'the part you searched'}; ${rel}`
        : `listed under ${word} number ${number ?? '(none recorded)'}, ${rel}`;
      add({ partId: f.partId, score: (set.kitOf ? 70 : 80) - Math.min(f.depth, 20), matchedNumber: number, fitNote });
    }
  }
  return { ...lower, via: seeds.via, parts: [...out.values()] };
}

/**
 * Close numbers by trigram similarity of folded keys, so an O typed for a 0 costs nothing (the fallback of the
 * empty state; the function is in drizzle/0011_close_numbers_folded.sql).
 */
export async function closeNumbers(folded: string, limit = 5): Promise<Array<{ number: string; partId: string }>> {
  if (folded.length < 3) return [];
  const k = folded.toUpperCase();
  const found = await run<{ printed: string; part_id: string }>(sql`
    SELECT printed, part_id FROM close_part_numbers(${k}, ${limit * 3})`, { prepare: 'close_numbers' });
  const seen = new Set<string>();
  const rows = found.filter((x) => !seen.has(x.part_id) && (seen.add(x.part_id), true)).slice(0, limit);
  return rows.map((x) => ({ number: x.printed, partId: x.part_id }));
}
