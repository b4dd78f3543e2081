import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { LabelSheet } from '../features/yard/components/label-sheet';

export async function loader({ request }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request, ['seller', 'admin']);
  return null;
}

const parseIds = (raw: string | null) =>
  [...new Set((raw ?? '').split(',').map(Number).filter((n) => Number.isInteger(n) && n > 0))];

export function Component() {
  const [params] = useSearchParams();
  return <LabelSheet ids={parseIds(params.get('ids'))} />;
}
