import { asc, eq, notInArray } from 'drizzle-orm';
import { SOLD_STATUSES } from '../../../shared/slabs';
import type { Tx } from '../../db/client';
import { figureKinds, millSettings, slabs, species } from '../../db/schema/index';

export const readSettings = async (db: Tx) => (await db.select().from(millSettings).where(eq(millSettings.id, 1)))[0] ?? null;
export const readSpecies = (db: Tx) => db.select().from(species).orderBy(asc(species.name));
export const readFigures = (db: Tx) => db.select().from(figureKinds).orderBy(asc(figureKinds.label));

export async function upsertSettings(db: Tx, values: Omit<typeof millSettings.$inferInsert, 'id' | 'yardAddress'>) {
  await db.insert(millSettings).values({ id: 1, yardAddress: '', ...values, updatedAt: new Date() })
    .onConflictDoUpdate({ target: millSettings.id, set: { ...values, updatedAt: new Date() } });
}

export const setSpeciesRate = (db: Tx, slug: string, cents: number) =>
  db.update(species).set({ ratePerBoardFootCents: cents }).where(eq(species.slug, slug)).returning({ slug: species.slug });

export const setFigurePremium = (db: Tx, slug: string, multiplier: number) =>
  db.update(figureKinds).set({ premiumMultiplier: multiplier }).where(eq(figureKinds.slug, slug)).returning({ slug: figureKinds.slug });

/** Slabs whose price is still open: everything not yet sold (a sold slab keeps the price it sold at). */
export const unsoldSlabs = (db: Tx) =>
  db.select({ slab: slabs, rate: species.ratePerBoardFootCents }).from(slabs)
    .innerJoin(species, eq(species.id, slabs.speciesId))
    .where(notInArray(slabs.status, [...SOLD_STATUSES]));

export const setSlabPrice = (db: Tx, id: number, priceCents: number) =>
  db.update(slabs).set({ priceCents, updatedAt: new Date() }).where(eq(slabs.id, id));
