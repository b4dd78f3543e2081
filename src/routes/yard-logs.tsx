import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { logListQuery } from '../features/yard/api';
import { LogList } from '../features/yard/components/log-list';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request, ['seller', 'admin']);
  await queryClient.ensureQueryData(logListQuery());
  return null;
}

export function Component() {
  return <LogList />;
}
