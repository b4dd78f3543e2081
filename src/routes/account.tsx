import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { AccountPage } from '../features/session/components/account-page';

/** Any signed-in person; visitors go to sign-in and come back here afterwards. */
export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request);
  return null;
}

export function Component() {
  return <AccountPage />;
}
