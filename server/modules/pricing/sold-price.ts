import { and, desc, eq, sql } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { orderLines, slabs } from '../../db/schema/index';
import { SOLD_STATUSES } from '../../../shared/slabs';
import type { PriceBreakdownView } from '../../../shared/slabs';

const soldList = sql.join(SOLD_STATUSES.map((s) => sql`${s}`), sql`, `);

/**
 * The price a buyer sees for a slab in any list (catalogue card, log neighbours, yard): the asking
 * price while it is for sale; once sold, the slab price its order line recorded at the sale — null
 * when no sale was recorded (the screen then just says "Sold"). Never today's price rules.
 */
export const shownPriceCents = sql<number | null>`case when ${slabs.status} in (${soldList}) then (
  select ${orderLines.slabCents} from ${orderLines}
  where ${orderLines.slabId} = ${slabs.id} and ${orderLines.status} = 'sold'
  order by ${orderLines.id} desc limit 1) else ${slabs.priceCents} end`;

/** The sold line of a slab: what it was sold at, with the breakdown shown to the buyer at checkout. */
export async function soldLineOf(tx: Tx, slabId: number) {
  const [row] = await tx.select({ slabCents: orderLines.slabCents, priceBreakdown: orderLines.priceBreakdown })
    .from(orderLines).where(and(eq(orderLines.slabId, slabId), eq(orderLines.status, 'sold')))
    .orderBy(desc(orderLines.id)).limit(1);
  return row ?? null;
}

/** The slab's part of a checkout snapshot (services such as flattening were bought on top of it). */
export function slabPartOf(snapshot: unknown, slabCents: number): PriceBreakdownView {
  const s = (snapshot ?? {}) as Partial<PriceBreakdownView>;
  const lines = (s.lines ?? []).filter((l) => l.code !== 'flattening');
  return { boardFeet: s.boardFeet ?? 0, lines, slabCents, flatteningCents: 0, totalCents: slabCents };
}

/** The yard's price column: what a sold slab sold at, else the stored price (staff always see a number). */
export const yardPriceCents = sql<number>`coalesce(${shownPriceCents}, ${slabs.priceCents})`;
