DROP INDEX "part_numbers_key_trgm_idx";--> statement-breakpoint
CREATE INDEX "part_numbers_folded_trgm_idx" ON "part_numbers" USING gin ("folded" gin_trgm_ops);--> statement-breakpoint
-- Close numbers compare folded keys (O read as 0, I as 1, no leading zeros), as every other number lookup does:
-- a number typed with an O for a 0 and a wrong digit is still close to the right one.
CREATE OR REPLACE FUNCTION close_part_numbers(k text, n int) RETURNS SETOF part_numbers
  LANGUAGE plpgsql STABLE PARALLEL SAFE
  SET pg_trgm.similarity_threshold = 0.35
AS $$
BEGIN
  RETURN QUERY SELECT p.* FROM part_numbers p WHERE p.folded % k ORDER BY similarity(p.folded, k) DESC, p.printed LIMIT n;
END
$$;
