import { eq } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { user } from '../../db/schema/index';

export async function findPreferences(db: Tx, userId: string) {
  const [row] = await db.select({ units: user.units }).from(user).where(eq(user.id, userId));
  return row ?? null;
}

export async function savePreferences(db: Tx, userId: string, values: { units: string }) {
  const [row] = await db.update(user).set({ units: values.units }).where(eq(user.id, userId)).returning({ units: user.units });
  return row ?? null;
}
