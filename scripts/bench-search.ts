// `npm run bench:search`: builds a synthetic catalog and marketplace in its own database (drabyard_bench on a
// private cluster), then fires a fixed mix of 1,000 searches over HTTP and the same searches through the
// service directly, and prints latency percentiles, the HTTP/SQL ratio, PASS/FAIL per target and EXPLAIN
// (ANALYZE, BUFFERS) of the slowest queries. All data is invented (fictional makers, models, numbers, sellers).
//
//   --reuse     keep the data set from an earlier run when it is there (skips generation)
//   --queries N run N queries instead of 1,000 (for a quick look)
//   --profile   also print where each category's time goes, statement by statement
import { Agent, request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { ensureCluster, ensureDatabase } from './postgres';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const args = process.argv.slice(2);
const reuse = args.includes('--reuse');
const queryCountArg = args.indexOf('--queries');
const QUERY_COUNT = queryCountArg >= 0 ? Number(args[queryCountArg + 1]) : 1000;

const SIZE = { vehicles: 24, parts: 100_000, sellers: 2_000, listings: 550_000 };
const say = (m: string) => console.log(`[bench] ${m}`);

// ---------------------------------------------------------------------------------------------------------
// Data set
// ---------------------------------------------------------------------------------------------------------

/** Word pools, most frequent first (picks are skewed towards the front, as real catalogs are). */
const NOUNS = ['clamp', 'bolt', 'washer', 'hose', 'bracket', 'line', 'cylinder', 'shoe', 'spring', 'gasket', 'seal', 'bearing', 'shaft', 'gear', 'lever', 'pin', 'nut', 'screw', 'cap', 'cover', 'plate', 'housing', 'valve', 'pump', 'filter', 'switch', 'lamp', 'relay', 'cable', 'strap', 'boot', 'bushing', 'flange', 'yoke', 'spacer', 'retainer', 'sleeve', 'plug', 'coupling', 'pulley', 'belt', 'mount', 'rod', 'link', 'drum', 'tube', 'elbow', 'shim', 'grommet', 'knob'];
const MODIFIERS = ['brake', 'rear', 'front', 'axle', 'steering', 'fuel', 'oil', 'water', 'wheel', 'hub', 'master', 'clutch', 'pedal', 'hand', 'transfer', 'radiator', 'exhaust', 'ignition', 'starter', 'generator', 'tail', 'head', 'door', 'hood', 'fender', 'frame', 'shock', 'tie', 'drag', 'pinion', 'differential', 'bell', 'crank', 'cam', 'timing', 'distributor', 'carburetor', 'air', 'vacuum', 'hydraulic', 'emergency', 'parking', 'blackout', 'marker', 'tank', 'filler', 'drain', 'seat', 'windshield', 'wiper', 'horn', 'battery', 'cargo', 'tailgate', 'winch', 'pintle', 'lifting', 'towing', 'spare', 'muffler'];
const QUALIFIERS = ['left', 'right', 'upper', 'lower', 'inner', 'outer', 'short', 'long', 'early', 'late', 'heavy', 'light', 'small', 'large', 'adjustable', 'threaded', 'split', 'double', 'single', 'flared'];
const MAKERS = ['Kestrelvale', 'Stoverton', 'Brackwell', 'Ossington', 'Tarnley', 'Quenby'];
const PREFIXES = ['KV', 'ST', 'BW', 'OS', 'TN', 'QB', 'KO', 'IR', 'DX', 'HW'];
const SYSTEM_SLUGS = ['engine', 'clutch', 'transmission', 'transfer-case', 'axles', 'brakes', 'steering', 'electrical', 'fuel', 'cooling', 'exhaust', 'frame', 'body', 'wheels-tires', 'accessories'];
const COUNTRIES = ['US', 'CA', 'GB', 'DE', 'FR', 'NL', 'BE', 'AU', 'NO', 'SE'];

const arr = (xs: readonly string[]) => `ARRAY[${xs.map((x) => `'${x}'`).join(',')}]`;

/** Set-based generation: every table is one INSERT ... SELECT over generate_series. */
function generationSql(): string[] {
  const N = SIZE.parts;
  // r(i, salt): a deterministic pseudo-random number in [0, 1) from a hash, so runs are repeatable.
  const r = (i: string, salt: number) => `bench_r(${i}, ${salt})`;
  const pick = (pool: string, i: string, salt: number, skew = 1.3) => `(${pool})[1 + floor(cardinality(${pool}) * power(${r(i, salt)}, ${skew}))::int]`;
  return [
    `CREATE OR REPLACE FUNCTION bench_r(i bigint, salt int) RETURNS float8 LANGUAGE sql IMMUTABLE PARALLEL SAFE AS
       $$ SELECT (hashint8(i * 1000003 + salt) & 2147483647)::float8 / 2147483648.0 $$`,
    `INSERT INTO systems (slug, name, sort_order) SELECT s, initcap(replace(s, '-', ' ')), n FROM unnest(${arr(SYSTEM_SLUGS)}) WITH ORDINALITY AS t(s, n)`,
    `INSERT INTO vehicle_models (slug, maker, model, name, year_from, year_to, serial_from, serial_to, description)
     SELECT 'bench-' || i, m, 'BX-' || i, m || ' BX-' || i || ' utility truck', 1942 + i % 20, 1946 + i % 20, 1, 50000, 'Fictional benchmark vehicle'
     FROM generate_series(1, ${SIZE.vehicles}) i, LATERAL (SELECT (${arr(MAKERS)})[1 + i % ${MAKERS.length}] AS m) x`,
    // Five top-level assemblies per vehicle and system, each with one sub-assembly.
    `INSERT INTO assemblies (slug, vehicle_id, system_id, code, name, sort_order)
     SELECT 'bench-' || v.slug || '-' || s.slug || '-' || k, v.id, s.id, upper(left(s.slug, 2)) || '-' || k, initcap(replace(s.slug, '-', ' ')) || ' group ' || k, k
     FROM vehicle_models v, systems s, generate_series(1, 5) k`,
    `INSERT INTO assemblies (slug, vehicle_id, system_id, parent_id, code, name, sort_order)
     SELECT a.slug || '-sub', a.vehicle_id, a.system_id, a.id, a.code || '.1', a.name || ' details', 1 FROM assemblies a WHERE a.parent_id IS NULL`,
    `INSERT INTO parts (seed_key, name, description, category, weight_grams, created_at)
     SELECT 'bench-' || i,
       initcap(${pick(arr(NOUNS), 'i', 1)}) || ', ' || ${pick(arr(MODIFIERS), 'i', 2)} || ' ' || ${pick(arr(MODIFIERS), 'i', 3, 1.15)}
         || CASE WHEN ${r('i', 4)} < 0.4 THEN ' ' || ${pick(arr(QUALIFIERS), 'i', 5, 1)} ELSE '' END,
       'Original pattern part for the ' || ${pick(arr(MODIFIERS), 'i', 6, 1)} || ' ' || ${pick(arr(NOUNS), 'i', 7, 1)} || ' group; '
         || ${pick(arr(QUALIFIERS), 'i', 8, 1)} || ' ' || ${pick(arr(MODIFIERS), 'i', 9, 1)} || ' side, ' || ${pick(arr(QUALIFIERS), 'i', 10, 1)} || ' pattern.',
       ${pick(arr(NOUNS), 'i', 1)}, (50 + ${r('i', 11)} * 5000)::int, now() - (${r('i', 12)} * 900) * interval '1 day'
     FROM generate_series(1, ${N}) i`,
    `CREATE TEMP TABLE bench_parts AS SELECT id, substr(seed_key, 7)::int AS i FROM parts WHERE seed_key LIKE 'bench-%'`,
    `CREATE INDEX ON bench_parts (i)`,
    // Three numbers per part; keys are filled in afterwards by the application's own functions.
    // Maker numbers: prefixes with O and I (KO, IR) and leading zeros exercise the O/0, I/1 and zero folds.
    `CREATE TEMP TABLE bench_numbers AS
     SELECT p.id AS part_id, n.printed, n.kind FROM bench_parts p, LATERAL (VALUES
       ((${arr(PREFIXES)})[1 + p.i % ${PREFIXES.length}] || '-' || lpad(((p.i::bigint * 7919) % 1000000)::text, 6, '0') || '-' || chr(65 + p.i % 7), 'maker'),
       (lpad(((p.i::bigint * 104729) % 10000000)::text, 7, '0'), 'ordnance'),
       ((${arr(['5305', '5310', '5315', '2530', '2520', '2910', '2920', '2930'])})[1 + p.i % 8] || '-00-' || lpad(((p.i::bigint * 15485863) % 1000000000)::text, 9, '0'), 'nsn')
     ) AS n(printed, kind)`,
    'KEYS',
    // Supersession chains: 3,000 two-step chains (two-way, one-way, conditional mixed) and 500 two-part kits.
    `INSERT INTO supersessions (from_part_id, to_part_id, interchange, note)
     SELECT a.id, b.id, x.kind, CASE WHEN x.kind = 'conditional' THEN 'with the late mounting bracket' END
     FROM generate_series(0, 2999) k
     CROSS JOIN generate_series(0, 1) step
     CROSS JOIN LATERAL (SELECT (ARRAY['two_way','two_way','one_way','conditional'])[1 + (k + step) % 4] AS kind) x
     JOIN bench_parts a ON a.i = 90000 + step * 3000 + k
     JOIN bench_parts b ON b.i = 93000 + step * 3000 + k`,
    `INSERT INTO supersessions (from_part_id, to_part_id, interchange, quantity)
     SELECT a.id, b.id, 'one_way', 1 FROM generate_series(0, 499) k
     CROSS JOIN (VALUES (0), (1)) m(j)
     JOIN bench_parts a ON a.i = 99000 + k JOIN bench_parts b ON b.i = 80000 + 2 * k + m.j`,
    // Each part on one to three bill-of-materials lines.
    `CREATE TEMP TABLE bench_asm AS SELECT id, row_number() OVER (ORDER BY slug) AS n FROM assemblies WHERE slug LIKE 'bench-%'`,
    `INSERT INTO bom_lines (assembly_id, part_id, callout, quantity)
     SELECT a.id, p.id, (1 + k)::text, 1 + (p.i % 4)
     FROM bench_parts p CROSS JOIN generate_series(0, 2) k
     JOIN bench_asm a ON a.n = 1 + (hashint8(p.i * 7 + k) & 2147483647) % (SELECT count(*) FROM bench_asm)
     WHERE k = 0 OR ${r('p.i', 20)} < 0.5 - k * 0.2`,
    `INSERT INTO users (email, password_hash, display_name, roles)
     SELECT 'bench-seller-' || i || '@example.test', 'not-a-real-hash', 'Bench seller ' || i, ARRAY['buyer','seller'] FROM generate_series(1, ${SIZE.sellers}) i`,
    `INSERT INTO seller_profiles (user_id, shop_name, location, ships_to, pickup_at_shows)
     SELECT u.id, 'Yard ' || substr(u.email, 14, strpos(u.email, '@') - 14), 'Somewhere',
       ARRAY(SELECT c FROM unnest(${arr(COUNTRIES)}) WITH ORDINALITY AS t(c, n) WHERE n = 1 OR bench_r(hashtext(u.email) + n, 30) < 0.5 / n),
       bench_r(hashtext(u.email), 31) < 0.3
     FROM users u WHERE u.email LIKE 'bench-seller-%'`,
    `CREATE TEMP TABLE bench_sellers AS SELECT user_id AS id, row_number() OVER (ORDER BY user_id) AS n FROM seller_profiles`,
    // Listings: most are live; popular parts (low i) get more listings; a few describe unlinked parts in words.
    `INSERT INTO listings (seller_id, part_id, title, condition, used_grade, quantity, price_cents, description_md, state, created_at, approved_at)
     SELECT s.id, CASE WHEN bench_r(j, 40) < 0.03 THEN NULL ELSE p.id END,
       pp.name || ' - ' || (ARRAY['NOS','NORS','good used original','rebuilt','reproduction','rebuildable core'])[c.k],
       (ARRAY['nos','nors','used_original','rebuilt','reproduction','core'])[c.k],
       CASE WHEN c.k = 3 THEN 'honest' END,
       CASE WHEN bench_r(j, 41) < 0.1 THEN 0 ELSE 1 + floor(bench_r(j, 42) * 12)::int END,
       greatest(100, (exp(5 + bench_r(j, 43) * 7.5))::int),
       'Pulled from a running truck, ' || (ARRAY['${QUALIFIERS.slice(0, 8).join("','")}'])[1 + floor(bench_r(j, 44) * 8)::int] || ' side. Ships in a box.',
       CASE WHEN bench_r(j, 45) < 0.91 THEN 'approved' ELSE (ARRAY['draft','submitted','sold_out','withdrawn'])[1 + floor(bench_r(j, 46) * 4)::int] END,
       t.at, t.at + interval '3 hours'
     FROM generate_series(1, ${SIZE.listings}) j
     CROSS JOIN LATERAL (SELECT 1 + floor(${N} * power(bench_r(j, 47), 1.6))::int AS pi,
                                1 + floor(${SIZE.sellers} * power(bench_r(j, 48), 1.4))::int AS si,
                                now() - bench_r(j, 49) * interval '700 days' AS at) x
     CROSS JOIN LATERAL (SELECT CASE WHEN v < 0.15 THEN 1 WHEN v < 0.25 THEN 2 WHEN v < 0.65 THEN 3 WHEN v < 0.75 THEN 4 WHEN v < 0.95 THEN 5 ELSE 6 END AS k
                         FROM (SELECT bench_r(j, 50) AS v) q) c
     CROSS JOIN LATERAL (SELECT x.at) t
     JOIN bench_parts p ON p.i = x.pi
     JOIN parts pp ON pp.id = p.id
     JOIN bench_sellers s ON s.n = x.si`,
    `INSERT INTO listing_photos (listing_id, position, thumb_key, medium_key, large_key, width, height, placeholder_color, dhash)
     SELECT l.id, k, 'bench/' || l.id || '-' || k || '-t.webp', 'bench/' || l.id || '-' || k || '-m.webp', 'bench/' || l.id || '-' || k || '-l.webp', 1200, 900, '#7a6f5a', md5(l.id::text || k)
     FROM listings l, generate_series(0, 1) k
     WHERE bench_r(hashtext(l.id::text), 60) < CASE k WHEN 0 THEN 0.6 ELSE 0.2 END`,
  ];
}

async function generate(client: pg.Client) {
  const t0 = Date.now();
  // Bulk load with row triggers off (session_replication_role = replica), then one set-based rebuild of the
  // search rows: the same functions the triggers call, run once over everything.
  await client.query(`SET session_replication_role = replica`);
  for (const stmt of generationSql()) {
    if (stmt === 'KEYS') {
      await fillNumberKeys(client);
      continue;
    }
    const t = Date.now();
    const r = await client.query(stmt);
    const head = stmt.trim().split('\n')[0].slice(0, 70);
    say(`  ${String(Date.now() - t).padStart(6)} ms  ${r.rowCount ?? ''} ${head}`);
  }
  await client.query(`SET session_replication_role = origin`);
  let t = Date.now();
  await client.query('SELECT search_rebuild()');
  say(`  ${String(Date.now() - t).padStart(6)} ms  search_rebuild()`);
  t = Date.now();
  await client.query('VACUUM ANALYZE');
  say(`  ${String(Date.now() - t).padStart(6)} ms  VACUUM ANALYZE`);
  say(`data set generated in ${((Date.now() - t0) / 1000).toFixed(1)} s`);
}

/** Keys come from the application's functions (server/domain/part-number.ts), never from SQL. */
async function fillNumberKeys(client: pg.Client) {
  const { partNumberKeys } = await import('../server/domain/part-number');
  const t = Date.now();
  const rows = (await client.query<{ part_id: string; printed: string; kind: string }>(`SELECT part_id, printed, kind FROM bench_numbers`)).rows;
  for (let i = 0; i < rows.length; i += 50_000) {
    const batch = rows.slice(i, i + 50_000);
    const keys = batch.map((b) => partNumberKeys(b.printed));
    await client.query(
      `INSERT INTO part_numbers (part_id, printed, key, folded, kind)
       SELECT * FROM unnest($1::uuid[], $2::text[], $3::text[], $4::text[], $5::text[])`,
      [batch.map((b) => b.part_id), keys.map((k) => k.display), keys.map((k) => k.key), keys.map((k) => k.folded), batch.map((b) => b.kind)],
    );
  }
  say(`  ${String(Date.now() - t).padStart(6)} ms  ${rows.length} part-number keys from partNumberKeys()`);
}

async function counts(client: pg.Client) {
  const r = await client.query(`SELECT
    (SELECT count(*) FROM parts)::int AS parts, (SELECT count(*) FROM part_numbers)::int AS numbers,
    (SELECT count(*) FROM listings)::int AS listings, (SELECT count(*) FROM listings WHERE state = 'approved')::int AS live,
    (SELECT count(*) FROM search_docs)::int AS docs, (SELECT count(*) FROM supersessions)::int AS supersessions,
    (SELECT count(*) FROM bom_lines)::int AS bom_lines, (SELECT count(*) FROM listing_photos)::int AS photos,
    pg_size_pretty(pg_total_relation_size('search_docs')) AS docs_size, pg_size_pretty(pg_relation_size('search_docs')) AS docs_heap`);
  return r.rows[0] as Record<string, number | string>;
}

// ---------------------------------------------------------------------------------------------------------
// The query mix
// ---------------------------------------------------------------------------------------------------------

type Category = 'number' | 'text' | 'facets' | 'deep';
interface BenchQuery {
  category: Category;
  params: Record<string, string | string[]>;
}

/** Deterministic pseudo-random numbers for the mix (mulberry32). */
function rng(seed: number) {
  let s = seed >>> 0;
  const next = () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    int: (lo: number, hi: number) => lo + Math.floor(next() * (hi - lo + 1)),
    pick: <T>(xs: readonly T[], skew = 1) => xs[Math.floor(xs.length * Math.pow(next(), skew))],
  };
}

