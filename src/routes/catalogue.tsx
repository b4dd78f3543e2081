import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { slabListQuery, speciesQuery } from '../features/catalogue/api';
import { CataloguePage } from '../features/catalogue/components/catalogue-page';

export async function catalogueLoader({ request }: LoaderFunctionArgs) {
  const filters = Object.fromEntries(new URL(request.url).searchParams.entries());
  // A bad filter in a shared URL shows the page with a message instead of an error screen.
  await Promise.allSettled([queryClient.ensureQueryData(slabListQuery(filters)), queryClient.ensureQueryData(speciesQuery())]);
  return null;
}

export function CatalogueRoute() {
  return <CataloguePage />;
}
