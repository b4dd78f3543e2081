import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { OfficeNav } from '../features/office/components/office-nav';
import { AuditPage } from '../features/office/components/audit-page';
import { auditQuery } from '../features/office/api';
import { auditFiltersFrom } from '../features/office/components/audit-page';
import { requireAdmin } from './office-guard';

export async function loader(args: LoaderFunctionArgs) {
  await requireAdmin(args);
  await queryClient.ensureQueryData(auditQuery(auditFiltersFrom(new URL(args.request.url).searchParams)));
  return null;
}

export function Component() {
  return (
    <>
      <OfficeNav />
      <AuditPage />
    </>
  );
}