/** Odd shapes people type a number in (DOMAIN.md: hyphens, spaces, case, O for 0, I for 1, dropped zeros, typos). */
function oddShape(printed: string, r: ReturnType<typeof rng>): string {
  const v = r.next();
  if (v < 0.15) return printed;
  if (v < 0.3) return printed.toLowerCase().replace(/-/g, '');
  if (v < 0.45) return printed.replace(/-/g, ' ');
  if (v < 0.6) return printed.replace(/0/, 'O');
  if (v < 0.7) return printed.replace(/1/, 'I').toLowerCase();
  if (v < 0.78) return printed.replace(/^0+/, '');
  if (v < 0.9) {
    // One mistyped character.
    const i = r.int(3, printed.length - 1);
    const c = printed[i] === '7' ? '4' : '7';
    return printed.slice(0, i) + c + printed.slice(i + 1);
  }
  if (v < 0.96) return printed.slice(0, Math.max(4, printed.length - 3));
  // Garbled: nothing close enough, the empty state proposes close numbers.
  return printed.slice(0, 3) + 'ZZ' + printed.slice(6);
}

async function buildMix(client: pg.Client, count: number): Promise<BenchQuery[]> {
  const r = rng(20240611);
  const numbers = (await client.query<{ printed: string }>(`SELECT printed FROM part_numbers TABLESAMPLE SYSTEM (2) REPEATABLE (7) LIMIT 4000`)).rows.map((x) => x.printed);
  const chained = (await client.query<{ printed: string }>(`SELECT n.printed FROM supersessions s JOIN part_numbers n ON n.part_id IN (s.from_part_id, s.to_part_id) AND n.kind = 'maker' ORDER BY n.printed LIMIT 2000`)).rows.map((x) => x.printed);
  const vehicles = (await client.query<{ slug: string }>(`SELECT slug FROM vehicle_models ORDER BY slug`)).rows.map((x) => x.slug);
  const sellers = (await client.query<{ id: string }>(`SELECT user_id AS id FROM seller_profiles ORDER BY user_id LIMIT 200`)).rows.map((x) => x.id);
  const assemblies = (await client.query<{ slug: string }>(`SELECT slug FROM assemblies ORDER BY slug`)).rows.map((x) => x.slug);
  const conds = ['nos', 'nors', 'used_original', 'rebuilt', 'reproduction', 'core'];
  const words = () => {
    const n = r.int(1, 3);
    const ws = [r.pick(NOUNS, 1.3), r.pick(MODIFIERS, 1.3), r.pick(MODIFIERS, 1.2), r.pick(QUALIFIERS)].slice(0, n + (r.next() < 0.2 ? 1 : 0));
    if (r.next() < 0.12) {
      // A typo in one word.
      const i = r.int(0, ws.length - 1);
      const w = ws[i];
      const j = r.int(1, Math.max(1, w.length - 2));
      ws[i] = w.slice(0, j) + w.slice(j + 1);
    }
    return ws.join(' ');
  };
  const facetParams = (): Record<string, string | string[]> => {
    const p: Record<string, string | string[]> = {};
    const k = r.int(1, 3);
    const options = [
      () => (p.vehicle = r.pick(vehicles)),
      () => (p.system = r.pick(SYSTEM_SLUGS)),
      () => (p.condition = r.next() < 0.3 ? [r.pick(conds), r.pick(conds)] : r.pick(conds)),
      () => {
        p.priceMin = String(r.pick([0, 1000, 5000, 20000]));
        p.priceMax = String(Number(p.priceMin) + r.pick([5000, 20000, 100000]));
      },
      () => (p.shipsTo = r.pick(COUNTRIES.slice(0, 6))),
      () => (p.pickup = 'true'),
      () => (p.hasPhotos = 'true'),
      () => (p.inStock = 'true'),
      () => (p.seller = r.pick(sellers, 2)),
      () => (p.assembly = r.pick(assemblies)),
      () => (p.type = 'listing'),
    ];
    for (let i = 0; i < k; i++) r.pick(options)();
    if (r.next() < 0.5) p.q = words();
    if (r.next() < 0.3) p.sort = r.pick(['price_asc', 'price_desc', 'newest']);
    return p;
  };
  const mix: BenchQuery[] = [];
  const n = (share: number) => Math.round(count * share);
  for (let i = 0; i < n(0.3); i++) mix.push({ category: 'number', params: { q: oddShape(r.next() < 0.25 ? r.pick(chained) : r.pick(numbers), r) } });
  for (let i = 0; i < n(0.27); i++) mix.push({ category: 'text', params: { q: words(), ...(r.next() < 0.15 ? { sort: r.pick(['price_asc', 'newest']) } : {}) } });
  for (let i = 0; i < n(0.28); i++) mix.push({ category: 'facets', params: facetParams() });
  while (mix.length < count) {
    const base: Record<string, string | string[]> = r.next() < 0.5 ? { q: words() } : facetParams();
    mix.push({ category: 'deep', params: { ...base, page: String(r.int(3, 10)) } });
  }
  // Shuffle (Fisher-Yates) so categories interleave as real traffic does.
  for (let i = mix.length - 1; i > 0; i--) {
    const j = r.int(0, i);
    [mix[i], mix[j]] = [mix[j], mix[i]];
  }
  return mix;
}

