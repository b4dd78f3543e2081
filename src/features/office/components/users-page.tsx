import { useQuery } from '@tanstack/react-query';
import { Form, useSearchParams } from 'react-router';
import { PageTitle } from '../../../components/ui/page-title';
import { SelectField, TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Tag } from '../../../components/ui/tag';
import { friendlyMessage } from '../../../lib/api-client';
import { useState } from 'react';
import { USER_ROLE_DESCRIPTIONS as ROLE_MEANS, USER_ROLE_LABELS as ROLE_LABELS, USER_ROLES, type OfficeUser, type UserRole } from '../../../../shared/office';
import { usersQuery, useUpdateUser } from '../api';


export const userFiltersFrom = (params: URLSearchParams) => ({
  q: params.get('q') ?? undefined,
  role: (USER_ROLES as readonly string[]).includes(params.get('role') ?? '') ? (params.get('role') as UserRole) : undefined,
});

export function UsersPage() {
  const [params] = useSearchParams();
  const filters = userFiltersFrom(params);
  const { data } = useQuery(usersQuery(filters));
  const update = useUpdateUser();
  const [saved, setSaved] = useState<string | null>(null);
  const change = (u: OfficeUser, c: { role?: UserRole; disabled?: boolean }) => {
    setSaved(null);
    update.mutate({ id: u.id, ...c }, {
      onSuccess: (after) => setSaved(c.role
        ? `Saved: ${after.name} is now ${ROLE_LABELS[after.role]}.`
        : `Saved: ${after.name} is ${after.disabled ? 'disabled and signed out' : 'able to sign in again'}.`),
    });
  };
  return (
    <div className="flex flex-col gap-4">
      <PageTitle>People</PageTitle>
      <Form method="get" className="grid gap-3 sm:grid-cols-[1fr_14rem_auto] sm:items-end">
        <TextField label="Search by name or e-mail" name="q" defaultValue={filters.q} />
        <SelectField label="Role" name="role" defaultValue={filters.role ?? ''}>
          <option value="">Any</option>
          {USER_ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
        </SelectField>
        <Button type="submit">Find</Button>
      </Form>
      {update.error && <Notice tone="danger" role="alert">{friendlyMessage(update.error)}</Notice>}
      <div role="status" aria-live="polite">{saved && <Notice tone="success">{saved}</Notice>}</div>
      {data && !data.items.length && <p>Nobody matches.</p>}
      <ul className="flex flex-col gap-2">
        {data?.items.map((u) => <UserRow key={u.id} user={u} busy={update.isPending} onChange={(c) => change(u, c)} />)}
      </ul>
    </div>
  );
}

function UserRow({ user, busy, onChange }: { user: OfficeUser; busy: boolean; onChange(c: { role?: UserRole; disabled?: boolean }): void }) {
  return (
    <li className="grid gap-2 rounded-md border border-line bg-surface-raised p-3 sm:grid-cols-[1fr_16rem_auto] sm:items-end">
      <div>
        <p className="font-semibold">{user.name} {user.disabled && <Tag tone="danger">Disabled</Tag>}</p>
        <p className="text-sm text-ink-soft">{user.email} · since {user.createdAt.slice(0, 10)}</p>
      </div>
      <SelectField label={`Role of ${user.name}`} value={user.role} disabled={busy} onChange={(e) => {
          const role = e.target.value as UserRole;
          // The select shows the saved role until the change is confirmed and saved.
          if (!window.confirm(`Make ${user.name} ${ROLE_LABELS[role]}? ${ROLE_MEANS[role]}`)) return;
          onChange({ role });
        }}>
        {USER_ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
      </SelectField>
      <label className="flex min-h-11 items-center gap-2">
        <input type="checkbox" className="size-5" checked={user.disabled} disabled={busy}
          onChange={(e) => {
            if (e.target.checked && !window.confirm(`Disable ${user.name}? They are signed out at once and cannot sign in.`)) return;
            onChange({ disabled: e.target.checked });
          }} />
        Disabled
      </label>
    </li>
  );
}
