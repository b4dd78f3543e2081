import { eq } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { figureKinds, millSettings } from '../../db/schema/index';

export async function readMillSettings(db: Tx) {
  const [row] = await db.select().from(millSettings).where(eq(millSettings.id, 1));
  return row ?? null;
}

export function readFigureKinds(db: Tx) {
  return db.select().from(figureKinds).orderBy(figureKinds.label);
}
