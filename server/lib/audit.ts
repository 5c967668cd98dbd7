import { auditLog } from '../db/schema/index';
import type { Db } from '../db/client';

type Tx = Pick<Db, 'insert'>;

/** Writes one audit row; call inside the same transaction as the change it records. */
export async function audit(
  tx: Tx,
  entry: { actorId: string | null; action: string; entityType: string; entityId: string; before?: unknown; after?: unknown },
) {
  await tx.insert(auditLog).values({
    actorId: entry.actorId,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId,
    before: entry.before ?? null,
    after: entry.after ?? null,
  });
}
