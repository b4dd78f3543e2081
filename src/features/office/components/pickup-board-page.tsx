import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router';
import { PageTitle } from '../../../components/ui/page-title';
import { Notice } from '../../../components/ui/notice';
import { Tag } from '../../../components/ui/tag';
import { buttonClass } from '../../../components/ui/button';
import { paths } from '../../../paths';
import { lifting, WOOD_LIMITS } from '../../../../shared/wood/index';
import { Length, Weight } from '../../../lib/units';
import { STAFF_DUST_NOISE_CAUTION } from '../../../../shared/safety';
import { formatWindow, WEEKDAY_NAMES } from '../../../../shared/pickups';
import type { PickupOrder, PickupBoard } from '../../../../shared/office';
import { pickupsQuery } from '../api';
import { PickupActions } from './pickup-actions';
import { ORDER_STATUS_LABELS } from './order-status';

const shift = (day: string, n: number) => new Date(Date.parse(`${day}T00:00:00Z`) + n * 86_400_000).toISOString().slice(0, 10);

export function PickupBoardPage() {
  const [params, setParams] = useSearchParams();
  const from = params.get('from') ?? undefined;
  const { data: board } = useQuery(pickupsQuery(from, 7));
  if (!board) return null;
  return (
    <div className="flex flex-col gap-4">
      <PageTitle>Pickup board</PageTitle>
      <div className="flex flex-wrap items-center gap-2">
        <button type="button" className={buttonClass('secondary')} onClick={() => setParams({ from: shift(board.from, -7) })}>Week before</button>
        <button type="button" className={buttonClass('secondary')} onClick={() => setParams({})}>From today</button>
        <button type="button" className={buttonClass('secondary')} onClick={() => setParams({ from: shift(board.from, 7) })}>Week after</button>
      </div>
      <Notice tone="caution" title="Loading safely">
        Slabs are heavy and awkward. {lifting({ weightLb: 1 }).basis} Anything heavier than two people should carry goes on a slab cart,
        or is lifted with the forklift or hoist by a trained operator only (certified where local rules require it); keep buyers clear of a raised load.
        Follow your local workplace rules and licensed practice.
      </Notice>
      <Notice tone="caution" title={STAFF_DUST_NOISE_CAUTION.title}>
        Orders marked for flattening are flattened at the mill before pickup. {STAFF_DUST_NOISE_CAUTION.text}
      </Notice>
      {board.dates.map((d) => <DaySection key={d.date} day={d} board={board} />)}
    </div>
  );
}

function DaySection({ day, board }: { day: PickupBoard['dates'][number]; board: PickupBoard }) {
  const weekday = WEEKDAY_NAMES[new Date(`${day.date}T00:00:00Z`).getUTCDay()];
  const count = day.slots.reduce((n, s) => n + s.orders.length, 0);
  return (
    <section aria-labelledby={`day-${day.date}`} className="rounded-lg border border-line bg-surface-raised p-3">
      <h2 id={`day-${day.date}`} className="font-display text-lg font-bold">
        {weekday} {day.date} <span className="text-sm font-normal text-ink-soft">· {count} {count === 1 ? 'order' : 'orders'}</span>
      </h2>
      {day.closed && <p className="mt-1"><Tag tone="caution">Yard closed{day.closedNote ? `: ${day.closedNote}` : ''}</Tag></p>}
      {!day.slots.length && !day.closed && <p className="text-ink-soft">No pickup windows on this day.</p>}
      {day.slots.map((slot) => (
        <div key={slot.window?.id ?? 'none'} className="mt-3">
          <h3 className="font-semibold">
            {slot.window ? formatWindow(slot.window) : 'No window booked'}
            {slot.window && <span className="font-normal text-ink-soft"> · {slot.orders.filter((o) => o.status !== 'no-show').length} of {slot.window.capacity} places</span>}
          </h3>
          {!slot.orders.length ? <p className="text-sm text-ink-soft">Nobody booked.</p> : (
            <ul className="mt-2 flex flex-col gap-2">
              {slot.orders.map((o) => <OrderCard key={o.id} order={o} board={board} />)}
            </ul>
          )}
        </div>
      ))}
    </section>
  );
}

function OrderCard({ order, board }: { order: PickupOrder; board: PickupBoard }) {
  const heavy = order.totalWeightLb > 0 && lifting({ weightLb: Math.min(order.totalWeightLb, 20_000) }).needsEquipment;
  return (
    <li className="flex flex-col gap-2 rounded-md border border-line bg-surface p-3">
      <div className="flex flex-wrap items-center gap-2">
        <Link to={paths.officeOrder(order.id)} className="font-semibold text-accent underline">{order.code}</Link>
        <Tag tone={order.status === 'picked-up' ? 'moss' : order.status === 'no-show' ? 'danger' : 'accent'}>{ORDER_STATUS_LABELS[order.status]}</Tag>
        {order.loadingHelp && <Tag tone="caution">Wants loading help</Tag>}
        {heavy && <Tag tone="danger">Needs a cart or forklift</Tag>}
      </div>
      <p>{order.buyerName} · <a className="underline" href={`mailto:${order.buyerEmail}`}>{order.buyerEmail}</a></p>
      <p className="text-sm">Slabs: {order.slabCodes.join(', ') || '—'} · about <Weight pounds={order.totalWeightLb} /> · longest <Length inches={order.longestSlabIn} /></p>
      {order.pickedUpAt && <p className="text-sm text-ink-soft">Handed over {new Date(order.pickedUpAt).toLocaleString()}</p>}
      <PickupActions order={order} windows={board.windows} noShowRule={board.noShowRule} />
    </li>
  );
}
