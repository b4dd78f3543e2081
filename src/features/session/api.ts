import { queryOptions, useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router';
import { apiFetch, ApiError, requestIdOf } from '../../lib/api-client';
import { paths } from '../../paths';
import type { ChangeEmailInput, ChangePasswordInput, ForgotPasswordInput, SignInInput, SignUpInput, UpdateNameInput } from '../../../shared/accounts';
import type { Preferences, PreferencesInput } from '../../../shared/preferences';

export type Role = 'buyer' | 'seller' | 'admin';
export type Me = { id: string; email: string; name: string; role: Role };

export const sessionKeys = { me: ['session', 'me'] as const };

/** The signed-in user, or null for a visitor. */
export const meQuery = () =>
  queryOptions({
    queryKey: sessionKeys.me,
    // Visitors get { user: null } (not a 401), so a signed-out page load logs no error in the console.
    queryFn: async (): Promise<Me | null> => (await apiFetch<{ user: Me | null }>('/api/me')).user,
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
 * POST to the auth library. Its errors come as { code, message } rather than our { error } shape
 * (which its front gate uses for the per-account pause); keep both codes (INVALID_PASSWORD,
 * INVALID_TOKEN, BANNED_USER, account_paused…) so the screens can react to them.
 */
async function authPost<T = unknown>(path: string, body: object): Promise<T> {
  const res = await fetch(`${AUTH}${path}`, {
    method: 'POST',
    credentials: 'same-origin',
    headers: { Accept: 'application/json', 'Content-Type': 'application/json' },
    body: JSON.stringify(body),
  });
  const data = await res.json().catch(() => null);
  if (!res.ok) {
    const ours = data?.error;
    throw new ApiError(res.status, ours?.code ?? data?.code ?? 'error', ours?.message ?? data?.message ?? res.statusText, ours?.fieldErrors ?? {}, requestIdOf(res));
  }
  return data as T;
}

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
    mutationFn: (input: SignInInput) => authPost('/sign-in/email', { ...input, rememberMe: true }),
    onSuccess: () => switchedUser(queryClient),
  });
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    // Only name, e-mail and password are sent: the role is never the visitor's choice.
    mutationFn: ({ name, email, password }: SignUpInput) => authPost('/sign-up/email', { name, email, password }),
    onSuccess: () => switchedUser(queryClient),
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => authPost('/sign-out', {}),
    onSuccess: () => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== sessionKeys.me[0] });
      queryClient.setQueryData(sessionKeys.me, null);
    },
  });
}

export function useChangePassword() {
  return useMutation({
    mutationFn: ({ currentPassword, newPassword }: ChangePasswordInput) =>
      authPost('/change-password', { currentPassword, newPassword, revokeOtherSessions: true }),
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: ({ email }: ForgotPasswordInput) =>
      // The e-mailed link lands on our reset page with ?token=…; the server only accepts our own origin here.
      authPost('/request-password-reset', { email, redirectTo: `${window.location.origin}${paths.resetPassword()}` }),
  });
}

export function useResetPassword() {
  return useMutation({
    mutationFn: ({ token, newPassword }: { token: string; newPassword: string }) =>
      authPost('/reset-password', { token, newPassword }),
  });
}

export function useUpdateName() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ name }: UpdateNameInput) => authPost('/update-user', { name }),
    onSuccess: () => queryClient.fetchQuery({ ...meQuery(), staleTime: 0 }),
  });
}

/** Sends a confirmation link to the new address; the account keeps its old one until it is opened. */
export function useChangeEmail() {
  return useMutation({
    mutationFn: ({ newEmail }: ChangeEmailInput) => authPost('/change-email', { newEmail, callbackURL: `${paths.account()}?email=changed` }),
  });
}

// --- display preferences kept on the account ---

export const preferencesKeys = { mine: ['preferences'] as const };

export const preferencesQuery = () =>
  queryOptions({
    queryKey: preferencesKeys.mine,
    queryFn: () => apiFetch<Preferences>('/api/me/preferences'),
    staleTime: 5 * 60_000,
  });

export function useSavePreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PreferencesInput) => apiFetch<Preferences>('/api/me/preferences', { method: 'PUT', body: input }),
    onMutate: (input) => { queryClient.setQueryData(preferencesKeys.mine, { units: input.units }); },
    onSuccess: (saved) => { queryClient.setQueryData(preferencesKeys.mine, saved); },
  });
}
