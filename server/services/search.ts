/**
 * Faceted search over catalog parts and live listings, in PostgreSQL (drizzle/0004_search.sql).
 *
 * The story of one search:
 * 1. The query is read as a part number (server/domain/part-number.ts) or as words. A number is resolved on
 *    btree keys and the supersession graph to a scored set of parts (search-number.ts); words become a
 *    tsquery, each word not in the vocabulary widened with its closest vocabulary word (trigram).
 * 2. Filters become facet codes. One statement scans the rows that match and fail at most one filter group,
 *    and returns, in one pass, the total, every facet's counts (each facet ignoring its own filter:
 *    disjunctive faceting) and the page of hits after the keyset cursor.
 * 3. Work is bounded: a probe on a fixed 1-in-128 sample estimates how many rows the scan would read; above
 *    EXACT_MAX the counting runs on a 1-in-16 or 1-in-128 sample (partial indexes) and the reply says the
 *    counts are estimates. The page then comes from the full index: the rows passing every filter, at most
 *    CANDIDATES of them (exact total and page when they are that few; relevance ranked within them when more;
 *    price and newest sorts walk their btree).
 * 4. The statement that picks the page also returns its rows' display fields; facet labels come from a cache.
 */
import { sql, type SQL } from 'drizzle-orm';
import { facetNames, type FacetName, type FacetValue, type SearchHit, type SearchQuery, type SearchReply, type SuggestReply } from '../../shared/schemas/search';
import { conditions, type Condition } from '../domain/conditions';
import { parsePartNumber } from '../domain/part-number';
import { env } from '../env';
import { readCache } from '../lib/read-cache';
import { AppError } from '../errors';
import { FACET_GROUP, FIXED_VALUES, facetOfGroup, fixedCode, fixedLabel, groupOf } from './search-codes';
import { decodeCursor, encodeCursor, searchFingerprint, type CursorState, type SampleMode } from './search-cursor';
import { closeNumbers, resolveNumberHits, type NumberHitPart } from './search-number';
import { run } from '../db/run';
export { withStatementLog, type LoggedStatement } from '../db/run';
import { correctableWords, isNumberQuery, parseTextQuery, type QueryChunk } from './search-text';

/** Above this many rows to scan (estimated), counts come from a sample. Measured with `npm run bench:search`. */
export const EXACT_MAX = 3000;
/** Largest sample the 1-in-16 level should read before the 1-in-128 level takes over. */
const S16_MAX_ROWS = 4000;
const RATE: Record<SampleMode, number> = { exact: 1, s16: 16, s128: 128 };
const PROBE_CAP = 500;
/** Rows passing every filter that a sampled search still pages through exactly (and ranks, for relevance). */
const CANDIDATES = 1000;
/** Facet values returned per facet at most (the most frequent ones, plus any selected). */
const FACET_ROWS = 50;
const FACET_TOP: Partial<Record<FacetName, number>> = { vehicle: 50, assembly: 30, seller: 30, shipsTo: 30 };

// ---------------------------------------------------------------------------------------------------------
// Filters -> facet code groups
// ---------------------------------------------------------------------------------------------------------

interface FilterGroup {
  facet: FacetName;
  group: number;
  /** Codes of which a row needs one (empty: no code condition). */
  codes: number[];
  priceMin?: number;
  priceMax?: number;
  /** Parts or listings: the row's own flag, not its codes (a code on most rows is a costly index condition). */
  isListing?: boolean;
}

interface Selected {
  facet: FacetName;
  value: string;
  label: string;
  code: number;
}

const NO_CODE = -1;

function validation(field: string, message: string) {
  return new AppError(400, 'validation_failed', message, { fieldErrors: { [field]: [message] } });
}

