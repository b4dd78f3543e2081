import { sql } from 'drizzle-orm';
import type { Tx } from '../../db/client';

// Every order that took money counts, whatever happened after (refunds are subtracted line by line).
const PAID_ORDER = sql`o.paid_at is not null`;
const MONTH = sql`to_char(date_trunc('month', o.paid_at at time zone 'UTC'), 'YYYY-MM')`;

type SalesRow = { month: string; species_name: string; board_feet: number; slabs: number; wood_cents: number; services_cents: number; tax_cents: number };
type RefundRow = { month: string; species_name: string; wood_cents: number; services_cents: number; tax_cents: number };

/**
 * Per calendar month of the sale (UTC) and species: board feet and slabs still sold, and the wood,
 * services and tax money of every line that was paid for.
 */
export async function salesByMonthAndSpecies(db: Tx) {
  const res = await db.execute<SalesRow>(sql`
    select ${MONTH} as month, l.species_name,
           coalesce(sum(l.board_feet) filter (where l.status = 'sold'), 0)::float8 as board_feet,
           (count(*) filter (where l.status = 'sold'))::int as slabs,
           sum(l.slab_cents)::int8 as wood_cents, sum(l.services_cents)::int8 as services_cents, sum(l.tax_cents)::int8 as tax_cents
      from order_lines l join orders o on o.id = l.order_id
     where l.status in ('sold', 'refunded') and ${PAID_ORDER}
     group by 1, 2
     order by 1, 2`);
  return res.rows.map((r) => ({ ...r, board_feet: Number(r.board_feet), wood_cents: Number(r.wood_cents), services_cents: Number(r.services_cents), tax_cents: Number(r.tax_cents) }));
}

/** Refunds that went through, by the month of the sale they undo and species, split as they were recorded. */
export async function refundsByMonthAndSpecies(db: Tx) {
  const res = await db.execute<RefundRow>(sql`
    select ${MONTH} as month, l.species_name,
           sum(r.wood_cents)::int8 as wood_cents, sum(r.services_cents)::int8 as services_cents, sum(r.tax_cents)::int8 as tax_cents
      from refund_lines r
      join payments p on p.id = r.payment_id
      join order_lines l on l.id = r.order_line_id
      join orders o on o.id = l.order_id
     where p.status = 'succeeded' and ${PAID_ORDER}
     group by 1, 2`);
  return res.rows.map((r) => ({ ...r, wood_cents: Number(r.wood_cents), services_cents: Number(r.services_cents), tax_cents: Number(r.tax_cents) }));
}

export async function slabCountsByStatus(db: Tx) {
  const res = await db.execute<{ status: string; count: number }>(sql`
    select status, count(*)::int as count from slabs group by status order by status`);
  return res.rows;
}

/** Mean whole days between the log's milling date and the order's payment, over sold lines. */
export async function daysMilledToSold(db: Tx) {
  const res = await db.execute<{ avg_days: number | null; n: number }>(sql`
    select avg((o.paid_at at time zone 'UTC')::date - lg.milled_on)::float8 as avg_days, count(*)::int as n
      from order_lines l
      join orders o on o.id = l.order_id
      join slabs s on s.id = l.slab_id
      join logs lg on lg.id = s.log_id
     where l.status = 'sold' and ${PAID_ORDER} and lg.milled_on is not null`);
  const row = res.rows[0];
  return { avgDays: row?.avg_days === null || row?.avg_days === undefined ? null : Number(row.avg_days), n: Number(row?.n ?? 0) };
}
