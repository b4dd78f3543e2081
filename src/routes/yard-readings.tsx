import { Link, type LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { BatchReadings } from '../features/yard-readings/components/batch-readings';
import { PageTitle } from '../components/ui/page-title';
import { paths } from '../paths';

/** Mill staff only; the server checks the role again on every call. */
export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request, ['seller', 'admin']);
  return null;
}

export function Component() {
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-4">
      <Link to={paths.yard()} className="text-accent underline-offset-4 hover:underline">← Yard desk</Link>
      <PageTitle>Moisture round</PageTitle>
      <p className="text-ink-soft">
        Walk the stacks and enter each slab's code and meter reading. Everything is saved together when you press save,
        or nothing is if a row needs fixing.
      </p>
      <BatchReadings />
    </div>
  );
}
