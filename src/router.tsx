import { createBrowserRouter } from 'react-router';
import { RootLayout } from './routes/root-layout';
import { RouteError } from './routes/route-error';
import { CatalogueRoute, catalogueLoader } from './routes/catalogue';
import { SlabRoute, slabLoader } from './routes/slab';

/**
 * The one router. Public pages load eagerly; account, yard desk and office pages are split
 * into their own chunks with `lazy` so buyers do not download the back office.
 */
export const router = createBrowserRouter([
  {
    path: '/',
    element: <RootLayout />,
    errorElement: <RootLayout />,
    // Shown while the first page's loaders run (no server rendering here).
    hydrateFallbackElement: <p className="p-6 text-ink-soft">Opening the yard…</p>,
    children: [
      {
        errorElement: <RouteError />,
        children: [
          { index: true, loader: catalogueLoader, element: <CatalogueRoute /> },
          { path: 'slabs/:slabId', loader: slabLoader, element: <SlabRoute /> },
          // --- buyer account routes (sign-in, holds, checkout, orders) ---
          { path: 'sign-in', lazy: () => import('./routes/sign-in') },
          { path: 'sign-up', lazy: () => import('./routes/sign-up') },
          { path: 'forgot-password', lazy: () => import('./routes/forgot-password') },
          { path: 'reset-password', lazy: () => import('./routes/reset-password') },
          { path: 'account', lazy: () => import('./routes/account') },
          { path: 'reservations', lazy: () => import('./routes/reservations') },
          { path: 'saved', lazy: () => import('./routes/saved') },
          { path: 'compare', lazy: () => import('./routes/compare') },
          { path: 'checkout', lazy: () => import('./routes/checkout') },
          { path: 'orders', lazy: () => import('./routes/orders') },
          { path: 'orders/:orderId', lazy: () => import('./routes/order') },
          // --- yard desk (seller) routes ---
          { path: 'yard', lazy: () => import('./routes/yard-overview') },
          { path: 'yard/slabs', lazy: () => import('./routes/yard-overview') },
          { path: 'yard/logs', lazy: () => import('./routes/yard-logs') },
          { path: 'yard/logs/new', lazy: () => import('./routes/yard-log-new') },
          { path: 'yard/logs/:logId', lazy: () => import('./routes/yard-log') },
          { path: 'yard/slabs/new', lazy: () => import('./routes/yard-slab-new') },
          { path: 'yard/slabs/:slabId', lazy: () => import('./routes/yard-slab') },
          { path: 'yard/labels', lazy: () => import('./routes/yard-labels') },
          { path: 'yard/readings', lazy: () => import('./routes/yard-readings') },
          { path: 'yard/slabs/:slabId/photos', lazy: () => import('./routes/yard-slab-photos') },
          { path: 'yard/slabs/:slabId/readings', lazy: () => import('./routes/yard-slab-readings') },
          // --- office (admin) routes ---
          { path: 'office', lazy: () => import('./routes/office-home') },
          { path: 'office/pickups', lazy: () => import('./routes/office-pickups') },
          { path: 'office/orders', lazy: () => import('./routes/office-orders') },
          { path: 'office/orders/:orderId', lazy: () => import('./routes/office-order') },
          { path: 'office/holds', lazy: () => import('./routes/office-holds') },
          { path: 'office/users', lazy: () => import('./routes/office-users') },
          { path: 'office/audit', lazy: () => import('./routes/office-audit') },
          { path: 'office/numbers', lazy: () => import('./routes/office-numbers') },
          { path: 'office/settings', lazy: () => import('./routes/office-settings') },
          { path: 'office/rules', lazy: () => import('./routes/office-rules') },
          { path: '*', loader: () => { throw new Response('Not found', { status: 404 }); } },
        ],
      },
    ],
  },
]);