async function resolveFilters(q: SearchQuery): Promise<{ groups: FilterGroup[]; selected: Selected[] }> {
  const groups: FilterGroup[] = [];
  const selected: Selected[] = [];
  const fixed = (facet: FacetName, values: string[]) => {
    if (!values.length) return;
    const codes = values.map((v) => fixedCode(facet, v));
    groups.push({ facet, group: FACET_GROUP[facet], codes });
    values.forEach((v, i) => selected.push({ facet, value: v, label: fixedLabel(facet, v) ?? v, code: codes[i] }));
  };
  const priceSort = q.sort === 'price_asc' || q.sort === 'price_desc';
  // Catalog parts have no price: a price sort lists listings.
  const type = q.type ?? (priceSort ? 'listing' : undefined);
  if (type) {
    groups.push({ facet: 'type', group: FACET_GROUP.type, codes: [], isListing: type === 'listing' });
    selected.push({ facet: 'type', value: type, label: fixedLabel('type', type) ?? type, code: fixedCode('type', type) });
  }
  fixed('condition', q.condition);
  fixed('originality', q.originality);
  if (q.price.length || q.priceMin !== undefined || q.priceMax !== undefined) {
    const codes = q.price.map((b) => fixedCode('price', b));
    groups.push({ facet: 'price', group: FACET_GROUP.price, codes, priceMin: q.priceMin, priceMax: q.priceMax });
    q.price.forEach((b, i) => selected.push({ facet: 'price', value: b, label: fixedLabel('price', b) ?? b, code: codes[i] }));
  }
  for (const [facet, v] of [['pickup', q.pickup], ['hasPhotos', q.hasPhotos], ['inStock', q.inStock]] as const) {
    if (v !== undefined) fixed(facet, [String(v)]);
  }

  // The values sit in a sub-select, so the prepared statement's plan does not depend on how many there are and
  // PostgreSQL keeps one generic plan (DEVELOPERS.md, decision 14).
  const anyOf = (values: string[], type: 'text' | 'uuid') => sql`(SELECT ${sql.param(values)}::${sql.raw(type)}[])::${sql.raw(type)}[]`;
  const lookups: SQL[] = [];
  if (q.vehicle.length)
    lookups.push(sql`SELECT 'vehicle' AS facet, v.slug AS value, v.name AS label, r.code FROM vehicle_models v
      LEFT JOIN search_facet_refs r ON r.facet = 2 AND r.ref = v.id::text WHERE v.slug = ANY(${anyOf(q.vehicle, 'text')})`);
  if (q.system.length)
    lookups.push(sql`SELECT 'system' AS facet, s.slug AS value, s.name AS label, r.code FROM systems s
      LEFT JOIN search_facet_refs r ON r.facet = 3 AND r.ref = s.id::text WHERE s.slug = ANY(${anyOf(q.system, 'text')})`);
  if (q.assembly.length)
    lookups.push(sql`SELECT 'assembly' AS facet, a.slug AS value, a.name AS label, r.code FROM assemblies a
      LEFT JOIN search_facet_refs r ON r.facet = 4 AND r.ref = a.id::text WHERE a.slug = ANY(${anyOf(q.assembly, 'text')})`);
  if (q.seller.length)
    lookups.push(sql`SELECT 'seller' AS facet, u.id::text AS value, coalesce(sp.shop_name, u.display_name) AS label, r.code FROM users u
      LEFT JOIN seller_profiles sp ON sp.user_id = u.id
      LEFT JOIN search_facet_refs r ON r.facet = 7 AND r.ref = u.id::text WHERE u.id = ANY(${anyOf(q.seller, 'uuid')})`);
  if (q.shipsTo.length)
    lookups.push(sql`SELECT 'shipsTo' AS facet, c AS value, c AS label, r.code FROM unnest(${anyOf(q.shipsTo, 'text')}) c
      LEFT JOIN search_facet_refs r ON r.facet = 9 AND r.ref = c`);
  if (lookups.length) {
    const rows = await run<{ facet: FacetName; value: string; label: string; code: number | null }>(sql.join(lookups, sql` UNION ALL `), { prepare: 'facet_filters' });
    for (const facet of ['vehicle', 'system', 'assembly', 'seller', 'shipsTo'] as const) {
      const wanted = q[facet];
      if (!wanted.length) continue;
      const found = rows.filter((r) => r.facet === facet);
      const missing = wanted.filter((w) => !found.some((f) => f.value === w));
      if (missing.length) throw validation(facet, `Unknown ${facet}: ${missing.join(', ')}`);
      // A known value that no row carries yet gets a code no row has, so the filter matches nothing.
      const codes = found.map((f) => f.code ?? NO_CODE);
      groups.push({ facet, group: FACET_GROUP[facet], codes });
      for (const f of found) selected.push({ facet, value: f.value, label: facet === 'shipsTo' ? (fixedLabel('shipsTo', f.value) ?? f.value) : f.label, code: f.code ?? NO_CODE });
    }
  }
  // Most selective first: the scan's indexable pre-filter uses the first two groups.
  groups.sort((a, b) => SELECTIVITY.indexOf(a.facet) - SELECTIVITY.indexOf(b.facet));
  return { groups, selected };
}

/** Facets from usually selective (a seller, an assembly) to usually broad (a yes/no, parts or listings). */
const SELECTIVITY: FacetName[] = ['seller', 'assembly', 'vehicle', 'system', 'condition', 'price', 'shipsTo', 'originality', 'pickup', 'hasPhotos', 'inStock', 'type'];

// ---------------------------------------------------------------------------------------------------------
// The scan statement
// ---------------------------------------------------------------------------------------------------------

type Match =
  | { kind: 'text'; tsquery: SQL; text: string }
  | { kind: 'number'; partIds: string[]; scores: number[]; keys: string[] }
  | { kind: 'browse' };

type Sort = 'relevance' | 'price_asc' | 'price_desc' | 'newest';

/** A filter group's condition, bare so the planner sees (and indexes) the array operator. */
function groupPredicate(g: FilterGroup): SQL {
  const parts: SQL[] = [];
  if (g.isListing !== undefined) parts.push(g.isListing ? sql`d.is_listing` : sql`NOT d.is_listing`);
  if (g.codes.length) parts.push(sql`d.facets && ${sql.param(g.codes)}::int[]`);
  // Only listings have a price; saying so lets the planner use the (listings-only) price index.
  if (g.priceMin !== undefined || g.priceMax !== undefined) parts.push(sql`d.is_listing`);
  if (g.priceMin !== undefined) parts.push(sql`d.price >= ${g.priceMin}`);
  if (g.priceMax !== undefined) parts.push(sql`d.price <= ${g.priceMax}`);
  return sql`(${sql.join(parts, sql` AND `)})`;
}

