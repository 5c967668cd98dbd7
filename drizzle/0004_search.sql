-- Search index: written by the search work (denormalised search rows, triggers, GIN indexes).
SELECT 1;
