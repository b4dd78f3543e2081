import { Link, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { figureKindsQuery, logListQuery } from '../features/yard/api';
import { SlabForm } from '../features/yard/components/slab-form';
import { FigureKindAdder } from '../features/yard/components/figure-kind-adder';
import { PageTitle } from '../components/ui/page-title';
import { paths } from '../paths';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request, ['seller', 'admin']);
  await Promise.all([queryClient.ensureQueryData(logListQuery()), queryClient.ensureQueryData(figureKindsQuery())]);
  return null;
}

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const logId = params.get('logId') ? Number(params.get('logId')) : undefined;
  return (
    <div className="mx-auto grid max-w-4xl gap-4">
      <Link to={logId ? paths.yardLog(logId) : paths.yard()} className="text-accent underline">← {logId ? 'Back to the log' : 'Yard desk'}</Link>
      <PageTitle>Record a slab</PageTitle>
      <SlabForm logId={logId} onSaved={(slab) => navigate(paths.yardSlab(slab.id))} />
      <FigureKindAdder />
    </div>
  );
}