/** The same, never null (a part row has no price), for counting failures. */
const passes = (g: FilterGroup) => sql`coalesce(${groupPredicate(g)}, false)`;

function matchPredicate(m: Match): SQL {
  if (m.kind === 'text') return sql`d.tsv @@ (${m.tsquery})`;
  if (m.kind === 'number') {
    // Parts found through the number graph, plus rows whose text carries the number (listings not yet linked).
    // The values sit in sub-selects, so no plan depends on them: PostgreSQL then keeps one generic plan for the
    // prepared number scan instead of planning it anew for each search (about 1 ms each time).
    const lexemes = sql.join(m.keys.map((k) => sql`plainto_tsquery('simple', ${k})`), sql` || `);
    return sql`(d.part_id = ANY((SELECT ${sql.param(m.partIds)}::uuid[])::uuid[]) OR d.tsv @@ (SELECT ${lexemes}))`;
  }
  return sql`true`;
}

function scoreExpr(m: Match): SQL {
  if (m.kind === 'text') {
    // Numbers weigh most (A), then names and titles (B), then descriptions (C); trigram similarity of the title
    // to the typed text lifts near spellings.
    return sql`(ts_rank('{0.05, 0.2, 0.4, 1.0}', d.tsv, (${m.tsquery}))::float8 + 0.3 * similarity(d.title, ${m.text})::float8)`;
  }
  if (m.kind === 'number') {
    return sql`(coalesce((${sql.param(m.scores)}::float8[])[array_position(${sql.param(m.partIds)}::uuid[], d.part_id)], 50)
      + CASE WHEN d.is_listing THEN 0 ELSE 0.5 END)::float8`;
  }
  return sql`0::float8`;
}

/** Groups an index can answer (facet codes on GIN, price on its btree); the parts-or-listings flag is not one. */
const indexable = (groups: FilterGroup[]) => groups.filter((g) => g.codes.length || g.priceMin !== undefined || g.priceMax !== undefined);

function sampleCond(mode: SampleMode, m: Match, groups: FilterGroup[]): SQL {
  if (mode === 'exact') return sql``;
  // Browsing without filters walks the sample's btree (its predicate carries `doc_id > 0`); words or filters use
  // the GIN samples.
  const browse = m.kind === 'browse' && indexable(groups).length < 2 ? sql` AND d.doc_id > 0` : sql``;
  return mode === 's16' ? sql`AND d.doc_id % 16 = 0${browse}` : sql`AND d.doc_id % 128 = 0${browse}`;
}

function sortParts(sort: Sort) {
  switch (sort) {
    case 'relevance':
      return { key: sql`score`, order: sql`score DESC, doc_id ASC`, after: (c: CursorState) => sql`(score < ${c.value} OR (score = ${c.value} AND doc_id > ${c.docId}))` };
    case 'newest':
      return {
        key: sql`(extract(epoch FROM created) * 1000)::float8`,
        order: sql`created DESC, doc_id DESC`,
        after: (c: CursorState) => sql`(created, doc_id) < ('epoch'::timestamptz + ${c.value} * interval '1 millisecond', ${c.docId})`,
      };
    case 'price_asc':
      return { key: sql`price::float8`, order: sql`price ASC, doc_id ASC`, after: (c: CursorState) => sql`(price, doc_id) > (${c.value}, ${c.docId})` };
    case 'price_desc':
      return { key: sql`price::float8`, order: sql`price DESC, doc_id DESC`, after: (c: CursorState) => sql`(price, doc_id) < (${c.value}, ${c.docId})` };
  }
}

interface ScanResult {
  total: number;
  scanned: number;
  counts: Array<[number, number]>;
  hits: PageRow[] | null;
}

/** A page entry: search row id, sort key, and the row's display fields. */
type PageRow = [number, number, DisplayRow];

/**
 * The rows a scan visits: those that match and may fail at most one filter group (an indexable pre-filter),
 * with how many groups each fails and which.
 */
function visitSet(m: Match, groups: FilterGroup[], mode: SampleMode): SQL {
  const preds = groups.map(passes);
  const nfail = preds.length ? sql.join(preds.map((p) => sql`(NOT ${p})::int`), sql` + `) : sql`0`;
  const fail = preds.length ? sql`CASE ${sql.join(preds.map((p, i) => sql`WHEN NOT ${p} THEN ${groups[i].group}`), sql` `)} ELSE 0 END` : sql`0`;
  // Indexable pre-filter: with two or more indexable groups, a row that fails at most one either passes the
  // first (most selective) of them or passes all the others.
  const ix = indexable(groups);
  const pre = ix.length >= 2 ? sql`AND (${groupPredicate(ix[0])} OR (${sql.join(ix.slice(1).map(groupPredicate), sql` AND `)}))` : sql``;
  return sql`
      SELECT d.doc_id, d.facets, d.price, d.created, d.part_id, d.is_listing, d.title, d.tsv,
        ${nfail} AS nfail, ${fail} AS fail
      FROM search_docs d
      WHERE ${matchPredicate(m)} ${sampleCond(mode, m, groups)} ${pre}`;
}

