import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { slabReadingsQuery } from '../features/yard-readings/api';
import { SlabReadingsPanel } from '../features/yard-readings/components/slab-readings-panel';
import { PageTitle } from '../components/ui/page-title';
import { paths } from '../paths';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request, ['seller', 'admin']);
  await queryClient.ensureQueryData(slabReadingsQuery(Number(params.slabId)));
  return null;
}

export function Component() {
  const slabId = Number(useParams().slabId);
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-4">
      <nav className="flex flex-wrap gap-4">
        <Link to={paths.yardSlab(slabId)} className="text-accent underline-offset-4 hover:underline">← Slab record</Link>
        <Link to={paths.yardReadings()} className="text-accent underline-offset-4 hover:underline">Moisture round for many slabs</Link>
      </nav>
      <PageTitle>Slab moisture</PageTitle>
      <SlabReadingsPanel slabId={slabId} />
    </div>
  );
}
