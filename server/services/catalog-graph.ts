import { inArray, or, sql } from 'drizzle-orm';
import { getDb } from '../db/client';
import { partNumbers, supersessions } from '../db/schema/index';
import type { PartNumberRow, SupersessionEdge } from '../domain/supersession';

const MAX_COMPONENT = 2000;

/**
 * Loads the supersession component around some parts: a bounded recursive walk in both directions (UNION
 * drops repeats, so a loop in the data ends the walk instead of spinning), then its edges and numbers.
 */
export async function loadSubgraph(seedPartIds: string[]): Promise<{ partIds: string[]; edges: SupersessionEdge[]; numbers: PartNumberRow[] }> {
  if (seedPartIds.length === 0) return { partIds: [], edges: [], numbers: [] };
  const db = getDb();
  const reach = await db.execute<{ part_id: string }>(sql`
    WITH RECURSIVE reach(part_id, depth) AS (
      SELECT p, 0 FROM unnest(${sql.raw(`ARRAY[${seedPartIds.map((id) => `'${id.replace(/[^0-9a-f-]/gi, '')}'`).join(',')}]::uuid[]`)}) AS p
      UNION
      SELECT CASE WHEN s.from_part_id = r.part_id THEN s.to_part_id ELSE s.from_part_id END, r.depth + 1
      FROM reach r JOIN supersessions s ON s.from_part_id = r.part_id OR s.to_part_id = r.part_id
      WHERE r.depth < 32
    )
    SELECT DISTINCT part_id FROM reach LIMIT ${MAX_COMPONENT}`);
  const partIds = reach.rows.map((r) => r.part_id);
  const [edgeRows, numberRows] = await Promise.all([
    db
      .select()
      .from(supersessions)
      .where(or(inArray(supersessions.fromPartId, partIds), inArray(supersessions.toPartId, partIds))),
    db.select().from(partNumbers).where(inArray(partNumbers.partId, partIds)),
  ]);
  const inSet = new Set(partIds);
  return {
    partIds,
    edges: edgeRows
      .filter((e) => inSet.has(e.fromPartId) && inSet.has(e.toPartId))
      .map((e) => ({ id: e.id, fromPartId: e.fromPartId, toPartId: e.toPartId, interchange: e.interchange, note: e.note, quantity: e.quantity })),
    numbers: numberRows.map((n) => ({ partId: n.partId, number: n.printed, key: n.key, folded: n.folded, kind: n.kind })),
  };
}