/** The scan set: rows that match and fail at most one filter group (the rest count for that group's facet). */
function scanSet(m: Match, groups: FilterGroup[], mode: SampleMode, withScore: boolean): SQL {
  const score = withScore ? sql`CASE WHEN d.fail = 0 THEN ${scoreExpr(m)} END` : sql`NULL::float8`;
  return sql`
    SELECT d.doc_id, d.facets, d.price, d.created, d.fail, ${score} AS score
    FROM (${visitSet(m, groups, mode)}) d
    WHERE d.nfail <= 1`;
}

interface Probe {
  /** Rows of the 1-in-128 sample the scan would visit (at most PROBE_CAP). */
  visited: number;
  /** Of those, rows passing every filter. */
  passing: number;
}

async function probe(m: Match, groups: FilterGroup[]): Promise<Probe> {
  const rows = await run<{ visited: number; passing: number }>(sql`
    SELECT count(*)::int AS visited, count(*) FILTER (WHERE nfail = 0)::int AS passing
    FROM (${visitSet(m, groups, 's128')} LIMIT ${PROBE_CAP}) x`);
  return rows[0];
}

async function scan(m: Match, groups: FilterGroup[], selectedCodes: number[], mode: SampleMode, sort: Sort, cursor: CursorState | null, limit: number, hitsFromScan: boolean): Promise<ScanResult> {
  const s = sortParts(sort);
  const hits = hitsFromScan
    ? sql`(SELECT coalesce(json_agg(json_build_array(h.doc_id, h.k, ${displayJson(sql`h.doc_id`)}) ORDER BY h.ord), '[]'::json) FROM (
          SELECT doc_id, ${s.key} AS k, row_number() OVER (ORDER BY ${s.order}) AS ord
          FROM s WHERE fail = 0 ${cursor ? sql`AND ${s.after(cursor)}` : sql``}
          ORDER BY ${s.order} LIMIT ${limit + 1}) h)`
    : sql`NULL::json`;
  const rows = await run<{ total: number; scanned: number; counts: Array<[number, number]>; hits: PageRow[] | null }>(sql`
    WITH s AS MATERIALIZED (${scanSet(m, groups, mode, hitsFromScan && sort === 'relevance')})
    SELECT
      (SELECT count(*) FROM s WHERE fail = 0)::int AS total,
      (SELECT count(*) FROM s)::int AS scanned,
      (SELECT coalesce(json_agg(json_build_array(c, n)), '[]'::json) FROM (
        SELECT c, n, row_number() OVER (PARTITION BY c >> 24 ORDER BY n DESC, c) AS rank FROM (
          SELECT c, count(*)::int AS n FROM (SELECT unnest(facets) AS c, fail FROM s) u
          WHERE u.fail = 0 OR (u.c >> 24) = u.fail GROUP BY c) g
        ) cc WHERE rank <= ${FACET_ROWS} OR c = ANY(${sql.param(selectedCodes)}::int[])) AS counts,
      ${hits} AS hits`,
    // A number's rows are found by part id and key (one plan suits them all); a word's plan depends on how
    // common the word is, so text scans are planned each time.
    m.kind === 'number' ? { prepare: 'number_scan' } : {},
  );
  return rows[0];
}

/** Exact page for price and newest sorts when counting ran on a sample: an index walk in sort order. */
async function pageInOrder(m: Match, groups: FilterGroup[], sort: Exclude<Sort, 'relevance'>, cursor: CursorState | null, limit: number): Promise<PageRow[]> {
  const s = sortParts(sort);
  const all = groups.map((g) => sql`AND ${groupPredicate(g)}`);
  const rows = await run<{ doc_id: number; k: number; disp: DisplayRow }>(sql`
    SELECT p.doc_id, p.k, ${displayJson(sql`p.doc_id`)} AS disp FROM (
      SELECT doc_id, ${s.key} AS k, row_number() OVER (ORDER BY ${s.order}) AS ord FROM search_docs d
      WHERE ${matchPredicate(m)} ${sort === 'newest' ? sql`` : sql`AND d.is_listing`} ${sql.join(all, sql` `)}
        ${cursor ? sql`AND ${s.after(cursor)}` : sql``}
      ORDER BY ${s.order} LIMIT ${limit + 1}) p
    ORDER BY p.ord`);
  return rows.map((r) => [r.doc_id, r.k, r.disp]);
}

/**
 * The page when counting ran on a sample: the rows passing every filter, taken from the full index but at
 * most CANDIDATES of them. When they are that few, total and page are exact; otherwise relevance ranks within
 * them (price and newest sorts then walk their index instead).
 */
