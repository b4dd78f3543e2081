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
          // --- yard desk (seller) routes ---
          { path: 'yard/readings', lazy: () => import('./routes/yard-readings') },
          { path: 'yard/slabs/:slabId/photos', lazy: () => import('./routes/yard-slab-photos') },
          { path: 'yard/slabs/:slabId/readings', lazy: () => import('./routes/yard-slab-readings') },
          // --- office (admin) routes ---
          { path: '*', loader: () => { throw new Response('Not found', { status: 404 }); } },
        ],
      },
    ],
  },
]);
