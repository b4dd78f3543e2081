import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';

/** Every office page: admins only (the server checks again on each call). */
export const requireAdmin = ({ request }: LoaderFunctionArgs) => requireRoleLoader(queryClient, request, ['admin']);
