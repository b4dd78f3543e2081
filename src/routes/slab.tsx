import type { LoaderFunctionArgs } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { queryClient } from '../lib/query-client';
import { slabDetailQuery } from '../features/catalogue/api';
import { SlabPage } from '../features/catalogue/components/slab-page';
import { FitCheck } from '../features/wood-advice/components/fit-check';
import { FlatteningEstimatePanel } from '../features/wood-advice/components/flattening-estimate';
import { ReserveButton } from '../features/reservations/components/reserve-button';
import { SlabInterest } from '../features/buyer-lists/components/slab-interest';
import { meQuery } from '../features/session/api';
import { Link } from 'react-router';
import { paths } from '../paths';

export async function slabLoader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(slabDetailQuery(Number(params.slabId)));
  return null;
}

function SlabExtras({ slabId }: { slabId: number }) {
  const { data: slab } = useQuery(slabDetailQuery(slabId));
  if (!slab) return null;
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <FitCheck speciesSlug={slab.species.slug} speciesName={slab.species.name} widthIn={slab.widthIn}
        currentMcPercent={slab.weightAtMcPercent} hasReading={slab.moisturePercent !== null} />
      <FlatteningEstimatePanel thicknessIn={slab.thicknessIn} widthIn={slab.widthIn} lengthIn={slab.lengthIn} flatteningPriceCents={slab.flatteningPriceCents} />
    </div>
  );
}

/** Reserve, with the rest of the slab's book-matched set (as the yard marked it) offered when it is for sale too. */
function SlabActions({ slabId }: { slabId: number }) {
  const { data: slab } = useQuery(slabDetailQuery(slabId));
  const { data: me } = useQuery(meQuery());
  if (!slab) return null;
  const partners = (slab.matchedSet?.slabs ?? []).filter((m) => m.id !== slab.id && m.status === 'listed').map((m) => ({ id: m.id, code: m.code }));
  return (
    <>
      <ReserveButton slabId={slab.id} slabCode={slab.code} status={slab.status} setPartners={partners} />
      <SlabInterest slabId={slab.id} code={slab.code} status={slab.status} signedIn={!!me} />
      <StaffLinks slabId={slab.id} />
    </>
  );
}

/** Mill staff looking at the public page can jump to the slab's record, photos and readings. */
function StaffLinks({ slabId }: { slabId: number }) {
  const { data: me } = useQuery(meQuery());
  if (!me || (me.role !== 'seller' && me.role !== 'admin')) return null;
  const link = 'text-accent underline';
  return (
    <p className="flex flex-wrap gap-x-4 text-sm">
      <span className="font-semibold">Yard desk:</span>
      <Link className={link} to={paths.yardSlab(slabId)}>Edit slab</Link>
      <Link className={link} to={paths.yardSlabPhotos(slabId)}>Photos</Link>
      <Link className={link} to={paths.yardSlabReadings(slabId)}>Moisture readings</Link>
    </p>
  );
}

export function SlabRoute() {
  return <SlabPage slots={{ actions: (slabId) => <SlabActions slabId={slabId} />, extras: (slabId) => <SlabExtras slabId={slabId} /> }} />;
}