// ---------------------------------------------------------------------------------------------------------
// Running and reporting
// ---------------------------------------------------------------------------------------------------------

const pct = (xs: number[], p: number) => {
  if (!xs.length) return NaN;
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)];
};
const fmt = (x: number) => (Number.isFinite(x) ? x.toFixed(1).padStart(7) : '      -');

function queryString(params: Record<string, string | string[]>): string {
  const u = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) for (const x of Array.isArray(v) ? v : [v]) u.append(k, x);
  return u.toString();
}

function httpGet(agent: Agent, port: number, pathAndQuery: string): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const req = httpRequest({ host: '127.0.0.1', port, path: pathAndQuery, agent, headers: { accept: 'application/json' } }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks).toString('utf8') }));
    });
    req.on('error', reject);
    req.end();
  });
}

interface Timed {
  q: BenchQuery;
  http: number;
  sql: number;
  slowest?: { sql: string; params: unknown[]; ms: number };
  statements?: Array<{ sql: string; ms: number }>;
}

/** Which step of search() a logged statement is, from its text (for --profile). */
const STATEMENT_KINDS: Array<[string, RegExp]> = [
  ['probe', /^\s*SELECT count\(\*\)::int AS visited/],
  ['scan', /WITH s AS MATERIALIZED/],
  ['candidates', /WITH m AS MATERIALIZED/],
  ['page in order', /^\s*SELECT doc_id, .* AS k FROM search_docs d/s],
  ['display', /LEFT JOIN listings l ON d\.is_listing/],
  ['hit codes', /SELECT DISTINCT unnest\(facets\)/],
  ['labels', /CASE r\.facet WHEN 2/],
  ['filters', /LEFT JOIN search_facet_refs r ON r\.facet = /],
  ['corrections', /FROM search_words v/],
  ['close numbers', /close_part_numbers/],
  ['number keys', /FROM part_numbers WHERE/],
  ['number graph', /reach\(part_id, depth\)/],
];
const kindOf = (text: string) => STATEMENT_KINDS.find(([, re]) => re.test(text))?.[0] ?? 'other';

