import { Link, useNavigate, type LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { LogForm } from '../features/yard/components/log-form';
import { PageTitle } from '../components/ui/page-title';
import { paths } from '../paths';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request, ['seller', 'admin']);
  return null;
}

export function Component() {
  const navigate = useNavigate();
  return (
    <div className="mx-auto grid max-w-3xl gap-4">
      <Link to={paths.yardLogs()} className="text-accent underline">← Log book</Link>
      <PageTitle>Record a log</PageTitle>
      <LogForm onSaved={(log) => navigate(paths.yardLog(log.id))} />
    </div>
  );
}
