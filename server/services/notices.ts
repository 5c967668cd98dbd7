/**
 * In-app notices: short messages for one user (a wanted part was listed, ...), read or unread.
 */
import { and, count, desc, eq, isNull } from 'drizzle-orm';
import type { Db } from '../db/client';
import { getDb } from '../db/client';
import { notices } from '../db/schema/index';
import { notFound } from '../errors';

type Conn = Pick<Db, 'insert'>;
type NoticeRow = typeof notices.$inferSelect;

export function noticeDto(n: NoticeRow) {
  return { id: n.id, kind: n.kind, title: n.title, body: n.body, link: n.link, read: n.readAt !== null, readAt: n.readAt?.toISOString() ?? null, createdAt: n.createdAt.toISOString() };
}
export type NoticeDto = ReturnType<typeof noticeDto>;

/** Writes a notice; pass the caller's transaction so it commits with the change it tells about. */
export async function createNotice(conn: Conn, n: { userId: string; kind: string; title: string; body?: string; link?: string | null }) {
  const [row] = await conn
    .insert(notices)
    .values({ userId: n.userId, kind: n.kind, title: n.title, body: n.body ?? '', link: n.link ?? null })
    .returning();
  return row;
}

export async function listNotices(userId: string, opts: { unreadOnly?: boolean; limit?: number } = {}) {
  const db = getDb();
  const where = opts.unreadOnly ? and(eq(notices.userId, userId), isNull(notices.readAt)) : eq(notices.userId, userId);
  const [rows, [{ n }]] = await Promise.all([
    db.select().from(notices).where(where).orderBy(desc(notices.createdAt), desc(notices.id)).limit(opts.limit ?? 50),
    db.select({ n: count() }).from(notices).where(and(eq(notices.userId, userId), isNull(notices.readAt))),
  ]);
  return { notices: rows.map(noticeDto), unreadCount: n };
}

/** Marks one of the user's notices read (reading twice keeps the first time); another user's is 404. */
export async function markRead(userId: string, id: string) {
  const db = getDb();
  const [row] = await db.select().from(notices).where(and(eq(notices.id, id), eq(notices.userId, userId)));
  if (!row) throw notFound('Notice');
  if (row.readAt) return noticeDto(row);
  const [after] = await db.update(notices).set({ readAt: new Date() }).where(eq(notices.id, id)).returning();
  return noticeDto(after);
}

export async function markAllRead(userId: string) {
  const rows = await getDb()
    .update(notices)
    .set({ readAt: new Date() })
    .where(and(eq(notices.userId, userId), isNull(notices.readAt)))
    .returning({ id: notices.id });
  return { marked: rows.length };
}