function printProfile(timed: Timed[]) {
  for (const c of ['number', 'text', 'facets', 'deep'] as const) {
    const rows = timed.filter((t) => t.q.category === c);
    if (!rows.length) continue;
    const by = new Map<string, { n: number; ms: number }>();
    let logged = 0;
    for (const t of rows)
      for (const st of t.statements ?? []) {
        const k = kindOf(st.sql);
        const e = by.get(k) ?? { n: 0, ms: 0 };
        e.n++;
        e.ms += st.ms;
        by.set(k, e);
        logged += st.ms;
      }
    const total = rows.reduce((a, t) => a + t.sql, 0);
    console.log(`\n  profile ${c}: ${rows.length} searches, mean ${(total / rows.length).toFixed(1)} ms, of it in logged statements ${(logged / rows.length).toFixed(1)} ms`);
    for (const [k, e] of [...by].sort((a, b) => b[1].ms - a[1].ms))
      console.log(`    ${k.padEnd(14)} ${(e.n / rows.length).toFixed(2).padStart(5)} per search  ${(e.ms / rows.length).toFixed(2).padStart(6)} ms per search  ${(e.ms / e.n).toFixed(2).padStart(6)} ms each`);
    const byHttp = [...rows].sort((a, b) => b.http - a.http).slice(0, Math.ceil(rows.length * 0.06));
    console.log(`    slowest over HTTP: ${byHttp.map((t) => `${t.http.toFixed(1)}/${t.sql.toFixed(1)} ${String(t.q.params.q ?? '').slice(0, 18)}`).join(', ')}`);
    // The searches at the category's 95th percentile and above, statement by statement.
    for (const t of [...rows].sort((a, b) => b.sql - a.sql).slice(0, Math.max(3, Math.ceil(rows.length * 0.05))).slice(0, 8)) {
      const steps = (t.statements ?? []).map((st) => `${kindOf(st.sql)} ${st.ms.toFixed(1)}`).join(', ');
      console.log(`    slow: ${t.sql.toFixed(1)} ms (HTTP ${t.http.toFixed(1)} ms)  ${queryString(t.q.params).slice(0, 90)}\n          ${steps}`);
    }
  }
}

