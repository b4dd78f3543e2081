import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { OfficeNav } from '../features/office/components/office-nav';
import { NumbersPage } from '../features/office/components/numbers-page';
import { numbersQuery } from '../features/office/api';
import { requireAdmin } from './office-guard';

export async function loader(args: LoaderFunctionArgs) {
  await requireAdmin(args);
  await queryClient.ensureQueryData(numbersQuery());
  return null;
}

export function Component() {
  return (
    <>
      <OfficeNav />
      <NumbersPage />
    </>
  );
}
