import { queryOptions, type QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router';
import { apiFetch, ApiError } from '../../lib/api-client';
import { paths } from '../../paths';

export type Role = 'buyer' | 'seller' | 'admin';
export type Me = { id: string; email: string; name: string; role: Role };

export const sessionKeys = { me: ['session', 'me'] as const };

/** The signed-in user, or null for a visitor. */
export const meQuery = () =>
  queryOptions({
    queryKey: sessionKeys.me,
    queryFn: async (): Promise<Me | null> => {
      try {
        return (await apiFetch<{ user: Me }>('/api/me')).user;
      } catch (e) {
        if (e instanceof ApiError && e.status === 401) return null;
        throw e;
      }
    },
    staleTime: 60_000,
  });

/**
 * Route guard for loaders: visitors go to sign-in and come back afterwards; a signed-in user
 * without the role gets a 403 page. The server checks again on every call.
 */
export async function requireRoleLoader(queryClient: QueryClient, request: Request, roles: Role[] = []) {
  const me = await queryClient.ensureQueryData(meQuery());
  if (!me) {
    const url = new URL(request.url);
    throw redirect(paths.signIn(url.pathname + url.search));
  }
  if (roles.length && !roles.includes(me.role)) {
    throw new Response('Your account cannot open this page.', { status: 403, statusText: 'Forbidden' });
  }
  return me;
}
