import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { OfficeNav } from '../features/office/components/office-nav';
import { OfficeHome } from '../features/office/components/office-home';
import { pickupsQuery } from '../features/office/api';
import { requireAdmin } from './office-guard';

export async function loader(args: LoaderFunctionArgs) {
  await requireAdmin(args);
  await queryClient.ensureQueryData(pickupsQuery(undefined, 1));
  return null;
}

export function Component() {
  return (
    <>
      <OfficeNav />
      <OfficeHome />
    </>
  );
}
