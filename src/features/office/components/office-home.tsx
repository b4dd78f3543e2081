import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { PageTitle } from '../../../components/ui/page-title';
import { paths } from '../../../paths';
import { holdsQuery, pickupsQuery } from '../api';

const CARDS = [
  { to: paths.officePickups(), title: 'Pickup board', text: 'Who comes to the yard today and this week; hand over, mark no-shows, move pickups.' },
  { to: paths.officeOrders(), title: 'Orders', text: 'Find an order, see its payments and refunds, and refund money.' },
  { to: paths.officeHolds(), title: 'Holds', text: 'Slabs buyers are holding, and when each hold ends.' },
  { to: paths.officeUsers(), title: 'People', text: 'Roles and access for buyers, mill staff and the office.' },
  { to: paths.officeAudit(), title: 'Change log', text: 'Who changed money, orders and roles, and when.' },
  { to: paths.officeNumbers(), title: 'Numbers', text: 'Board feet and revenue by month and species; stock by state.' },
];

export function OfficeHome() {
  const { data: board } = useQuery(pickupsQuery(undefined, 1));
  const { data: holds } = useQuery(holdsQuery());
  const today = board?.dates[0];
  const waiting = today?.slots.flatMap((s) => s.orders).filter((o) => o.status === 'paid').length ?? 0;
  return (
    <div className="flex flex-col gap-4">
      <PageTitle>Office</PageTitle>
      <p className="text-lg" role="status">
        {board ? `Today: ${waiting} ${waiting === 1 ? 'order' : 'orders'} still to be collected` : 'Loading today…'}
        {holds ? ` · ${holds.items.length} ${holds.items.length === 1 ? 'slab' : 'slabs'} on hold` : ''}
        {today?.closed ? ' · the yard is closed today' : ''}
      </p>
      <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        {CARDS.map((c) => (
          <li key={c.to}>
            <Link to={c.to} className="block h-full rounded-lg border border-line bg-surface-raised p-4 hover:border-accent focus-visible:border-accent">
              <span className="font-display text-lg font-bold text-accent-strong">{c.title}</span>
              <span className="mt-1 block text-ink-soft">{c.text}</span>
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