async function candidates(m: Match, groups: FilterGroup[], sort: Sort, cursor: CursorState | null, limit: number): Promise<{ n: number; hits: PageRow[] }> {
  const s = sortParts(sort);
  const all = groups.map((g) => sql`AND ${groupPredicate(g)}`);
  const rows = await run<{ n: number; hits: PageRow[] }>(sql`
    WITH m AS MATERIALIZED (
      SELECT d.doc_id, d.price, d.created, ${sort === 'relevance' ? scoreExpr(m) : sql`NULL::float8`} AS score
      FROM search_docs d WHERE ${matchPredicate(m)} ${sql.join(all, sql` `)}
    ),
    -- Materialised without a limit so the planner reads the indexes (a limit invites a sequential scan that
    -- may wade through rows of the wrong kind); only the first rows are then pulled from it.
    c AS MATERIALIZED (SELECT * FROM m LIMIT ${CANDIDATES + 1})
    SELECT (SELECT count(*) FROM c)::int AS n,
      (SELECT coalesce(json_agg(json_build_array(h.doc_id, h.k, ${displayJson(sql`h.doc_id`)}) ORDER BY h.ord), '[]'::json) FROM (
        SELECT doc_id, ${s.key} AS k, row_number() OVER (ORDER BY ${s.order}) AS ord
        FROM c ${cursor ? sql`WHERE ${s.after(cursor)}` : sql``} ORDER BY ${s.order} LIMIT ${limit + 1}) h) AS hits`);
  return rows[0];
}

// ---------------------------------------------------------------------------------------------------------
// Text queries
// ---------------------------------------------------------------------------------------------------------

/** Words not in the vocabulary, each with its closest vocabulary word by trigram similarity. */
async function corrections(words: string[]): Promise<Map<string, string>> {
  if (!words.length) return new Map();
  const rows = await run<{ w: string; fix: string | null }>(sql`
    SELECT t.w, (SELECT v.word FROM search_words v WHERE v.word % t.w ORDER BY similarity(v.word, t.w) DESC, v.word LIMIT 1) AS fix
    FROM unnest(${sql.param(words)}::text[]) AS t(w)
    WHERE NOT EXISTS (SELECT 1 FROM search_words v WHERE v.word = t.w)`, { prepare: 'word_corrections' });
  return new Map(rows.filter((r) => r.fix && r.fix !== r.w).map((r) => [r.w, r.fix!]));
}

function chunkQuery(c: QueryChunk, fixes: Map<string, string>): SQL {
  const word = (w: string) => {
    const fix = fixes.get(w);
    const own = sql`plainto_tsquery('drabyard_english', ${w})`;
    return fix ? sql`(${own} || plainto_tsquery('drabyard_english', ${fix}))` : own;
  };
  const words = sql.join(c.words.map(word), sql` && `);
  if (!c.key) return sql`(${words})`;
  // A chunk with a digit may be a part number: its words, or its key, or its folded key.
  const keys = [...new Set([c.key, c.folded!])].map((k) => sql`plainto_tsquery('simple', ${k})`);
  return sql`((${words}) || ${sql.join(keys, sql` || `)})`;
}

function textTsquery(chunks: QueryChunk[], fixes: Map<string, string>, mode: 'all' | 'any'): SQL {
  return sql.join(chunks.map((c) => chunkQuery(c, fixes)), mode === 'all' ? sql` && ` : sql` || `);
}

// ---------------------------------------------------------------------------------------------------------
// Hits and facets for the reply
// ---------------------------------------------------------------------------------------------------------

interface DisplayRow {
  doc_id: number;
  ref_id: string;
  is_listing: boolean;
  part_id: string | null;
  title: string;
  number: string | null;
  price: number | null;
  created: Date | string;
  facets: number[];
  condition: Condition | null;
  quantity: number | null;
  seller_id: string | null;
  seller_name: string | null;
  thumb_key: string | null;
}

/**
 * The display fields of one search row as JSON, for the statement that picks the page (so the page needs no
 * second round trip). `docId` is a column of the enclosing query.
 */
function displayJson(docId: SQL): SQL {
  return sql`(SELECT row_to_json(x) FROM (
    SELECT dd.doc_id, dd.ref_id, dd.is_listing, dd.part_id, dd.title, dd.number, dd.price, dd.created, dd.facets,
      dl.condition, dl.quantity, dl.seller_id, coalesce(dsp.shop_name, du.display_name) AS seller_name,
      (SELECT ph.thumb_key FROM listing_photos ph WHERE ph.listing_id = dl.id ORDER BY ph.position LIMIT 1) AS thumb_key
    FROM search_docs dd
    LEFT JOIN listings dl ON dd.is_listing AND dl.id = dd.ref_id
    LEFT JOIN seller_profiles dsp ON dsp.user_id = dl.seller_id
    LEFT JOIN users du ON du.id = dl.seller_id
    WHERE dd.doc_id = ${docId}) x)`;
}

interface LabelRow {
  code: number;
  value: string;
  label: string;
}

