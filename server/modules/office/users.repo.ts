import { and, asc, eq, ilike, or, sql } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { session, user } from '../../db/schema/index';

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

export function findUsers(db: Tx, { q, role }: { q?: string; role?: string }) {
  const filters = [];
  if (q) {
    const like = `%${escapeLike(q)}%`;
    filters.push(or(ilike(user.name, like), ilike(user.email, like)));
  }
  if (role) filters.push(eq(user.role, role));
  return db.select().from(user).where(filters.length ? and(...filters) : undefined).orderBy(asc(user.name), asc(user.email)).limit(200);
}

/** Locks the user row so two admins changing roles at once are serialised. */
export async function findUserForUpdate(db: Tx, id: string) {
  const [row] = await db.select().from(user).where(eq(user.id, id)).for('update');
  return row ?? null;
}

/** Admins who can still sign in; the office must always keep at least one. */
export async function countActiveAdmins(db: Tx) {
  const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(user)
    .where(and(eq(user.role, 'admin'), sql`coalesce(${user.banned}, false) = false`));
  return row.n;
}

export async function updateUser(db: Tx, id: string, values: Partial<typeof user.$inferInsert>) {
  const [row] = await db.update(user).set(values).where(eq(user.id, id)).returning();
  return row;
}

export function deleteSessionsOf(db: Tx, userId: string) {
  return db.delete(session).where(eq(session.userId, userId));
}

/** Serialises last-admin checks across transactions (PostgreSQL advisory lock; PGlite is single-writer anyway). */
export async function lockAdminRoster(db: Tx) {
  await db.execute(sql`select pg_advisory_xact_lock(724001)`);
}
