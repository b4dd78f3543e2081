import type { LoaderFunctionArgs } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { queryClient } from '../lib/query-client';
import { PageTitle } from '../components/ui/page-title';
import { OfficeNav } from '../features/office/components/office-nav';
import { pickupSettingsQuery } from '../features/pickup-settings/api';
import { PickupSettingsForm } from '../features/pickup-settings/components/pickup-settings-form';
import { requireAdmin } from './office-guard';

export async function loader(args: LoaderFunctionArgs) {
  await requireAdmin(args);
  await queryClient.ensureQueryData(pickupSettingsQuery());
  return null;
}

export function Component() {
  const { data } = useQuery(pickupSettingsQuery());
  return (
    <>
      <OfficeNav />
      <section className="flex flex-col gap-4">
        <PageTitle>Pickup settings</PageTitle>
        {data && <PickupSettingsForm initial={data} />}
      </section>
    </>
  );
}