/** Labels change only when an admin renames a vehicle, system or assembly (which clears this) or a shop is renamed. */
const labelCache = readCache<LabelRow>({ max: 100_000, ttlMs: 10 * 60_000 });

/** Values and labels of facet codes that are rows elsewhere (vehicles, systems, assemblies, sellers, countries). */
async function labels(codes: number[]): Promise<Map<number, LabelRow>> {
  const wanted = [...new Set(codes.filter((c) => [2, 3, 4, 7, 9].includes(groupOf(c))))];
  if (!wanted.length) return new Map();
  const found = await labelCache.getMany(wanted.map(String), async (missing) => {
    const rows = await run<LabelRow & Record<string, unknown>>(sql`
      SELECT r.code,
        CASE r.facet WHEN 2 THEN v.slug WHEN 3 THEN s.slug WHEN 4 THEN a.slug ELSE r.ref END AS value,
        CASE r.facet WHEN 2 THEN v.name WHEN 3 THEN s.name WHEN 4 THEN a.name || ' (' || av.model || ')'
          WHEN 7 THEN coalesce(sp.shop_name, u.display_name) ELSE r.ref END AS label
      FROM search_facet_refs r
      LEFT JOIN vehicle_models v ON v.id = CASE WHEN r.facet = 2 THEN r.ref::uuid END
      LEFT JOIN systems s ON s.id = CASE WHEN r.facet = 3 THEN r.ref::uuid END
      LEFT JOIN assemblies a ON a.id = CASE WHEN r.facet = 4 THEN r.ref::uuid END
      LEFT JOIN vehicle_models av ON av.id = a.vehicle_id
      LEFT JOIN users u ON u.id = CASE WHEN r.facet = 7 THEN r.ref::uuid END
      LEFT JOIN seller_profiles sp ON sp.user_id = u.id
      WHERE r.code = ANY(${sql.param(missing.map(Number))}::int[])`, { prepare: 'facet_labels' });
    return new Map(
      rows
        .filter((r) => r.value !== null)
        .map((r) => [String(r.code), { ...r, label: groupOf(r.code) === 9 ? (fixedLabel('shipsTo', r.value) ?? r.value) : r.label }]),
    );
  });
  return new Map([...found].map(([k, v]) => [Number(k), v]));
}

/** Rounds an estimate to two significant figures, so it does not look more exact than it is. */
function roughly(n: number): number {
  if (n < 100) return Math.round(n);
  const p = 10 ** (Math.floor(Math.log10(n)) - 1);
  return Math.round(n / p) * p;
}

function buildFacets(counts: Array<[number, number]>, rate: number, lab: Map<number, LabelRow>, selected: Selected[]): Record<FacetName, FacetValue[]> {
  const out = Object.fromEntries(facetNames.map((f) => [f, [] as FacetValue[]])) as Record<FacetName, FacetValue[]>;
  const byCode = new Map(counts);
  for (const [code, n] of counts) {
    const facet = facetOfGroup.get(groupOf(code));
    if (!facet) continue;
    const count = rate === 1 ? n : roughly(n * rate);
    const fixed = FIXED_VALUES[facet];
    if (fixed) {
      const value = fixed[code & 0xffffff];
      if (value !== undefined) out[facet].push({ value, label: fixedLabel(facet, value) ?? value, count });
    } else {
      const l = lab.get(code);
      if (l) out[facet].push({ value: l.value, label: l.label, count });
    }
  }
  for (const s of selected) {
    if (!byCode.has(s.code) && !out[s.facet].some((v) => v.value === s.value)) out[s.facet].push({ value: s.value, label: s.label, count: 0 });
  }
  for (const facet of facetNames) {
    const fixed = FIXED_VALUES[facet];
    const list = out[facet];
    if (fixed) list.sort((a, b) => fixed.indexOf(a.value) - fixed.indexOf(b.value));
    else list.sort((a, b) => b.count - a.count || a.label.localeCompare(b.label));
    const top = FACET_TOP[facet];
    if (top && list.length > top) {
      const keep = new Set(selected.filter((s) => s.facet === facet).map((s) => s.value));
      out[facet] = list.filter((v, i) => i < top || keep.has(v.value));
    }
  }
  return out;
}

function toHit(r: DisplayRow, score: number, vehicleLabels: Map<number, LabelRow>, numberInfo: Map<string, NumberHitPart> | null): SearchHit {
  const info = r.part_id ? numberInfo?.get(r.part_id) : undefined;
  const created = r.created instanceof Date ? r.created : new Date(r.created);
  return {
    type: r.is_listing ? 'listing' : 'part',
    id: r.ref_id,
    partId: r.part_id,
    title: r.title,
    primaryNumber: r.number,
    matchedNumber: info?.matchedNumber ?? null,
    fitNote: info?.fitNote ?? null,
    condition: r.condition,
    conditionLabel: r.condition ? conditions[r.condition].label : null,
    priceCents: r.price,
    sellerId: r.seller_id,
    sellerName: r.seller_name,
    thumbnailUrl: r.thumb_key ? `/media/${r.thumb_key}` : null,
    inStock: r.facets.includes(fixedCode('inStock', 'true')),
    quantity: r.quantity,
    vehicleNames: r.facets
      .filter((c) => groupOf(c) === FACET_GROUP.vehicle)
      .map((c) => vehicleLabels.get(c)?.label)
      .filter((x): x is string => !!x)
      .sort(),
    createdAt: created.toISOString(),
    score: Math.round(score * 1e6) / 1e6,
  };
}

