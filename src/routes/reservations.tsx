import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { myHoldsQuery } from '../features/reservations/api';
import { ReservationsPage } from '../features/reservations/components/reservations-page';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request);
  await queryClient.ensureQueryData(myHoldsQuery());
  return null;
}

export function Component() {
  return <ReservationsPage />;
}
