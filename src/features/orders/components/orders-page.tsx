import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { Notice } from '../../../components/ui/notice';
import { PageTitle } from '../../../components/ui/page-title';
import { Tag } from '../../../components/ui/tag';
import { paths } from '../../../paths';
import { ORDER_STATUS_LABELS } from '../../../../shared/checkout';
import { formatCents } from '../../../../shared/wood/index';
import { myOrdersQuery } from '../api';

export function OrdersPage() {
  const { data: orders = [] } = useQuery(myOrdersQuery());
  return (
    <section className="flex flex-col gap-4">
      <PageTitle>Your orders</PageTitle>
      {orders.length === 0 ? <Notice>No orders yet.</Notice> : (
        <ul className="flex flex-col gap-2">
          {orders.map((o) => (
            <li key={o.id} className="flex flex-wrap items-center justify-between gap-2 rounded-md border border-line bg-surface-raised p-3">
              <div>
                <Link to={paths.order(o.id)} className="font-semibold text-accent underline">Order {o.code}</Link>
                <p className="text-sm text-ink-soft">
                  {o.slabCount} {o.slabCount === 1 ? 'slab' : 'slabs'}
                  {o.pickup?.on && ` · pickup ${o.pickup.on} ${o.pickup.startsAt}–${o.pickup.endsAt}`}
                </p>
              </div>
              <div className="flex items-center gap-3">
                <Tag tone={o.status === 'paid' ? 'moss' : o.status === 'cancelled' || o.status === 'abandoned' ? 'neutral' : 'accent'}>{ORDER_STATUS_LABELS[o.status]}</Tag>
                <strong>{formatCents(o.totalCents)}</strong>
              </div>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
