import { useQuery } from '@tanstack/react-query';
import { Form, Link, useSearchParams } from 'react-router';
import { PageTitle } from '../../../components/ui/page-title';
import { SelectField, TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { paths } from '../../../paths';
import { auditQuery, type AuditFilters } from '../api';
import { AUDIT_ACTION_LABELS, AUDIT_SUBJECT_LABELS, type AuditTarget } from '../../../../shared/office';

/** Filters live in the URL, so a filtered view can be bookmarked or sent to a colleague. */
export function auditFiltersFrom(params: URLSearchParams): AuditFilters {
  const get = (k: string) => params.get(k) || undefined;
  const page = Number(params.get('page'));
  return { actor: get('actor'), action: get('action'), entityType: get('entityType'), from: get('from'), to: get('to'), page: Number.isInteger(page) && page > 1 ? page : undefined };
}

const targetPath = (link: AuditTarget['link']) => {
  if (!link) return null;
  if (link.kind === 'slab') return paths.slab(link.id);
  if (link.kind === 'log') return paths.yardLog(link.id);
  return paths.officeOrder(link.id);
};

export function AuditPage() {
  const [params] = useSearchParams();
  const filters = auditFiltersFrom(params);
  const { data } = useQuery(auditQuery(filters));
  const page = data?.page ?? 1;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const pageLink = (p: number) => paths.officeAudit({ ...filters, page: p });
  return (
    <div className="flex flex-col gap-4">
      <PageTitle>Change log</PageTitle>
      <p className="text-ink-soft">Every change to logs, slabs, photos, readings, prices, holds, orders and accounts, newest first. Times are the mill's.</p>
      <Form method="get" className="grid gap-3 sm:grid-cols-3 lg:grid-cols-6 lg:items-end">
        <TextField label="Who (e-mail)" name="actor" defaultValue={filters.actor} />
        <SelectField label="What" name="action" defaultValue={filters.action ?? ''}>
          <option value="">Anything</option>
          {data?.actions.map((a) => <option key={a} value={a}>{AUDIT_ACTION_LABELS[a] ?? a.replace(/[.-]/g, ' ')}</option>)}
        </SelectField>
        <SelectField label="On" name="entityType" defaultValue={filters.entityType ?? ''}>
          <option value="">Any kind</option>
          {data?.entityTypes.map((a) => <option key={a} value={a}>{AUDIT_SUBJECT_LABELS[a] ?? a.replace(/[_-]/g, ' ')}</option>)}
        </SelectField>
        <TextField label="From" type="date" name="from" defaultValue={filters.from} />
        <TextField label="To" type="date" name="to" defaultValue={filters.to} />
        <Button type="submit">Filter</Button>
      </Form>
      <p role="status">{data ? `${data.total} ${data.total === 1 ? 'entry' : 'entries'}` : 'Loading…'}</p>
      <ol className="flex flex-col gap-2">
        {data?.items.map((e) => (
          <li key={e.id} className="rounded-md border border-line bg-surface-raised p-3 text-sm">
            <p>
              <span className="font-semibold">{e.who}</span> · {e.what} · on{' '}
              {(() => { const to = targetPath(e.on.link); return to ? <Link to={to} className="text-accent underline">{e.on.label}</Link> : e.on.label; })()}
            </p>
            <p className="text-ink-soft"><time dateTime={e.createdAt}>{e.whenAtMill}</time></p>
          </li>
        ))}
      </ol>
      <nav aria-label="Pages" className="flex gap-4">
        {page > 1 && <Link to={pageLink(page - 1)} className="text-accent underline">Newer</Link>}
        <span>Page {page} of {pages}</span>
        {page < pages && <Link to={pageLink(page + 1)} className="text-accent underline">Older</Link>}
      </nav>
    </div>
  );
}
