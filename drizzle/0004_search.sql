-- Search index (custom migration, written by hand; drizzle-kit does not know these tables).
--
-- One narrow, denormalised row per catalog part and per live listing in search_docs. Facets are stored inline
-- as one integer array of facet codes, code = (facet group << 24) | value number, so filtering is one GIN
-- lookup and every facet is counted in one pass without joins. Statement-level triggers with transition tables
-- keep the rows current, set-based, whether one row changes or half a million. Part-number keys are never
-- computed here: part_numbers.key and .folded are written by the application (server/domain/part-number.ts).
--
-- Facet groups (mirrored in server/services/search-codes.ts; a test compares the two):
--   1 type (0 part, 1 listing)   2 vehicle   3 system   4 assembly   5 condition   6 originality
--   7 seller   8 price band   9 ships to (country)   10 pickup at shows   11 has photos   12 in stock

-- English stemming with accents folded (unaccent is a contrib dictionary, available on managed servers too).
CREATE TEXT SEARCH CONFIGURATION drabyard_english (COPY = pg_catalog.english);--> statement-breakpoint
ALTER TEXT SEARCH CONFIGURATION drabyard_english
  ALTER MAPPING FOR hword, hword_part, word WITH unaccent, english_stem;--> statement-breakpoint

-- Codes of values that are rows elsewhere (vehicles, systems, assemblies, sellers, countries) or fixed lists.
CREATE SEQUENCE search_facet_ref_seq MAXVALUE 16777215;--> statement-breakpoint
CREATE TABLE search_facet_refs (
  facet smallint NOT NULL,
  ref text NOT NULL,
  code integer NOT NULL UNIQUE,
  PRIMARY KEY (facet, ref)
);--> statement-breakpoint

-- Fixed-domain values: code = (group << 24) | position in the list (the same lists as the TypeScript side).
INSERT INTO search_facet_refs (facet, ref, code)
SELECT g.facet, v.ref, (g.facet::int << 24) | (v.n - 1)::int
FROM (VALUES
  (1::smallint, ARRAY['part', 'listing']),
  (5::smallint, ARRAY['nos', 'nors', 'used_original', 'rebuilt', 'reproduction', 'core']),
  (6::smallint, ARRAY['original', 'period_replacement', 'reproduction']),
  (8::smallint, ARRAY['under_10', '10_50', '50_200', '200_1000', 'over_1000']),
  (10::smallint, ARRAY['false', 'true']),
  (11::smallint, ARRAY['false', 'true']),
  (12::smallint, ARRAY['false', 'true'])
) AS g(facet, refs), unnest(g.refs) WITH ORDINALITY AS v(ref, n);--> statement-breakpoint

CREATE TABLE search_docs (
  doc_id integer GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
  -- The part's id for a part row, the listing's id for a listing row.
  ref_id uuid NOT NULL UNIQUE,
  is_listing boolean NOT NULL,
  part_id uuid,
  -- Listing price in cents; null on part rows.
  price integer,
  -- Parts: created; listings: when they went live. Millisecond precision so a cursor round-trips exactly.
  created timestamptz NOT NULL,
  facets integer[] NOT NULL,
  title text NOT NULL,
  number text,
  tsv tsvector NOT NULL
);--> statement-breakpoint
-- Keep the heap narrow: facet counting reads every matching row but never the tsvector.
ALTER TABLE search_docs ALTER COLUMN tsv SET STORAGE EXTERNAL;--> statement-breakpoint
ALTER TABLE search_docs SET (toast_tuple_target = 128);--> statement-breakpoint
CREATE INDEX search_docs_tsv_idx ON search_docs USING gin (tsv);--> statement-breakpoint
CREATE INDEX search_docs_facets_idx ON search_docs USING gin (facets);--> statement-breakpoint
CREATE INDEX search_docs_part_idx ON search_docs (part_id);--> statement-breakpoint
CREATE INDEX search_docs_created_idx ON search_docs (created, doc_id);--> statement-breakpoint
CREATE INDEX search_docs_price_idx ON search_docs (price, doc_id) WHERE is_listing;--> statement-breakpoint
-- Fixed samples (one row in 16, one in 128) for estimating facet counts of broad queries with bounded work.
CREATE INDEX search_docs_tsv_s16_idx ON search_docs USING gin (tsv) WHERE doc_id % 16 = 0;--> statement-breakpoint
CREATE INDEX search_docs_facets_s16_idx ON search_docs USING gin (facets) WHERE doc_id % 16 = 0;--> statement-breakpoint
CREATE INDEX search_docs_tsv_s128_idx ON search_docs USING gin (tsv) WHERE doc_id % 128 = 0;--> statement-breakpoint
CREATE INDEX search_docs_facets_s128_idx ON search_docs USING gin (facets) WHERE doc_id % 128 = 0;--> statement-breakpoint
-- The samples for browsing without words. `doc_id > 0` (always true) sets these apart from the GIN samples, so
-- a search with words never walks a whole sample checking the tsvector row by row.
CREATE INDEX search_docs_s16_idx ON search_docs (doc_id) WHERE doc_id % 16 = 0 AND doc_id > 0;--> statement-breakpoint
CREATE INDEX search_docs_s128_idx ON search_docs (doc_id) WHERE doc_id % 128 = 0 AND doc_id > 0;--> statement-breakpoint

