import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { myOrdersQuery } from '../features/orders/api';
import { OrdersPage } from '../features/orders/components/orders-page';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request);
  await queryClient.ensureQueryData(myOrdersQuery());
  return null;
}

export function Component() {
  return <OrdersPage />;
}
