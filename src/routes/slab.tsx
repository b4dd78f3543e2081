import type { LoaderFunctionArgs } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { queryClient } from '../lib/query-client';
import { slabDetailQuery } from '../features/catalogue/api';
import { SlabPage } from '../features/catalogue/components/slab-page';
import { FitCheck } from '../features/wood-advice/components/fit-check';
import { FlatteningEstimatePanel } from '../features/wood-advice/components/flattening-estimate';

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

export function SlabRoute() {
  return <SlabPage slots={{ extras: (slabId) => <SlabExtras slabId={slabId} /> }} />;
}