-- Words of names and titles, for correcting typed words by trigram similarity (small: one row per word).
CREATE TABLE search_words (word text PRIMARY KEY);--> statement-breakpoint
CREATE INDEX search_words_trgm_idx ON search_words USING gin (word gin_trgm_ops);--> statement-breakpoint

-- Price bands in cents, lower bound inclusive: under $10, $10-50, $50-200, $200-1,000, $1,000 and over.
CREATE FUNCTION search_price_band(cents integer) RETURNS integer LANGUAGE sql IMMUTABLE PARALLEL SAFE AS $$
  SELECT CASE WHEN cents < 1000 THEN 0 WHEN cents < 5000 THEN 1 WHEN cents < 20000 THEN 2 WHEN cents < 100000 THEN 3 ELSE 4 END
$$;--> statement-breakpoint

-- Originality of a condition (DOMAIN.md, "Condition and originality"; the same split as
-- server/domain/conditions.ts): made by the original maker, a period replacement (NORS), or a reproduction.
CREATE FUNCTION search_originality(cond text) RETURNS integer LANGUAGE sql IMMUTABLE PARALLEL SAFE AS $$
  SELECT CASE cond WHEN 'nors' THEN 1 WHEN 'reproduction' THEN 2 ELSE 0 END
$$;--> statement-breakpoint

CREATE FUNCTION search_add_words(texts text[]) RETURNS void LANGUAGE sql AS $$
  INSERT INTO search_words (word)
  SELECT DISTINCT w
  FROM unnest(texts) t, regexp_split_to_table(lower(unaccent(t)), '[^[:alpha:]]+') w
  WHERE length(w) BETWEEN 3 AND 40
  ON CONFLICT DO NOTHING
$$;--> statement-breakpoint

