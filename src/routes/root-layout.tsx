import { useCallback } from 'react';
import { NavLink, Outlet, useNavigation } from 'react-router';
import type { UnitSystem } from '../../shared/wood/index';
import { useQuery } from '@tanstack/react-query';
import { meQuery, preferencesQuery, useSavePreferences, type Role } from '../features/session/api';
import { useCompareList } from '../features/buyer-lists/api';
import { UnitsProvider } from '../lib/units';
import { UnitsSwitch } from '../components/units-switch';
import { paths } from '../paths';

type NavItem = { to: string; label: string; roles?: Role[]; visitorOnly?: boolean; signedIn?: boolean };

// One list decides who sees which link; the server still checks every call.
const NAV: NavItem[] = [
  { to: paths.catalogue(), label: 'Slabs' },
  { to: paths.saved(), label: 'Saved', signedIn: true },
  { to: paths.reservations(), label: 'My holds', signedIn: true },
  { to: paths.orders(), label: 'Orders', signedIn: true },
  { to: paths.yard(), label: 'Yard desk', roles: ['seller', 'admin'] },
  { to: paths.office(), label: 'Office', roles: ['admin'] },
  { to: paths.account(), label: 'Account', signedIn: true },
  { to: paths.signIn(), label: 'Sign in', visitorOnly: true },
];

const linkClass = ({ isActive }: { isActive: boolean }) =>
  `inline-flex min-h-11 items-center rounded-md px-3 font-semibold ${isActive ? 'bg-accent-soft text-accent-strong' : 'text-ink hover:bg-surface-sunk'}`;

export function RootLayout() {
  const { data: me } = useQuery(meQuery());
  const navigation = useNavigation();
  const compare = useCompareList();
  // A signed-in person's units live on their account; a visitor's in this browser.
  const { data: prefs } = useQuery({ ...preferencesQuery(), enabled: !!me });
  const savePrefs = useSavePreferences();
  const { mutate: savePreferences } = savePrefs;
  const saveToAccount = useCallback((units: UnitSystem) => savePreferences({ units }), [savePreferences]);
  const shown = NAV.filter((i) =>
    i.visitorOnly ? !me : i.signedIn ? !!me : i.roles ? !!me && i.roles.includes(me.role) : true,
  );
  // The compare link appears once something is on the list, right after "Slabs".
  const items = compare.ids.length ? [shown[0], { to: paths.compare(), label: `Compare (${compare.ids.length})` }, ...shown.slice(1)] : shown;
  return (
    <UnitsProvider accountUnits={me ? prefs?.units ?? null : null} saveToAccount={me ? saveToAccount : undefined}>
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:bg-surface-raised focus:p-2">Skip to content</a>
      <header className="no-print border-b border-line bg-surface-raised">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center justify-between gap-2 px-4 py-2">
          <NavLink to={paths.catalogue()} className="flex items-center gap-2 py-1" aria-label="Stickerline home">
            <img src="/favicon.svg" alt="" width="32" height="32" />
            <span className="font-display text-xl font-bold text-accent-strong">Stickerline</span>
          </NavLink>
          <div className="flex flex-wrap items-center gap-3">
            <nav aria-label="Main">
              <ul className="flex flex-wrap items-center gap-1">
                {items.map((i) => <li key={i.to}><NavLink to={i.to} end={i.to === '/'} className={linkClass}>{i.label}</NavLink></li>)}
              </ul>
            </nav>
            <UnitsSwitch />
          </div>
        </div>
        {navigation.state === 'loading' && <div className="h-0.5 animate-pulse bg-accent" aria-hidden="true" />}
      </header>
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-6">
        <Outlet />
      </main>
      <footer className="no-print border-t border-line bg-surface-sunk text-sm text-ink-soft">
        <div className="mx-auto max-w-7xl px-4 py-4">
          <p>Slabs are heavy and awkward: plan help for loading. Sanding and flattening make fine wood dust, which is a known health hazard — use dust collection and a fitted respirator, and follow your local rules.</p>
        </div>
      </footer>
    </div>
    </UnitsProvider>
  );
}
