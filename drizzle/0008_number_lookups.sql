-- Numbers one typo away (custom migration). A folded key and every string made by dropping one of its
-- characters: two keys one edit apart (a dropped, added, mistyped or swapped character) always share one of
-- these, so a typed number finds its near keys with a dozen index lookups instead of one per possible typo
-- (the symmetric-deletion method; server/services/search-number.ts checks each candidate's edit exactly).
CREATE FUNCTION number_key_deletions(k text) RETURNS text[]
  LANGUAGE sql IMMUTABLE STRICT PARALLEL SAFE
  RETURN ARRAY(SELECT DISTINCT v FROM (SELECT k AS v UNION ALL SELECT left(k, i - 1) || substr(k, i + 1) FROM generate_series(1, length(k)) AS i) AS x);--> statement-breakpoint
CREATE INDEX part_numbers_deletions_idx ON part_numbers USING gin (number_key_deletions(folded));
--> statement-breakpoint
-- Close numbers for the empty state: keys by trigram similarity, at a threshold of its own. At the default 0.3
-- the index hands over many keys sharing only common trigrams (the first characters of stock numbers) to be
-- checked one by one; 0.35 proposed the same numbers for 200 garbled numbers of the search benchmark at about a
-- third of the time (measured with npm run bench:search's data set; a tuning of ours, no published source).
-- A function, so the threshold applies to this statement only (pg_trgm reads it from the setting).
CREATE FUNCTION close_part_numbers(k text, n int) RETURNS SETOF part_numbers
  LANGUAGE plpgsql STABLE PARALLEL SAFE
  SET pg_trgm.similarity_threshold = 0.35
AS $$
BEGIN
  RETURN QUERY SELECT p.* FROM part_numbers p WHERE p.key % k ORDER BY similarity(p.key, k) DESC, p.printed LIMIT n;
END
$$;
