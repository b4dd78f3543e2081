import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { slabPhotosQuery } from '../features/yard-photos/api';
import { PhotoManager } from '../features/yard-photos/components/photo-manager';
import { PageTitle } from '../components/ui/page-title';
import { paths } from '../paths';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request, ['seller', 'admin']);
  await queryClient.ensureQueryData(slabPhotosQuery(Number(params.slabId)));
  return null;
}

export function Component() {
  const slabId = Number(useParams().slabId);
  return (
    <div className="mx-auto flex max-w-5xl flex-col gap-4">
      <nav className="flex flex-wrap gap-4">
        <Link to={paths.yardSlab(slabId)} className="text-accent underline-offset-4 hover:underline">← Slab record</Link>
        <Link to={paths.slab(slabId)} className="text-accent underline-offset-4 hover:underline">Public slab page</Link>
      </nav>
      <PageTitle>Slab photos</PageTitle>
      <PhotoManager slabId={slabId} />
    </div>
  );
}
