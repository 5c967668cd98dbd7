import { sql, type SQL } from 'drizzle-orm';
import { run } from '../db/run';
import type { PartNumberRow, SupersessionEdge } from '../domain/supersession';

const MAX_COMPONENT = 2000;

export interface Subgraph {
  partIds: string[];
  edges: SupersessionEdge[];
  numbers: PartNumberRow[];
}

export interface SubgraphRow {
  part_ids: string[] | null;
  edges: Array<{ id: string; from_part_id: string; to_part_id: string; interchange: SupersessionEdge['interchange']; note: string | null; quantity: number }> | null;
  numbers: Array<{ part_id: string; printed: string; key: string; folded: string; kind: PartNumberRow['kind'] }> | null;
}

/**
 * The supersession component around the parts of `seeds` (a statement with a `part_id` column), as CTEs and
 * a final SELECT of three JSON columns: a bounded recursive walk in both directions (UNION drops repeats, so a
 * loop in the data ends the walk instead of spinning), then the component's edges and numbers. One statement,
 * so a caller can find its seeds in the same round trip.
 */
export function subgraphStatement(seeds: SQL, before: SQL = sql``, moreColumns: SQL = sql``): SQL {
  return sql`WITH RECURSIVE ${before}
    reach(part_id, depth) AS (
      SELECT DISTINCT part_id, 0 FROM (${seeds}) seed
      UNION
      SELECT CASE WHEN s.from_part_id = r.part_id THEN s.to_part_id ELSE s.from_part_id END, r.depth + 1
      FROM reach r JOIN supersessions s ON s.from_part_id = r.part_id OR s.to_part_id = r.part_id
      WHERE r.depth < 32
    ),
    comp AS MATERIALIZED (SELECT DISTINCT part_id FROM reach LIMIT ${MAX_COMPONENT})
    SELECT
      (SELECT array_agg(part_id) FROM comp) AS part_ids,
      (SELECT json_agg(json_build_object('id', s.id, 'from_part_id', s.from_part_id, 'to_part_id', s.to_part_id,
          'interchange', s.interchange, 'note', s.note, 'quantity', s.quantity))
        -- Per part on its index (OFFSET 0 keeps the planner from hashing the whole table for a small component).
        FROM comp a, LATERAL (SELECT * FROM supersessions x WHERE x.from_part_id = a.part_id OFFSET 0) s
        WHERE EXISTS (SELECT 1 FROM comp b WHERE b.part_id = s.to_part_id)) AS edges,
      (SELECT json_agg(json_build_object('part_id', n.part_id, 'printed', n.printed, 'key', n.key, 'folded', n.folded, 'kind', n.kind))
        FROM part_numbers n JOIN comp c ON c.part_id = n.part_id) AS numbers ${moreColumns}`;
}

export function subgraphFromRow(row: SubgraphRow): Subgraph {
  return {
    partIds: row.part_ids ?? [],
    edges: (row.edges ?? []).map((e) => ({ id: e.id, fromPartId: e.from_part_id, toPartId: e.to_part_id, interchange: e.interchange, note: e.note, quantity: e.quantity })),
    numbers: (row.numbers ?? []).map((n) => ({ partId: n.part_id, number: n.printed, key: n.key, folded: n.folded, kind: n.kind })),
  };
}

/** Loads the supersession component around some parts, in one statement. */
export async function loadSubgraph(seedPartIds: string[]): Promise<Subgraph> {
  if (seedPartIds.length === 0) return { partIds: [], edges: [], numbers: [] };
  const rows = await run<SubgraphRow & Record<string, unknown>>(subgraphStatement(sql`SELECT unnest(${sql.param(seedPartIds)}::uuid[]) AS part_id`), { prepare: 'subgraph' });
  return subgraphFromRow(rows[0]);
}
