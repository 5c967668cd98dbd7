/**
 * The number branch of search: a typed part number in any shape -> the parts that carry it (exact key, then
 * the O/0 I/1 folded key, then a key prefix, then numbers one typo away, all on btree indexes) -> everything
 * that fills a need for those parts (the supersession rules of server/domain/supersession.ts: a one-way step is
 * never walked backwards) -> a score and a note per part saying how it relates to what was typed.
 */
import { sql } from 'drizzle-orm';
import { interchangeLabels } from '../../shared/schemas/catalog';
import { parsePartNumber } from '../domain/part-number';
import { fillersForPart, indexEdges, resolve, type FillerSet, type Interchange, type PartNumberRow, type SupersessionIndex } from '../domain/supersession';
import { subgraphFromRow, subgraphStatement, type Subgraph, type SubgraphRow } from './catalog-graph';
import { run } from '../db/run';
import { nearFoldedKeys } from './search-text';

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
 * Finds the parts a typed number names and loads their supersession component: the exact or folded key, else
 * a key prefix (one round trip: the prefix level runs only when the exact one found nothing), else the folded
 * keys one typo away (a second round trip, needed by few searches). Btree indexes only.
 */
async function findSeeds(key: string, folded: string, notExact?: () => void): Promise<{ via: NumberMatch; rows: NumberRow[]; graph: Subgraph } | null> {
  // Keys are letters and digits only, so the LIKE pattern needs no escaping; text_pattern_ops serves it.
  const levels = sql`
    exact AS MATERIALIZED (SELECT part_id, printed, key, folded FROM part_numbers WHERE key = ${key} OR folded = ${folded} LIMIT 200),
    prefix AS MATERIALIZED (SELECT part_id, printed, key, folded FROM part_numbers
      WHERE ${key.length >= 3 ? sql`NOT EXISTS (SELECT 1 FROM exact)` : sql`false`} AND key LIKE ${key + '%'} LIMIT ${SEED_LIMIT}),
    seeds AS MATERIALIZED (SELECT 'exact' AS via, * FROM exact UNION ALL SELECT 'prefix', * FROM prefix),`;
  let found = await seedsWithGraph(levels, 'number_seeds');
  if (!found) notExact?.();
  // One typo away: the likely typos first (a smaller set of keys), the rest only when they find nothing.
  for (const which of ['likely', 'rest'] as const) {
    if (found) break;
    const near = nearFoldedKeys(folded, which);
    if (!near.length) continue;
    found = await seedsWithGraph(
      sql`seeds AS MATERIALIZED (SELECT 'near' AS via, n.part_id, n.printed, n.key, n.folded
        FROM unnest(${sql.param(near)}::text[]) k JOIN part_numbers n ON n.folded = k LIMIT ${SEED_LIMIT}),`,
      'number_near_seeds',
    );
  }
  if (!found) return null;
  const { seeds, graph } = found;
  const level = seeds[0].via;
  const via: NumberMatch = level === 'exact' ? (seeds.some((r) => r.key === key) ? 'exact' : 'alternate') : level;
  return { via, rows: seeds, graph };
}

/** Runs seed-finding CTEs (ending in `seeds`) with the component of what they find; null when they find nothing. */
async function seedsWithGraph(levels: ReturnType<typeof sql>, name: string): Promise<{ seeds: SeedRow[]; graph: Subgraph } | null> {
  const rows = await run<SubgraphRow & { seeds: SeedRow[] | null } & Record<string, unknown>>(
    subgraphStatement(sql`SELECT part_id FROM seeds`, levels, sql`, (SELECT json_agg(seeds) FROM seeds) AS seeds`),
    { prepare: name },
  );
  const seeds = (rows[0].seeds ?? []).sort(byKey);
  return seeds.length ? { seeds, graph: subgraphFromRow(rows[0]) } : null;
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
 * Resolves a typed number to scored hit parts; null when the text is not a number. `notExact` is called as soon
 * as neither the number nor a prefix of it is known (the caller may start on close numbers meanwhile).
 */
export async function resolveNumberHits(typed: string, notExact?: () => void): Promise<NumberResolution | null> {
  const parsed = parsePartNumber(typed);
  if (!parsed.ok) return null;
  const { key, folded } = parsed.value;
  const lower = { key: key.toLowerCase(), folded: folded.toLowerCase() };
  const seeds = await findSeeds(key, folded, notExact);
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

/** Close numbers by trigram similarity (the slow fallback, used only for the empty state). */
export async function closeNumbers(key: string, limit = 5): Promise<Array<{ number: string; partId: string }>> {
  if (key.length < 3) return [];
  const k = key.toUpperCase();
  const found = await run<{ printed: string; part_id: string }>(sql`
    SELECT printed, part_id FROM part_numbers WHERE key % ${k} ORDER BY similarity(key, ${k}) DESC, printed LIMIT ${limit * 3}`, { prepare: 'close_numbers' });
  const seen = new Set<string>();
  const rows = found.filter((x) => !seen.has(x.part_id) && (seen.add(x.part_id), true)).slice(0, limit);
  return rows.map((x) => ({ number: x.printed, partId: x.part_id }));
}
