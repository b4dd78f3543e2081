import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { OfficeNav } from '../features/office/components/office-nav';
import { UsersPage } from '../features/office/components/users-page';
import { usersQuery } from '../features/office/api';
import { userFiltersFrom } from '../features/office/components/users-page';
import { requireAdmin } from './office-guard';

export async function loader(args: LoaderFunctionArgs) {
  await requireAdmin(args);
  await queryClient.ensureQueryData(usersQuery(userFiltersFrom(new URL(args.request.url).searchParams)));
  return null;
}

export function Component() {
  return (
    <>
      <OfficeNav />
      <UsersPage />
    </>
  );
}
