import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { inventoryQuery } from '../features/yard/api';
import { YardOverview } from '../features/yard/components/yard-overview';

const filtersOf = (params: URLSearchParams) => Object.fromEntries(params.entries());

/** Yard desk front page and inventory (/yard and /yard/slabs); filters live in the URL. */
export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request, ['seller', 'admin']);
  await queryClient.ensureQueryData(inventoryQuery(filtersOf(new URL(request.url).searchParams)));
  return null;
}

export function Component() {
  const [params, setParams] = useSearchParams();
  return <YardOverview filters={filtersOf(params)} onFiltersChange={(next) => setParams(next)} />;
}
