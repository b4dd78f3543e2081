import type { LoaderFunctionArgs } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { queryClient } from '../lib/query-client';
import { PageTitle } from '../components/ui/page-title';
import { OfficeNav } from '../features/office/components/office-nav';
import { millRulesQuery } from '../features/mill-rules/api';
import { MillRulesForm } from '../features/mill-rules/components/mill-rules-form';
import { requireAdmin } from './office-guard';

export async function loader(args: LoaderFunctionArgs) {
  await requireAdmin(args);
  await queryClient.ensureQueryData(millRulesQuery());
  return null;
}

export function Component() {
  const { data } = useQuery(millRulesQuery());
  return (
    <>
      <OfficeNav />
      <section className="flex flex-col gap-4">
        <PageTitle>Prices and rules</PageTitle>
        {data && <MillRulesForm initial={data} />}
      </section>
    </>
  );
}
