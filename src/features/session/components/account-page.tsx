import { useQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router';
import { paths } from '../../../paths';
import { PageTitle } from '../../../components/ui/page-title';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Tag } from '../../../components/ui/tag';
import { friendlyMessage } from '../../../lib/api-client';
import { meQuery, useSignOut, type Role } from '../api';
import { ChangePasswordForm } from './change-password-form';
import { ChangeEmailForm, ChangeNameForm } from './own-details-forms';
import { useSearchParams } from 'react-router';

const ROLE_WORDS: Record<Role, { label: string; text: string }> = {
  buyer: { label: 'Customer', text: 'You can hold slabs, pay and book a pickup.' },
  seller: { label: 'Mill staff', text: 'You can also record logs, slabs, photos and moisture readings at the yard desk.' },
  admin: { label: 'Admin', text: 'You can also run pickups, refunds, holds and people’s roles in the office.' },
};

export function AccountPage() {
  const { data: me } = useQuery(meQuery());
  const signOut = useSignOut();
  const navigate = useNavigate();
  const [search] = useSearchParams();
  if (!me) return null;
  // The confirmation link for a new e-mail comes back here, with an error when it was stale or not theirs.
  const emailChanged = search.get('email') === 'changed' && !search.get('error');
  const emailLinkFailed = search.get('email') === 'changed' && !!search.get('error');
  const role = ROLE_WORDS[me.role];

  return (
    <div className="mx-auto flex w-full max-w-2xl flex-col gap-6">
      <PageTitle>Your account</PageTitle>
      {emailChanged && <Notice tone="success" role="status">Your new e-mail is confirmed: {me.email}.</Notice>}
      {emailLinkFailed && <Notice tone="danger" role="alert">That confirmation link has expired or belongs to another account. Ask for a new one below.</Notice>}
      <section aria-labelledby="about-heading" className="flex flex-col gap-3 rounded-lg border border-line bg-surface-raised p-4 sm:p-6">
        <h2 id="about-heading" className="font-display text-lg font-bold">About you</h2>
        <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-2">
          <dt className="font-semibold text-ink-soft">Name</dt><dd>{me.name}</dd>
          <dt className="font-semibold text-ink-soft">E-mail</dt><dd className="break-all">{me.email}</dd>
          <dt className="font-semibold text-ink-soft">Role</dt><dd><Tag tone={me.role === 'buyer' ? 'neutral' : 'accent'}>{role.label}</Tag></dd>
        </dl>
        <p className="text-sm text-ink-soft">{role.text} Only an admin can change a role.</p>
        {signOut.isError && <Notice tone="danger" role="alert">{friendlyMessage(signOut.error)}</Notice>}
        <div>
          <Button variant="secondary" disabled={signOut.isPending}
            onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate(paths.catalogue(), { replace: true }) })}>
            {signOut.isPending ? 'Signing out…' : 'Sign out'}
          </Button>
        </div>
      </section>
      <section className="rounded-lg border border-line bg-surface-raised p-4 sm:p-6">
        <ChangeNameForm name={me.name} />
      </section>
      <section className="rounded-lg border border-line bg-surface-raised p-4 sm:p-6">
        <ChangeEmailForm email={me.email} />
      </section>
      <section className="rounded-lg border border-line bg-surface-raised p-4 sm:p-6">
        <ChangePasswordForm />
      </section>
    </div>
  );
}
