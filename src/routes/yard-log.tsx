import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { logDetailQuery } from '../features/yard/api';
import { LogPage } from '../features/yard/components/log-page';
import { paths } from '../paths';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request, ['seller', 'admin']);
  await queryClient.ensureQueryData(logDetailQuery(Number(params.logId)));
  return null;
}

export function Component() {
  const id = Number(useParams().logId);
  return (
    <div className="grid gap-4">
      <Link to={paths.yardLogs()} className="text-accent underline">← Log book</Link>
      <LogPage id={id} />
    </div>
  );
}