// ---------------------------------------------------------------------------------------------------------
// search()
// ---------------------------------------------------------------------------------------------------------

const cursorSecret = () => env().SESSION_SECRET;

export async function search(q: SearchQuery): Promise<SearchReply> {
  const text = q.q ?? '';
  const chunks = parseTextQuery(text);
  const sort: Sort = q.sort ?? (chunks.length ? 'relevance' : 'newest');
  const fingerprint = searchFingerprint([text, sort, q.type, q.vehicle, q.system, q.assembly, q.condition, q.originality, q.seller, q.price, q.priceMin, q.priceMax, q.shipsTo, q.pickup, q.hasPhotos, q.inStock]);
  const cursor = q.cursor ? decodeCursor(q.cursor, cursorSecret(), fingerprint) : null;
  const { groups, selected } = await resolveFilters(q);

  let match: Match = { kind: 'browse' };
  let matchMode: SearchReply['matchMode'] = 'browse';
  let numberInfo: Map<string, NumberHitPart> | null = null;
  let fixes = new Map<string, string>();
  let numberFolded: string | null = null;
  let closeEarly: ReturnType<typeof closeNumbers> | null = null;

  if (chunks.length && isNumberQuery(text)) {
    // An unknown number usually ends in the empty state: its close numbers (a trigram search) start as soon as
    // the number lookups come back empty, beside the scan.
    const r = await resolveNumberHits(text, (folded) => {
      if (cursor) return;
      closeEarly = closeNumbers(folded);
      // Handled here too, so a failure while the rest is still running is never an unhandled rejection.
      closeEarly.catch(() => undefined);
    });
    if (r) {
      numberFolded = r.folded;
      numberInfo = new Map(r.parts.map((p) => [p.partId, p]));
      match = { kind: 'number', partIds: r.parts.map((p) => p.partId), scores: r.parts.map((p) => p.score), keys: [...new Set([r.key, r.folded])] };
      matchMode = 'number';
    }
  }
  if (match.kind === 'browse' && chunks.length) {
    fixes = await corrections(correctableWords(chunks));
    match = { kind: 'text', tsquery: textTsquery(chunks, fixes, 'all'), text };
    matchMode = 'all';
  }

  const limit = q.limit;
  const runAll = async (m: Match): Promise<{ res: ScanResult; mode: SampleMode; page: PageRow[]; exactTotal: number | null }> => {
    let mode: SampleMode = 'exact';
    let many = false;
    if (cursor) mode = cursor.mode;
    else if (m.kind !== 'number') {
      const { visited: n, passing } = await probe(m, groups);
      mode = n * 128 <= EXACT_MAX ? 'exact' : n * 8 <= S16_MAX_ROWS && n < PROBE_CAP ? 's16' : 's128';
      // Clearly more rows pass than the candidate set holds: no exact total to be had from it.
      many = passing * 128 >= 4 * CANDIDATES;
    }
    const codes = selected.map((x) => x.code);
    if (mode === 'exact') {
      const res = await scan(m, groups, codes, mode, sort, cursor, limit, true);
      return { res, mode, page: res.hits ?? [], exactTotal: res.total };
    }
    if (many && sort !== 'relevance') {
      const [res, page] = await Promise.all([scan(m, groups, codes, mode, sort, cursor, limit, false), pageInOrder(m, groups, sort, cursor, limit)]);
      return { res, mode, page, exactTotal: null };
    }
    const [res, cand] = await Promise.all([scan(m, groups, codes, mode, sort, cursor, limit, false), candidates(m, groups, sort, cursor, limit)]);
    if (cand.n <= CANDIDATES) return { res, mode, page: cand.hits, exactTotal: cand.n };
    const page = sort === 'relevance' ? cand.hits : await pageInOrder(m, groups, sort, cursor, limit);
    return { res, mode, page, exactTotal: null };
  };

  let { res, mode, page, exactTotal } = await runAll(match);
  if (match.kind === 'text' && (exactTotal ?? res.total) === 0 && !cursor && chunks.length > 1) {
    // Nothing has every word: fall back to any word, ranked by how many and how well they match.
    match = { kind: 'text', tsquery: textTsquery(chunks, fixes, 'any'), text };
    matchMode = 'any';
    ({ res, mode, page, exactTotal } = await runAll(match));
  }

  const more = page.length > limit;
  const pageRows = page.slice(0, limit);
  const rate = RATE[mode];
  // The page's own codes (for its vehicle names) came with its display rows; most are labelled already.
  const lab = await labels([...res.counts.map(([c]) => c), ...pageRows.flatMap(([, , r]) => r?.facets ?? [])]);
  const hits = pageRows.flatMap(([, score, r]) => (r ? [toHit(r, sort === 'relevance' ? score : 0, lab, numberInfo)] : []));
  const last = pageRows[pageRows.length - 1];
  const nextCursor = more && last ? encodeCursor({ value: last[1], docId: last[0], mode, search: fingerprint }, cursorSecret()) : null;

  const total = exactTotal ?? roughly(res.total * rate);
  let didYouMean: SearchReply['didYouMean'] = [];
  if (total === 0 && !cursor) {
    const key = numberFolded ?? chunks.find((c) => c.folded)?.folded ?? null;
    if (key) didYouMean = await (closeEarly ?? closeNumbers(key));
  }
  return {
    total,
    totalIsEstimate: exactTotal === null,
    facetsAreEstimates: rate !== 1,
    matchMode,
    corrections: [...fixes].map(([from, to]) => ({ from, to })),
    hits,
    facets: buildFacets(res.counts, rate, lab, selected),
    nextCursor,
    didYouMean,
  };
}

