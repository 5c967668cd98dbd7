import { and, desc, eq, sql } from 'drizzle-orm';
import type { SellerApplication, SellerApplicationInput } from '../../shared/schemas/auth';
import { getDb } from '../db/client';
import { sellerApplications, users } from '../db/schema/index';
import { AppError, invalidState, notFound } from '../errors';
import { audit } from '../lib/audit';
import { composeMail, sendMail } from '../lib/mailer';
import type { SessionUser } from '../auth/require-role';

type Row = typeof sellerApplications.$inferSelect;

const toDto = (r: Row, userEmail?: string): SellerApplication => ({
  id: r.id,
  userId: r.userId,
  ...(userEmail ? { userEmail } : {}),
  businessName: r.businessName,
  location: r.location,
  whatTheySell: r.whatTheySell,
  state: r.state,
  decisionNote: r.decisionNote,
  createdAt: r.createdAt.toISOString(),
});

export async function apply(user: SessionUser, input: SellerApplicationInput): Promise<SellerApplication> {
  if (user.roles.includes('seller')) throw invalidState('You already sell on Drabyard');
  if (!user.emailVerified) throw new AppError(403, 'forbidden', 'Confirm your e-mail address before applying to sell');
  const [row] = await getDb()
    .insert(sellerApplications)
    .values({ userId: user.id, ...input })
    .onConflictDoNothing()
    .returning();
  if (!row) throw invalidState('Your earlier application is still waiting for a decision');
  return toDto(row);
}

export async function mine(userId: string): Promise<SellerApplication | null> {
  const [row] = await getDb().select().from(sellerApplications).where(eq(sellerApplications.userId, userId)).orderBy(desc(sellerApplications.createdAt)).limit(1);
  return row ? toDto(row) : null;
}

export async function list(state: Row['state'] | undefined): Promise<SellerApplication[]> {
  const rows = await getDb()
    .select({ a: sellerApplications, email: users.email })
    .from(sellerApplications)
    .innerJoin(users, eq(users.id, sellerApplications.userId))
    .where(state ? eq(sellerApplications.state, state) : undefined)
    .orderBy(sellerApplications.createdAt)
    .limit(500);
  return rows.map((r) => toDto(r.a, r.email));
}

/** An administrator's decision; approval grants the seller role in the same transaction. */
export async function decide(admin: SessionUser, id: string, decision: 'approve' | 'reject', note?: string): Promise<SellerApplication> {
  const result = await getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(sellerApplications).where(eq(sellerApplications.id, id)).for('update');
    if (!before) throw notFound('Seller application');
    if (before.state !== 'pending') throw invalidState(`This application was already ${before.state}`);
    const state = decision === 'approve' ? 'approved' : 'rejected';
    const [after] = await tx
      .update(sellerApplications)
      .set({ state, decisionNote: note ?? null, decidedBy: admin.id, decidedAt: new Date() })
      .where(and(eq(sellerApplications.id, id), eq(sellerApplications.state, 'pending')))
      .returning();
    let email = '';
    let name = '';
    if (decision === 'approve') {
      const [u] = await tx
        .update(users)
        .set({ roles: sql`(select array_agg(distinct r) from unnest(${users.roles} || '{seller}'::text[]) r)` })
        .where(eq(users.id, before.userId))
        .returning();
      email = u.email;
      name = u.displayName;
    } else {
      const [u] = await tx.select().from(users).where(eq(users.id, before.userId));
      email = u.email;
      name = u.displayName;
    }
    await audit(tx, { actorId: admin.id, action: `seller_application.${state}`, entityType: 'seller_application', entityId: id, before, after });
    return { after, email, name };
  });
  const approved = decision === 'approve';
  await sendMail(
    composeMail({
      to: result.email,
      subject: approved ? 'You can now sell on Drabyard' : 'About your application to sell on Drabyard',
      greeting: `Hello ${result.name},`,
      paragraphs: approved
        ? ['Your application was approved. Your seller desk is open: set up your shop profile and shipping, then list your first parts.']
        : ['We could not approve your application this time.', ...(note ? [`Note from our team: ${note}`] : [])],
    }),
  );
  return toDto(result.after);
}
