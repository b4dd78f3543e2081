import { NavLink } from 'react-router';
import { paths } from '../../../paths';

const LINKS = [
  { to: paths.office(), label: 'Overview', end: true },
  { to: paths.officePickups(), label: 'Pickups' },
  { to: paths.officeOrders(), label: 'Orders' },
  { to: paths.officeHolds(), label: 'Holds' },
  { to: paths.officeUsers(), label: 'People' },
  { to: paths.officeAudit(), label: 'Change log' },
  { to: paths.officeNumbers(), label: 'Numbers' },
  { to: paths.officeSettings(), label: 'Pickup settings' },
  { to: paths.officeRules(), label: 'Prices and rules' },
];

const cls = ({ isActive }: { isActive: boolean }) =>
  `inline-flex min-h-11 items-center rounded-md border px-3 text-sm font-semibold ${isActive ? 'border-accent bg-accent-soft text-accent-strong' : 'border-line bg-surface-raised text-ink hover:bg-surface-sunk'}`;

/** The office's own row of links, shown on every office page. */
export function OfficeNav() {
  return (
    <nav aria-label="Office" className="mb-4 overflow-x-auto">
      <ul className="flex flex-wrap gap-2">
        {LINKS.map((l) => <li key={l.to}><NavLink to={l.to} end={l.end} className={cls}>{l.label}</NavLink></li>)}
      </ul>
    </nav>
  );
}
