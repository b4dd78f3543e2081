import type { LoaderFunctionArgs } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { myHoldsQuery } from '../features/reservations/api';
import { pickupSlotsQuery } from '../features/checkout/api';
import { CheckoutPage } from '../features/checkout/components/checkout-page';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request);
  await Promise.all([queryClient.ensureQueryData(myHoldsQuery()), queryClient.ensureQueryData(pickupSlotsQuery())]);
  return null;
}

/** Checkout pays for the buyer's holds: the reservations feature supplies them. */
export function Component() {
  const { data: holds = [] } = useQuery(myHoldsQuery());
  return <CheckoutPage holds={holds} />;
}
