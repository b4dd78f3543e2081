import type { ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router';
import { Notice } from '../../../components/ui/notice';
import { PageTitle } from '../../../components/ui/page-title';
import { Tag } from '../../../components/ui/tag';
import { paths } from '../../../paths';
import { ORDER_STATUS_LABELS, type OrderView } from '../../../../shared/checkout';
import { formatCents } from '../../../../shared/wood/index';
import { BoardFeet, Length, Weight } from '../../../lib/units';
import { orderQuery } from '../api';
import { PaymentState } from './payment-state';

/** One order: lines with their price breakdown, pickup details and (through a slot) what to bring. */
export function OrderPage({ bring }: { bring?: (order: OrderView) => ReactNode }) {
  const id = Number(useParams().orderId);
  const { data: order } = useQuery(orderQuery(id));
  if (!order) return null;
  return (
    <article className="flex flex-col gap-5">
      <nav className="text-sm"><Link to={paths.orders()} className="text-accent underline">Your orders</Link> / {order.code}</nav>
      <div className="flex flex-wrap items-center gap-3">
        <PageTitle title={`Order ${order.code}`}>Order {order.code}</PageTitle>
        <Tag tone={order.status === 'paid' ? 'moss' : order.status === 'abandoned' ? 'neutral' : 'accent'}>{ORDER_STATUS_LABELS[order.status]}</Tag>
      </div>
      <PaymentState order={order} />
      {order.refundedCents > 0 && <Notice>Refunded so far: {formatCents(order.refundedCents)}.</Notice>}

      {order.pickup && (
        <section aria-labelledby="pickup-heading" className="rounded-md border border-line bg-surface-raised p-4">
          <h2 id="pickup-heading" className="text-lg font-bold">Pickup</h2>
          <p>{order.pickup.on ? <><strong>{order.pickup.on}</strong>, {order.pickup.startsAt}–{order.pickup.endsAt}</> : 'Not booked'}</p>
          {order.pickup.yardAddress && <p>At the yard: {order.pickup.yardAddress}</p>}
          <p>{order.loadingHelp ? 'The yard crew will help you load.' : 'No loading help asked for.'}</p>
        </section>
      )}

      <section aria-labelledby="lines-heading" className="flex flex-col gap-3">
        <h2 id="lines-heading" className="text-lg font-bold">Slabs</h2>
        {order.lines.map((l) => (
          <div key={l.id} className="rounded-md border border-line p-3">
            <p className="flex flex-wrap justify-between gap-2">
              <Link to={paths.slab(l.slabId)} className="font-semibold text-accent underline">{l.speciesName} slab {l.slabCode}</Link>
              <strong>{formatCents(l.totalCents)}</strong>
            </p>
            <p className="text-sm text-ink-soft"><BoardFeet value={l.boardFeet} /> · <Length inches={l.lengthIn} /> long · about <Weight pounds={l.weightLb} />{l.withFlattening && ' · flattened at the mill'}</p>
            <table className="mt-2 w-full text-sm">
              <caption className="sr-only">Price breakdown for {l.slabCode}</caption>
              <tbody>
                {l.priceLines.map((p, i) => (
                  <tr key={i} className="border-t border-line"><td className="py-1">{p.label}</td><td className="py-1 text-right">{formatCents(p.amountCents)}</td></tr>
                ))}
              </tbody>
            </table>
          </div>
        ))}
        <p className="text-right">Slabs {formatCents(order.slabsCents)}{order.servicesCents > 0 && <> · services {formatCents(order.servicesCents)}</>} · sales tax {formatCents(order.taxCents)} · <strong>Total {formatCents(order.totalCents)}</strong></p>
      </section>
      {bring?.(order)}
    </article>
  );
}
