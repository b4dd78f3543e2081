import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { OfficeNav } from '../features/office/components/office-nav';
import { HoldsPage } from '../features/office/components/holds-page';
import { holdsQuery } from '../features/office/api';
import { requireAdmin } from './office-guard';

export async function loader(args: LoaderFunctionArgs) {
  await requireAdmin(args);
  await queryClient.ensureQueryData(holdsQuery());
  return null;
}

export function Component() {
  return (
    <>
      <OfficeNav />
      <HoldsPage />
    </>
  );
}
