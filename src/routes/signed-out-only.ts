import { redirect, type LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { meQuery } from '../features/session/api';
import { paths } from '../paths';
import { safeNextPath } from '../../shared/accounts';

/** Sign-in and sign-up pages send someone already signed in straight on to where they were going. */
export async function signedOutOnlyLoader({ request }: LoaderFunctionArgs) {
  const me = await queryClient.ensureQueryData(meQuery());
  if (me) throw redirect(safeNextPath(new URL(request.url).searchParams.get('next'), paths.catalogue()));
  return null;
}