-- Recomputes the part rows of the given parts (rows of deleted parts are removed). Set-based: the ids are
-- joined (never `= ANY (ids)` as a filter, which plpgsql cannot hash and would scan once per row).
CREATE FUNCTION search_refresh_parts(ids uuid[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  IF ids IS NULL OR cardinality(ids) = 0 THEN RETURN; END IF;
  DELETE FROM search_docs d USING unnest(ids) AS x(id)
  WHERE d.ref_id = x.id AND NOT d.is_listing AND NOT EXISTS (SELECT 1 FROM parts p WHERE p.id = x.id);

  -- Codes for the vehicles, systems and assemblies these parts sit in (a line counts for its assembly and
  -- every assembly above it).
  INSERT INTO search_facet_refs (facet, ref, code)
  SELECT f, ref, (f::int << 24) | nextval('search_facet_ref_seq')::int
  FROM (
    WITH RECURSIVE up(assembly_id, depth) AS (
      SELECT DISTINCT b.assembly_id, 0 FROM unnest(ids) AS x(id) JOIN bom_lines b ON b.part_id = x.id
      UNION
      SELECT a.parent_id, up.depth + 1 FROM up JOIN assemblies a ON a.id = up.assembly_id
      WHERE a.parent_id IS NOT NULL AND up.depth < 16
    ), asm AS (SELECT DISTINCT a.id, a.vehicle_id, a.system_id FROM up JOIN assemblies a ON a.id = up.assembly_id)
    SELECT DISTINCT 2::smallint AS f, vehicle_id::text AS ref FROM asm
    UNION SELECT DISTINCT 3::smallint, system_id::text FROM asm
    UNION SELECT DISTINCT 4::smallint, id::text FROM asm
  ) x
  WHERE NOT EXISTS (SELECT 1 FROM search_facet_refs r WHERE r.facet = x.f AND r.ref = x.ref)
  ON CONFLICT DO NOTHING;

  INSERT INTO search_docs AS d (ref_id, is_listing, part_id, price, created, facets, title, number, tsv)
  SELECT p.id, false, p.id, NULL, date_trunc('milliseconds', p.created_at),
    ARRAY[1 << 24, (12 << 24) | (CASE WHEN stock.part_id IS NOT NULL THEN 1 ELSE 0 END)] || coalesce(asm.codes, '{}'),
    p.name, num.primary_number,
    setweight(coalesce(num.tsv, ''::tsvector), 'A')
      || setweight(to_tsvector('drabyard_english', p.name), 'B')
      || setweight(to_tsvector('drabyard_english', replace(p.category, '_', ' ') || ' ' || left(p.description, 4000)), 'C')
  FROM (SELECT DISTINCT unnest(ids) AS id) x
  JOIN parts p ON p.id = x.id
  LEFT JOIN (
    SELECT n.part_id,
      (array_agg(n.printed ORDER BY array_position(ARRAY['maker','ordnance','nsn','hardware_standard','reproduction','vendor'], n.kind), n.printed))[1] AS primary_number,
      -- Printed forms for words inside numbers; keys and folded keys for numbers typed in any shape.
      to_tsvector('drabyard_english', string_agg(n.printed, ' ' ORDER BY n.printed))
        || to_tsvector('simple', string_agg(n.key || ' ' || n.folded, ' ' ORDER BY n.key)) AS tsv
    FROM unnest(ids) AS y(id) JOIN part_numbers n ON n.part_id = y.id
    GROUP BY n.part_id
  ) num ON num.part_id = p.id
  LEFT JOIN (
    WITH RECURSIVE up(part_id, assembly_id, depth) AS (
      SELECT DISTINCT b.part_id, b.assembly_id, 0 FROM unnest(ids) AS y(id) JOIN bom_lines b ON b.part_id = y.id
      UNION
      SELECT up.part_id, a.parent_id, up.depth + 1 FROM up JOIN assemblies a ON a.id = up.assembly_id
      WHERE a.parent_id IS NOT NULL AND up.depth < 16
    ), pa AS (SELECT DISTINCT up.part_id, a.id, a.vehicle_id, a.system_id FROM up JOIN assemblies a ON a.id = up.assembly_id)
    SELECT c.part_id, array_agg(DISTINCT c.code ORDER BY c.code) AS codes
    FROM (
      SELECT pa.part_id, r.code FROM pa JOIN search_facet_refs r ON r.facet = 2 AND r.ref = pa.vehicle_id::text
      UNION ALL SELECT pa.part_id, r.code FROM pa JOIN search_facet_refs r ON r.facet = 3 AND r.ref = pa.system_id::text
      UNION ALL SELECT pa.part_id, r.code FROM pa JOIN search_facet_refs r ON r.facet = 4 AND r.ref = pa.id::text
    ) c GROUP BY c.part_id
  ) asm ON asm.part_id = p.id
  LEFT JOIN (
    SELECT DISTINCT l.part_id FROM unnest(ids) AS y(id)
    JOIN listings l ON l.part_id = y.id AND l.state = 'approved' AND l.quantity > 0
  ) stock ON stock.part_id = p.id
  ON CONFLICT (ref_id) DO UPDATE SET
    part_id = excluded.part_id, price = excluded.price, created = excluded.created, facets = excluded.facets,
    title = excluded.title, number = excluded.number, tsv = excluded.tsv
  WHERE (d.facets, d.title, d.number, d.tsv, d.created) IS DISTINCT FROM (excluded.facets, excluded.title, excluded.number, excluded.tsv, excluded.created);

  PERFORM search_add_words(ARRAY(SELECT p.name || ' ' || left(p.description, 4000) FROM unnest(ids) AS x(id) JOIN parts p ON p.id = x.id));
END
$$;--> statement-breakpoint

-- Recomputes the listing rows of the given listings: live (approved) ones are written, others removed.
-- A listing row copies its part's numbers and name words (weights A and B) and its vehicle, system and
-- assembly codes from the part row, so refresh parts before their listings.
CREATE FUNCTION search_refresh_listings(ids uuid[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  IF ids IS NULL OR cardinality(ids) = 0 THEN RETURN; END IF;
  DELETE FROM search_docs d USING unnest(ids) AS x(id)
  WHERE d.ref_id = x.id AND d.is_listing
    AND NOT EXISTS (SELECT 1 FROM listings l WHERE l.id = x.id AND l.state = 'approved');

  INSERT INTO search_facet_refs (facet, ref, code)
  SELECT f, ref, (f::int << 24) | nextval('search_facet_ref_seq')::int
  FROM (
    SELECT DISTINCT 7::smallint AS f, l.seller_id::text AS ref
    FROM unnest(ids) AS x(id) JOIN listings l ON l.id = x.id AND l.state = 'approved'
    UNION
    SELECT DISTINCT 9::smallint, upper(c)
    FROM (SELECT DISTINCT l.seller_id FROM unnest(ids) AS x(id) JOIN listings l ON l.id = x.id AND l.state = 'approved') ls
    JOIN seller_profiles s ON s.user_id = ls.seller_id, unnest(s.ships_to) c
  ) x
  WHERE NOT EXISTS (SELECT 1 FROM search_facet_refs r WHERE r.facet = x.f AND r.ref = x.ref)
  ON CONFLICT DO NOTHING;

  INSERT INTO search_docs AS d (ref_id, is_listing, part_id, price, created, facets, title, number, tsv)
  WITH live AS (
    SELECT l.* FROM (SELECT DISTINCT unnest(ids) AS id) x JOIN listings l ON l.id = x.id AND l.state = 'approved'
  ), seller AS MATERIALIZED (
    SELECT s.user_id, s.pickup_at_shows, sr.code,
      coalesce((SELECT array_agg(DISTINCT r.code) FROM unnest(s.ships_to) cc JOIN search_facet_refs r ON r.facet = 9 AND r.ref = upper(cc)), '{}') AS ships
    FROM (SELECT DISTINCT seller_id FROM live) ls
    JOIN search_facet_refs sr ON sr.facet = 7 AND sr.ref = ls.seller_id::text
    LEFT JOIN seller_profiles s ON s.user_id = ls.seller_id
  )
  SELECT l.id, true, l.part_id, l.price_cents, date_trunc('milliseconds', coalesce(l.approved_at, l.created_at)),
    ARRAY[
      (1 << 24) | 1,
      (5 << 24) | (array_position(ARRAY['nos','nors','used_original','rebuilt','reproduction','core'], l.condition) - 1),
      (6 << 24) | search_originality(l.condition),
      s.code,
      (8 << 24) | search_price_band(l.price_cents),
      (10 << 24) | (CASE WHEN coalesce(s.pickup_at_shows, false) THEN 1 ELSE 0 END),
      (11 << 24) | (CASE WHEN EXISTS (SELECT 1 FROM listing_photos ph WHERE ph.listing_id = l.id) THEN 1 ELSE 0 END),
      (12 << 24) | (CASE WHEN l.quantity > 0 THEN 1 ELSE 0 END)
    ]
      || coalesce(ARRAY(SELECT c FROM unnest(pd.facets) c WHERE (c >> 24) BETWEEN 2 AND 4), '{}')
      || s.ships,
    l.title, pd.number,
    coalesce(ts_filter(pd.tsv, '{a,b}'), ''::tsvector)
      || setweight(to_tsvector('drabyard_english', l.title), 'B')
      || setweight(to_tsvector('drabyard_english', left(l.description_md, 4000)), 'C')
  FROM live l
  JOIN seller s ON s.user_id = l.seller_id
  LEFT JOIN search_docs pd ON pd.ref_id = l.part_id AND NOT pd.is_listing
  ON CONFLICT (ref_id) DO UPDATE SET
    part_id = excluded.part_id, price = excluded.price, created = excluded.created, facets = excluded.facets,
    title = excluded.title, number = excluded.number, tsv = excluded.tsv
  WHERE (d.part_id, d.price, d.facets, d.title, d.number, d.tsv, d.created) IS DISTINCT FROM
        (excluded.part_id, excluded.price, excluded.facets, excluded.title, excluded.number, excluded.tsv, excluded.created);

  PERFORM search_add_words(ARRAY(SELECT l.title FROM unnest(ids) AS x(id) JOIN listings l ON l.id = x.id AND l.state = 'approved'));
END
$$;--> statement-breakpoint

-- A part changed (its numbers, name or place in the bill of materials): its row, then its listings' rows.
CREATE FUNCTION search_refresh_parts_and_listings(ids uuid[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  IF ids IS NULL OR cardinality(ids) = 0 THEN RETURN; END IF;
  PERFORM search_refresh_parts(ids);
  PERFORM search_refresh_listings(ARRAY(
    SELECT l.id FROM unnest(ids) AS x(id) JOIN listings l ON l.part_id = x.id AND l.state = 'approved'));
END
$$;--> statement-breakpoint

-- Rebuilds everything (after a bulk load with triggers off, or to repair): parts first, then listings. GIN
-- indexes build far faster in one pass than row by row, so they are dropped and made again (the table is
-- locked for the rebuild).
CREATE FUNCTION search_rebuild() RETURNS void LANGUAGE plpgsql AS $$
DECLARE
  idx record;
  defs text[] := '{}';
  def text;
BEGIN
  FOR idx IN SELECT indexname, indexdef FROM pg_indexes
             WHERE schemaname = current_schema() AND tablename = 'search_docs' AND indexdef LIKE '% USING gin %' LOOP
    defs := defs || idx.indexdef;
    EXECUTE format('DROP INDEX %I', idx.indexname);
  END LOOP;
  TRUNCATE search_docs;
  PERFORM search_refresh_parts(ARRAY(SELECT id FROM parts));
  PERFORM search_refresh_listings(ARRAY(SELECT id FROM listings WHERE state = 'approved'));
  FOREACH def IN ARRAY defs LOOP
    EXECUTE def;
  END LOOP;
END
$$;--> statement-breakpoint

-- Trigger functions. Each reads the statement's transition tables (new_rows / old_rows), so one statement
-- touching many rows costs one set-based refresh.
CREATE FUNCTION search_trg_parts() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    DELETE FROM search_docs d USING old_rows o WHERE d.ref_id = o.id AND NOT d.is_listing;
  ELSE
    PERFORM search_refresh_parts_and_listings(ARRAY(SELECT id FROM new_rows));
  END IF;
  RETURN NULL;
END
$$;--> statement-breakpoint
CREATE TRIGGER search_parts_ins AFTER INSERT ON parts REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_parts();--> statement-breakpoint
CREATE TRIGGER search_parts_upd AFTER UPDATE ON parts REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_parts();--> statement-breakpoint
CREATE TRIGGER search_parts_del AFTER DELETE ON parts REFERENCING OLD TABLE AS old_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_parts();--> statement-breakpoint

-- part_numbers and bom_lines: the part ids on either side of the change.
CREATE FUNCTION search_trg_part_child() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'INSERT' THEN
    PERFORM search_refresh_parts_and_listings(ARRAY(SELECT DISTINCT part_id FROM new_rows));
  ELSIF TG_OP = 'UPDATE' THEN
    PERFORM search_refresh_parts_and_listings(ARRAY(SELECT part_id FROM new_rows UNION SELECT part_id FROM old_rows));
  ELSE
    PERFORM search_refresh_parts_and_listings(ARRAY(SELECT DISTINCT part_id FROM old_rows));
  END IF;
  RETURN NULL;
END
$$;--> statement-breakpoint
CREATE TRIGGER search_part_numbers_ins AFTER INSERT ON part_numbers REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_part_child();--> statement-breakpoint
CREATE TRIGGER search_part_numbers_upd AFTER UPDATE ON part_numbers REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_part_child();--> statement-breakpoint
CREATE TRIGGER search_part_numbers_del AFTER DELETE ON part_numbers REFERENCING OLD TABLE AS old_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_part_child();--> statement-breakpoint
CREATE TRIGGER search_bom_lines_ins AFTER INSERT ON bom_lines REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_part_child();--> statement-breakpoint
CREATE TRIGGER search_bom_lines_upd AFTER UPDATE ON bom_lines REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_part_child();--> statement-breakpoint
CREATE TRIGGER search_bom_lines_del AFTER DELETE ON bom_lines REFERENCING OLD TABLE AS old_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_part_child();--> statement-breakpoint

-- An assembly moved (vehicle, system or parent): every part in it or below it.
CREATE FUNCTION search_trg_assemblies() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM search_refresh_parts_and_listings(ARRAY(
    WITH RECURSIVE down(id, depth) AS (
      SELECT n.id, 0 FROM new_rows n JOIN old_rows o ON o.id = n.id
      WHERE (n.vehicle_id, n.system_id, n.parent_id) IS DISTINCT FROM (o.vehicle_id, o.system_id, o.parent_id)
      UNION
      SELECT a.id, down.depth + 1 FROM assemblies a JOIN down ON a.parent_id = down.id WHERE down.depth < 16
    )
    SELECT DISTINCT b.part_id FROM bom_lines b JOIN down ON b.assembly_id = down.id));
  RETURN NULL;
END
$$;--> statement-breakpoint
CREATE TRIGGER search_assemblies_upd AFTER UPDATE ON assemblies REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_assemblies();--> statement-breakpoint

-- Listings: their own rows, and their parts' rows (a part row says whether any live listing has stock).
CREATE FUNCTION search_trg_listings() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'INSERT' THEN
    PERFORM search_refresh_listings(ARRAY(SELECT id FROM new_rows));
    PERFORM search_refresh_parts(ARRAY(SELECT DISTINCT part_id FROM new_rows WHERE part_id IS NOT NULL));
  ELSIF TG_OP = 'UPDATE' THEN
    PERFORM search_refresh_listings(ARRAY(SELECT id FROM new_rows));
    PERFORM search_refresh_parts(ARRAY(SELECT part_id FROM new_rows WHERE part_id IS NOT NULL
                                       UNION SELECT part_id FROM old_rows WHERE part_id IS NOT NULL));
  ELSE
    DELETE FROM search_docs d USING old_rows o WHERE d.ref_id = o.id AND d.is_listing;
    PERFORM search_refresh_parts(ARRAY(SELECT DISTINCT part_id FROM old_rows WHERE part_id IS NOT NULL));
  END IF;
  RETURN NULL;
END
$$;--> statement-breakpoint
CREATE TRIGGER search_listings_ins AFTER INSERT ON listings REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_listings();--> statement-breakpoint
CREATE TRIGGER search_listings_upd AFTER UPDATE ON listings REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_listings();--> statement-breakpoint
CREATE TRIGGER search_listings_del AFTER DELETE ON listings REFERENCING OLD TABLE AS old_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_listings();--> statement-breakpoint

-- Photos and seller profiles: the listings they belong to.
CREATE FUNCTION search_trg_listing_photos() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'INSERT' THEN
    PERFORM search_refresh_listings(ARRAY(SELECT DISTINCT listing_id FROM new_rows));
  ELSIF TG_OP = 'UPDATE' THEN
    PERFORM search_refresh_listings(ARRAY(SELECT listing_id FROM new_rows UNION SELECT listing_id FROM old_rows));
  ELSE
    PERFORM search_refresh_listings(ARRAY(SELECT DISTINCT listing_id FROM old_rows));
  END IF;
  RETURN NULL;
END
$$;--> statement-breakpoint
CREATE TRIGGER search_listing_photos_ins AFTER INSERT ON listing_photos REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_listing_photos();--> statement-breakpoint
CREATE TRIGGER search_listing_photos_upd AFTER UPDATE ON listing_photos REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_listing_photos();--> statement-breakpoint
CREATE TRIGGER search_listing_photos_del AFTER DELETE ON listing_photos REFERENCING OLD TABLE AS old_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_listing_photos();--> statement-breakpoint

CREATE FUNCTION search_trg_seller_profiles() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    PERFORM search_refresh_listings(ARRAY(SELECT l.id FROM listings l JOIN old_rows o ON o.user_id = l.seller_id));
  ELSE
    PERFORM search_refresh_listings(ARRAY(SELECT l.id FROM listings l JOIN new_rows n ON n.user_id = l.seller_id));
  END IF;
  RETURN NULL;
END
$$;--> statement-breakpoint
CREATE TRIGGER search_seller_profiles_ins AFTER INSERT ON seller_profiles REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_seller_profiles();--> statement-breakpoint
CREATE TRIGGER search_seller_profiles_upd AFTER UPDATE ON seller_profiles REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_seller_profiles();--> statement-breakpoint
CREATE TRIGGER search_seller_profiles_del AFTER DELETE ON seller_profiles REFERENCING OLD TABLE AS old_rows
  FOR EACH STATEMENT EXECUTE FUNCTION search_trg_seller_profiles();--> statement-breakpoint

-- Whatever the demo seed or earlier data put in before this migration.
SELECT search_rebuild();