// ---------------------------------------------------------------------------------------------------------
// Shared answers for identical searches
// ---------------------------------------------------------------------------------------------------------

/**
 * A function through a short-lived cache: identical calls within SEARCH_CACHE_SECONDS share one answer, so a
 * burst of popular searches costs one run. Answers do not depend on who asks. Prices and stock in a shared
 * answer may lag that many seconds; the listing and checkout are exact.
 */
function sharedAnswers<A, T extends object>(fn: (a: A) => Promise<T>, keyOf: (a: A) => string): (a: A) => Promise<T> {
  let cache: ReturnType<typeof readCache<T>> | null | undefined;
  return (a) => {
    if (cache === undefined) {
      const s = env().SEARCH_CACHE_SECONDS;
      cache = s > 0 ? readCache<T>({ max: 2000, ttlMs: s * 1000 }) : null;
    }
    return cache ? cache.get(keyOf(a), () => fn(a)) : fn(a);
  };
}

export const searchShared = sharedAnswers(search, (q: SearchQuery) => JSON.stringify(q));
/** Suggestions the same way (people type the same beginnings). */
export const suggestShared = sharedAnswers(suggest, (text: string) => text);

// ---------------------------------------------------------------------------------------------------------
// suggest()
// ---------------------------------------------------------------------------------------------------------

const SUGGEST_MAX = 10;

/** As-you-type suggestions: parts whose number starts with the text, then parts whose name matches the words. */
export async function suggest(text: string): Promise<SuggestReply> {
  const out: SuggestReply['suggestions'] = [];
  if (/\p{N}/u.test(text)) {
    const p = parsePartNumber(text);
    if (p.ok && p.value.key.length >= 2) {
      const rows = await run<{ part_id: string; printed: string; name: string }>(sql`
        SELECT n.part_id, n.printed, p.name FROM part_numbers n JOIN parts p ON p.id = n.part_id
        WHERE n.key LIKE ${p.value.key + '%'} ORDER BY n.key, n.printed LIMIT ${SUGGEST_MAX}`);
      for (const r of rows) out.push({ type: 'number', partId: r.part_id, number: r.printed, name: r.name, matchedBy: 'number_prefix' });
    }
  }
  const words = text
    .normalize('NFKC')
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u)
    .filter(Boolean)
    .slice(0, 6)
    .map((w) => w.slice(0, 40));
  const lastWord = words[words.length - 1];
  if (out.length < SUGGEST_MAX && words.length && lastWord.length >= 2 && /\p{L}/u.test(words.join(''))) {
    // Whole words as typed, the last one as a prefix. Words are letters and digits only, so to_tsquery gets no operators.
    const complete = words.slice(0, -1).map((w) => sql`plainto_tsquery('drabyard_english', ${w})`);
    const prefix = sql`to_tsquery('drabyard_english', ${lastWord + ':*'})`;
    const tsq = sql.join([...complete, prefix], sql` && `);
    const seen = new Set(out.map((s) => s.partId));
    const pick = (sample: boolean) =>
      run<{ part_id: string; title: string; number: string | null }>(sql`
        SELECT part_id, title, number FROM (
          SELECT d.part_id, d.title, d.number FROM search_docs d
          WHERE d.tsv @@ (${tsq}) AND NOT d.is_listing ${sample ? sql`AND d.doc_id % 16 = 0` : sql``} LIMIT 200
        ) c ORDER BY similarity(title, ${text}) DESC, title LIMIT ${SUGGEST_MAX * 2}`);
    // The sample answers broad prefixes cheaply; rare words need the whole index.
    let rows = await pick(true);
    if (rows.length < SUGGEST_MAX) rows = await pick(false);
    for (const r of rows) {
      if (out.length >= SUGGEST_MAX) break;
      if (seen.has(r.part_id)) continue;
      seen.add(r.part_id);
      out.push({ type: 'part', partId: r.part_id, number: r.number, name: r.title, matchedBy: 'name' });
    }
  }
  return { suggestions: out.slice(0, SUGGEST_MAX) };
}
