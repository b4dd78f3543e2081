import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { OfficeNav } from '../features/office/components/office-nav';
import { OrderPage } from '../features/office/components/order-page';
import { orderQuery } from '../features/office/api';
import { requireAdmin } from './office-guard';

export async function loader(args: LoaderFunctionArgs) {
  await requireAdmin(args);
  await queryClient.ensureQueryData(orderQuery(Number(args.params.orderId)));
  return null;
}

export function Component() {
  return (
    <>
      <OfficeNav />
      <OrderPage />
    </>
  );
}
