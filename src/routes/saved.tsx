import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { savedSlabsQuery } from '../features/buyer-lists/api';
import { SavedSlabsPage } from '../features/buyer-lists/components/saved-slabs-page';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request);
  await queryClient.ensureQueryData(savedSlabsQuery());
  return null;
}

export function Component() {
  return <SavedSlabsPage />;
}
