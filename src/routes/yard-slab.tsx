import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { figureKindsQuery, logListQuery, yardSlabQuery } from '../features/yard/api';
import { SlabForm } from '../features/yard/components/slab-form';
import { FigureKindAdder } from '../features/yard/components/figure-kind-adder';
import { DeleteRecord } from '../features/yard/components/delete-record';
import { Notice } from '../components/ui/notice';
import { PageTitle } from '../components/ui/page-title';
import { paths } from '../paths';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request, ['seller', 'admin']);
  await Promise.all([
    queryClient.ensureQueryData(yardSlabQuery(Number(params.slabId))),
    queryClient.ensureQueryData(logListQuery()), queryClient.ensureQueryData(figureKindsQuery()),
  ]);
  return null;
}

export function Component() {
  const id = Number(useParams().slabId);
  const { data: slab } = useQuery(yardSlabQuery(id));
  const [saved, setSaved] = useState(false);
  const navigate = useNavigate();
  if (!slab) return null;
  // Only a slab no buyer ever saw may go; the server checks its whole history again.
  const deletable = ['drying', 'ready', 'withdrawn'].includes(slab.status) && !slab.listedAt;
  return (
    <div className="mx-auto grid max-w-4xl gap-4">
      <nav aria-label="Slab pages" className="flex flex-wrap gap-4">
        <Link to={paths.yardLog(slab.logId)} className="text-accent underline">← Log {slab.logCode}</Link>
        <Link to={paths.yardSlabPhotos(id)} className="text-accent underline">Photos ({slab.photoCount})</Link>
        <Link to={paths.yardSlabReadings(id)} className="text-accent underline">Moisture readings{slab.lastReadingOn ? ` (last ${slab.lastReadingOn})` : ' (none)'}</Link>
        <Link to={paths.yardLabels([id])} className="text-accent underline">Print label</Link>
        <Link to={paths.slab(id)} className="text-accent underline">Public page</Link>
      </nav>
      <PageTitle title={`Slab ${slab.code}`}>Slab {slab.code}</PageTitle>
      {saved && <Notice tone="success" role="status">Saved.</Notice>}
      {/* key: a saved slab comes back with recomputed values; start the form again from them */}
      <SlabForm key={slab.updatedAt} slab={slab} onSaved={() => setSaved(true)} />
      <FigureKindAdder />
      {deletable && (
        <DeleteRecord kind="slab" id={id} code={slab.code}
          onDeleted={(code) => navigate(paths.yardLog(slab.logId), { state: { notice: `Slab ${code} was deleted.` } })} />
      )}
    </div>
  );
}
