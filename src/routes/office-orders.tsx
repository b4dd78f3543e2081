import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { OfficeNav } from '../features/office/components/office-nav';
import { OrdersPage } from '../features/office/components/orders-page';
import { ordersQuery } from '../features/office/api';
import { orderFiltersFrom } from '../features/office/components/orders-page';
import { requireAdmin } from './office-guard';

export async function loader(args: LoaderFunctionArgs) {
  await requireAdmin(args);
  await queryClient.ensureQueryData(ordersQuery(orderFiltersFrom(new URL(args.request.url).searchParams)));
  return null;
}

export function Component() {
  return (
    <>
      <OfficeNav />
      <OrdersPage />
    </>
  );
}
