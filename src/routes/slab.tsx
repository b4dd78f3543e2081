import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { slabDetailQuery } from '../features/catalogue/api';
import { SlabPage } from '../features/catalogue/components/slab-page';

export async function slabLoader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(slabDetailQuery(Number(params.slabId)));
  return null;
}

export function SlabRoute() {
  return <SlabPage />;
}
