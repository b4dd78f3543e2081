import { sql } from 'drizzle-orm';
import type { Tx } from '../../db/client';

// Orders that took money and were not cancelled; refunded lines are excluded line by line.
const PAID_ORDER = sql`o.paid_at is not null and o.status in ('paid', 'picked-up', 'no-show', 'refunded')`;

type SalesRow = { month: string; species_name: string; board_feet: number; revenue_cents: number; slabs: number };

/** Board feet and revenue per calendar month (UTC) and species, from sold lines of paid orders. */
export async function salesByMonthAndSpecies(db: Tx) {
  const res = await db.execute<SalesRow>(sql`
    select to_char(date_trunc('month', o.paid_at at time zone 'UTC'), 'YYYY-MM') as month,
           l.species_name,
           sum(l.board_feet)::float8 as board_feet,
           sum(l.total_cents)::int8 as revenue_cents,
           count(*)::int as slabs
      from order_lines l join orders o on o.id = l.order_id
     where l.status = 'sold' and ${PAID_ORDER}
     group by 1, 2
     order by 1, 2`);
  return res.rows.map((r) => ({ ...r, board_feet: Number(r.board_feet), revenue_cents: Number(r.revenue_cents) }));
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