async function main() {
  const port = Number(process.env.DRABYARD_BENCH_PG_PORT ?? 54349);
  let cluster = await ensureCluster({ dataDir: path.join(root, '.data', 'pg-bench'), port, fast: true });
  // The working set (search rows, their indexes, the number keys) should sit in shared buffers, as it would on
  // a server sized for it; the default 256 MB of a developer cluster is too small for 600,000 rows.
  {
    const c = new pg.Client({ connectionString: cluster.adminUrl() });
    await c.connect();
    const sb = (await c.query(`SELECT setting::bigint * 8192 AS bytes FROM pg_settings WHERE name = 'shared_buffers'`)).rows[0].bytes as string;
    if (Number(sb) < 2 * 1024 ** 3 && cluster.startedByUs) {
      await c.query(`ALTER SYSTEM SET shared_buffers = '2GB'`);
      await c.query(`ALTER SYSTEM SET work_mem = '16MB'`);
      await c.end();
      cluster.stop();
      cluster = await ensureCluster({ dataDir: path.join(root, '.data', 'pg-bench'), port, fast: true });
    } else await c.end();
  }
  const url = cluster.adminUrl('drabyard_bench');
  let fresh = !reuse;
  if (reuse) {
    await ensureDatabase(url);
    const c = new pg.Client({ connectionString: url });
    await c.connect();
    const has = await c.query(`SELECT to_regclass('search_docs') IS NOT NULL AS ok`);
    fresh = !has.rows[0].ok || (await c.query(`SELECT count(*)::int AS n FROM search_docs`)).rows[0].n < 500_000;
    await c.end();
  }
  if (fresh) {
    await ensureDatabase(url, { fresh: true });
    const { runMigrations } = await import('../server/db/migrate');
    await runMigrations(url);
    say('migrated; generating data…');
  }
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  if (fresh) await generate(client);
  const data = await counts(client);
  say(`data: ${JSON.stringify(data)}`);
  if (args.includes('--generate-only')) {
    await client.end();
    if (cluster.startedByUs && !args.includes('--keep-running')) cluster.stop();
    return;
  }

  // Server modules read the environment when first used, so it is set before they are imported. The catalog
  // caches are on as in production (facet labels), but identical searches do not share answers here
  // (SEARCH_CACHE_SECONDS=0): this bench measures the search itself, every query run in full.
  Object.assign(process.env, { DATABASE_URL: url, LOG_LEVEL: 'silent', NODE_ENV: 'test', READ_CACHE: 'on', SEARCH_CACHE_SECONDS: '0', SESSION_SECRET: 'bench-session-secret-0123456789', APP_ORIGIN: 'http://localhost:3000' });
  const { createApp } = await import('../server/app');
  const { search, withStatementLog } = await import('../server/services/search');
  const { searchQuery } = await import('../shared/schemas/search');
  const { closeDb } = await import('../server/db/client');

  await client.query('CREATE EXTENSION IF NOT EXISTS pg_prewarm');
  await client.query(`SELECT pg_prewarm(c.oid) FROM pg_class c WHERE c.relnamespace = 'public'::regnamespace AND c.relkind IN ('r', 'i')
    AND (c.relname LIKE 'search_%' OR c.relname LIKE 'part_numbers%' OR c.relname IN ('parts', 'parts_pkey', 'listings', 'listings_pkey', 'listing_photos', 'listing_photos_listing_idx', 'seller_profiles', 'users', 'users_pkey', 'supersessions', 'supersessions_to_idx', 'supersessions_from_to_key'))`);

  const mix = await buildMix(client, QUERY_COUNT);
  // Deep pages: page forward through the service (untimed) to get the cursor of page N.
  const runService = (params: Record<string, string | string[]>) => search(searchQuery.parse(params));
  for (const m of mix.filter((x) => x.category === 'deep')) {
    const { page, ...params } = m.params;
    let cursor: string | null = null;
    for (let i = 1; i < Number(page); i++) {
      const r = await runService(cursor ? { ...params, cursor } : params);
      if (!r.nextCursor) break;
      cursor = r.nextCursor;
    }
    m.params = cursor ? { ...params, cursor } : params;
  }
  // Warm up (untimed) on the whole mix, so both timed runs meet the same caches (plans, buffers, facet labels).
  for (const m of mix) await runService(m.params);

  const app = createApp();
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const httpPort = (server.address() as AddressInfo).port;
  const agent = new Agent({ keepAlive: true, maxSockets: 1 });
  // The HTTP path (routing, validation, the reply's JSON) warms up too, so the first timed requests meet it warm.
  for (const q of mix.slice(0, 200)) await httpGet(agent, httpPort, `/api/search?${queryString(q.params)}`);
  const timed: Timed[] = [];
  say(`running ${mix.length} searches over HTTP…`);
  let failures = 0;
  for (const q of mix) {
    const t = performance.now();
    const res = await httpGet(agent, httpPort, `/api/search?${queryString(q.params)}`);
    const ms = performance.now() - t;
    if (res.status !== 200) {
      failures++;
      if (failures <= 3) say(`HTTP ${res.status} for ${queryString(q.params)}: ${res.body.slice(0, 200)}`);
    }
    timed.push({ q, http: ms, sql: NaN });
  }
  say(`running the same ${mix.length} searches through the service (its SQL, no HTTP)…`);
  for (const t of timed) {
    const start = performance.now();
    const { statements } = await withStatementLog(() => runService(t.q.params));
    t.sql = performance.now() - start;
    t.slowest = statements.reduce<Timed['slowest']>((a, b) => (!a || b.ms > a.ms ? b : a), undefined);
    t.statements = statements.map((x) => ({ sql: x.sql, ms: x.ms }));
  }
  agent.destroy();
  await new Promise((r) => server.close(r));

  const cats: Array<Category | 'all'> = ['number', 'text', 'facets', 'deep', 'all'];
  console.log('\n  category      n   HTTP p50   p95     p99  |  SQL p50   p95     p99  | ratio p50  p95');
  const summary: Record<string, { p50: number; p95: number; p99: number; s50: number; s95: number }> = {};
  for (const c of cats) {
    const rows = c === 'all' ? timed : timed.filter((t) => t.q.category === c);
    const h = rows.map((t) => t.http);
    const s = rows.map((t) => t.sql);
    summary[c] = { p50: pct(h, 50), p95: pct(h, 95), p99: pct(h, 99), s50: pct(s, 50), s95: pct(s, 95) };
    console.log(`  ${c.padEnd(8)} ${String(rows.length).padStart(6)} ${fmt(pct(h, 50))} ${fmt(pct(h, 95))} ${fmt(pct(h, 99))} | ${fmt(pct(s, 50))} ${fmt(pct(s, 95))} ${fmt(pct(s, 99))} | ${(pct(h, 50) / pct(s, 50)).toFixed(2).padStart(6)} ${(pct(h, 95) / pct(s, 95)).toFixed(2).padStart(5)}`);
  }
  const all = summary.all;
  const ratio = Math.max(all.p50 / all.s50, all.p95 / all.s95);
  const targets: Array<[string, boolean, string]> = [
    ['HTTP p95 <= 50 ms', all.p95 <= 50, `${all.p95.toFixed(1)} ms`],
    ['HTTP p50 <= 15 ms', all.p50 <= 15, `${all.p50.toFixed(1)} ms`],
    ['number lookups p95 <= 10 ms', summary.number.p95 <= 10, `${summary.number.p95.toFixed(1)} ms`],
    ['HTTP/SQL ratio <= 1.5', ratio <= 1.5, ratio.toFixed(2)],
    ['every search answered 200', failures === 0, `${failures} failed`],
  ];
  console.log('');
  for (const [name, ok, v] of targets) console.log(`  ${ok ? 'PASS' : 'FAIL'}  ${name.padEnd(30)} ${v}`);
  if (args.includes('--profile')) printProfile(timed);
  const load = (await import('node:os')).loadavg();
  console.log(`\n  load average during the run: ${load.map((x) => x.toFixed(2)).join(' ')} (2 cores expected; other work on the machine inflates every figure)`);

  const slowest = [...timed].sort((a, b) => b.sql - a.sql).slice(0, 3);
  for (const [i, t] of slowest.entries()) {
    console.log(`\n--- slow search ${i + 1}: ${t.q.category} ${queryString(t.q.params)} (${t.sql.toFixed(1)} ms; slowest statement ${t.slowest?.ms.toFixed(1)} ms)`);
    if (!t.slowest) continue;
    const plan = await client.query({ text: `EXPLAIN (ANALYZE, BUFFERS) ${t.slowest.sql}`, values: t.slowest.params as unknown[] });
    for (const row of plan.rows) console.log(`    ${row['QUERY PLAN']}`);
  }
  await client.end();
  await closeDb();
  if (cluster.startedByUs && !args.includes('--keep-running')) cluster.stop();
  process.exitCode = targets.every(([, ok]) => ok) ? 0 : 1;
}

await main();
