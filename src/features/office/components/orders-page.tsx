import { useQuery } from '@tanstack/react-query';
import { Form, Link, useSearchParams } from 'react-router';
import { PageTitle } from '../../../components/ui/page-title';
import { SelectField, TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { Tag } from '../../../components/ui/tag';
import { paths } from '../../../paths';
import { formatCents } from '../../../../shared/wood/index';
import { ORDER_STATUSES, isAttempt, type OrderStatus } from '../../../../shared/office';
import { ordersQuery } from '../api';
import { ORDER_STATUS_LABELS } from '../../../../shared/office';

export const orderFiltersFrom = (params: URLSearchParams) => ({
  q: params.get('q') ?? undefined,
  status: (ORDER_STATUSES as readonly string[]).includes(params.get('status') ?? '') ? (params.get('status') as OrderStatus) : undefined,
});

export function OrdersPage() {
  const [params] = useSearchParams();
  const filters = orderFiltersFrom(params);
  const { data } = useQuery(ordersQuery(filters));
  return (
    <div className="flex flex-col gap-4">
      <PageTitle>Orders</PageTitle>
      <Form method="get" className="grid gap-3 sm:grid-cols-[1fr_14rem_auto] sm:items-end">
        <TextField label="Search" name="q" defaultValue={filters.q} hint="Order code, buyer name or e-mail, or slab code" />
        <SelectField label="State" name="status" defaultValue={filters.status ?? ''}>
          <option value="">Any order (paid at some point)</option>
          <optgroup label="Orders">
            {ORDER_STATUSES.filter((s) => !isAttempt(s)).map((s) => <option key={s} value={s}>{ORDER_STATUS_LABELS[s]}</option>)}
          </optgroup>
          <optgroup label="Payment attempts (not orders)">
            {ORDER_STATUSES.filter(isAttempt).map((s) => <option key={s} value={s}>{ORDER_STATUS_LABELS[s]}</option>)}
          </optgroup>
        </SelectField>
        <Button type="submit">Show</Button>
      </Form>
      {data && !data.items.length && <p>No orders match.</p>}
      <ul className="flex flex-col gap-2">
        {data?.items.map((o) => (
          <li key={o.id} className="grid gap-1 rounded-md border border-line bg-surface-raised p-3 sm:grid-cols-[10rem_1fr_auto] sm:items-center">
            <Link to={paths.officeOrder(o.id)} className="font-semibold text-accent underline">{o.code}</Link>
            <span>{o.buyerName} <span className="text-ink-soft">· {o.slabCodes.join(', ') || 'no slabs left'}{o.pickupOn ? ` · pickup ${o.pickupOn}` : ''}</span></span>
            <span className="flex flex-wrap items-center gap-2">
              <Tag tone={o.status === 'refunded' || o.status === 'no-show' ? 'caution' : o.status === 'picked-up' ? 'moss' : 'neutral'}>{ORDER_STATUS_LABELS[o.status]}</Tag>
              <span className="font-semibold">{formatCents(o.totalCents)}</span>
              {o.refundedCents > 0 && <span className="text-sm text-ink-soft">({formatCents(o.refundedCents)} refunded)</span>}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
