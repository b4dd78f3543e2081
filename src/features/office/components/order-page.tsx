import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router';
import { PageTitle } from '../../../components/ui/page-title';
import { Tag } from '../../../components/ui/tag';
import { Notice } from '../../../components/ui/notice';
import { paths } from '../../../paths';
import { formatCents } from '../../../../shared/wood/index';
import { BoardFeet, Length, Weight } from '../../../lib/units';
import { formatWindow } from '../../../../shared/pickups';
import { orderQuery } from '../api';
import { ORDER_STATUS_LABELS } from './order-status';
import { RefundForm } from './refund-form';

const when = (iso: string) => new Date(iso).toLocaleString();
const SLAB_STATE: Record<string, string> = { sold: 'Sold', 'picked-up': 'Collected', listed: 'Back on sale', withdrawn: 'Withdrawn', held: 'On hold' };

export function OrderPage() {
  const id = Number(useParams().orderId);
  const { data: order } = useQuery(orderQuery(id));
  if (!order) return null;
  return (
    <div className="flex flex-col gap-5">
      <p><Link to={paths.officeOrders()} className="text-accent underline">All orders</Link></p>
      <PageTitle title={`Order ${order.code}`}>Order {order.code}</PageTitle>
      <div className="flex flex-wrap gap-2">
        <Tag tone="accent">{ORDER_STATUS_LABELS[order.status]}</Tag>
        {order.loadingHelp && <Tag tone="caution">Wants loading help</Tag>}
        {order.disputed && <Tag tone="danger">Payment disputed</Tag>}
      </div>
      {order.disputed && <Notice tone="danger">The buyer's bank has opened a dispute on this payment. Check with the payment provider before refunding.</Notice>}
      <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[12rem_1fr]">
        <dt className="font-semibold">Buyer</dt><dd>{order.buyerName} · <a className="underline" href={`mailto:${order.buyerEmail}`}>{order.buyerEmail}</a></dd>
        <dt className="font-semibold">Pickup</dt><dd>{order.pickupOn ?? 'not booked'}{order.pickupWindow ? `, ${formatWindow(order.pickupWindow)}` : ''}</dd>
        <dt className="font-semibold">Collected</dt><dd>{order.pickedUpAt ? when(order.pickedUpAt) : 'not yet'}</dd>
        <dt className="font-semibold">Load</dt><dd>about <Weight pounds={order.totalWeightLb} />, longest slab <Length inches={order.longestSlabIn} /></dd>
        <dt className="font-semibold">Total</dt><dd>{formatCents(order.totalCents)} (slabs {formatCents(order.slabsCents)}, services {formatCents(order.servicesCents)})</dd>
        <dt className="font-semibold">Refunded</dt><dd>{formatCents(order.refundedCents)}</dd>
      </dl>

      <section aria-labelledby="lines-h">
        <h2 id="lines-h" className="font-display text-lg font-bold">Slabs</h2>
        <ul className="mt-2 flex flex-col gap-1">
          {order.lines.map((l) => (
            <li key={l.id} className="flex flex-wrap gap-2">
              <Link to={paths.slab(l.slabId)} className="font-semibold text-accent underline">{l.slabCode}</Link>
              <span>{l.speciesName}, <BoardFeet value={l.boardFeet} />, {formatCents(l.totalCents)}</span>
              {l.status === 'refunded' ? <Tag tone="caution">Refunded</Tag> : null}
              <span className="text-ink-soft">({SLAB_STATE[l.slabStatus] ?? l.slabStatus})</span>
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="money-h">
        <h2 id="money-h" className="font-display text-lg font-bold">Money in and out</h2>
        <div className="mt-2 overflow-x-auto">
          <table className="w-full min-w-[32rem] text-left text-sm">
            <thead><tr className="border-b border-line"><th className="py-1">When</th><th>What</th><th>Amount</th><th>State</th><th>Reason</th></tr></thead>
            <tbody>
              {order.payments.map((p) => (
                <tr key={p.id} className="border-b border-line/60">
                  <td className="py-1">{when(p.createdAt)}</td>
                  <td>{p.kind === 'refund' ? 'Refund' : 'Payment'}</td>
                  <td>{p.kind === 'refund' ? '−' : ''}{formatCents(p.amountCents)}</td>
                  <td>{p.status}</td>
                  <td>{p.reason}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="refund-h" className="rounded-lg border border-line bg-surface-raised p-4">
        <h2 id="refund-h" className="font-display text-lg font-bold">Refund</h2>
        <RefundForm order={order} />
      </section>
    </div>
  );
}
