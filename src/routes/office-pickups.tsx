import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { OfficeNav } from '../features/office/components/office-nav';
import { PickupBoardPage } from '../features/office/components/pickup-board-page';
import { pickupsQuery } from '../features/office/api';
import { requireAdmin } from './office-guard';

export async function loader(args: LoaderFunctionArgs) {
  await requireAdmin(args);
  await queryClient.ensureQueryData(pickupsQuery(new URL(args.request.url).searchParams.get('from') ?? undefined, 7));
  return null;
}

export function Component() {
  return (
    <>
      <OfficeNav />
      <PickupBoardPage />
    </>
  );
}
