import { queryOptions, useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router';
import { apiFetch, ApiError } from '../../lib/api-client';
import { paths } from '../../paths';
import type { ChangePasswordInput, ForgotPasswordInput, SignInInput, SignUpInput } from '../../../shared/accounts';

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

// --- sign-in, sign-up, sign-out and passwords (the auth library's endpoints under /api/auth) ---

const AUTH = '/api/auth';

/**
 * After the signed-in person changes, forget everything cached for the previous one (holds,
 * orders, back-office lists) and load the new "me" so the header's links follow at once.
 */
async function switchedUser(queryClient: QueryClient) {
  queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== sessionKeys.me[0] });
  await queryClient.fetchQuery({ ...meQuery(), staleTime: 0 });
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SignInInput) => apiFetch(`${AUTH}/sign-in/email`, { method: 'POST', body: { ...input, rememberMe: true } }),
    onSuccess: () => switchedUser(queryClient),
  });
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    // Only name, e-mail and password are sent: the role is never the visitor's choice.
    mutationFn: ({ name, email, password }: SignUpInput) => apiFetch(`${AUTH}/sign-up/email`, { method: 'POST', body: { name, email, password } }),
    onSuccess: () => switchedUser(queryClient),
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch(`${AUTH}/sign-out`, { method: 'POST', body: {} }),
    onSuccess: () => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== sessionKeys.me[0] });
      queryClient.setQueryData(sessionKeys.me, null);
    },
  });
}

export function useChangePassword() {
  return useMutation({
    mutationFn: ({ currentPassword, newPassword }: ChangePasswordInput) =>
      apiFetch(`${AUTH}/change-password`, { method: 'POST', body: { currentPassword, newPassword, revokeOtherSessions: true } }),
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: ({ email }: ForgotPasswordInput) =>
      apiFetch(`${AUTH}/request-password-reset`, {
        method: 'POST',
        // The e-mailed link lands on our reset page with ?token=…; the server only accepts our own origin here.
        body: { email, redirectTo: `${window.location.origin}${paths.resetPassword()}` },
      }),
  });
}

export function useResetPassword() {
  return useMutation({
    mutationFn: ({ token, newPassword }: { token: string; newPassword: string }) =>
      apiFetch(`${AUTH}/reset-password`, { method: 'POST', body: { token, newPassword } }),
  });
}
