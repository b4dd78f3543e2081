import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { ApiError } from '../lib/api-client';
import { paths } from '../paths';
import { PageTitle } from '../components/ui/page-title';

const MESSAGES: Record<number, [string, string]> = {
  401: ['Please sign in', 'This page is for signed-in customers and staff.'],
  403: ['Not for this account', 'Your account cannot open this page. If you work at the mill, ask an admin to change your role.'],
  404: ['Not found', 'We could not find that page or slab. It may have been sold and collected, or withdrawn.'],
  409: ['Someone got there first', 'That slab was just reserved or bought by someone else.'],
};

/** Friendly page for thrown route errors (401/403/404/409 and anything unexpected). */
export function RouteError() {
  const error = useRouteError();
  const status = isRouteErrorResponse(error) ? error.status : error instanceof ApiError ? error.status : 500;
  const [title, text] = MESSAGES[status] ?? ['Something went wrong', 'Please try again in a moment.'];
  const requestId = error instanceof ApiError ? error.requestId : undefined;
  return (
    <div className="mx-auto flex max-w-xl flex-col gap-3 py-10">
      <PageTitle>{title}</PageTitle>
      <p>{text}</p>
      {requestId && (
        <p className="text-sm text-ink-soft">
          If you contact the mill about this, quote reference <strong className="font-mono text-ink">{requestId}</strong>.
        </p>
      )}
      <p className="flex gap-4">
        <Link to={paths.catalogue()} className="text-accent underline">Back to the slabs</Link>
        {status === 401 && <Link to={paths.signIn()} className="text-accent underline">Sign in</Link>}
      </p>
    </div>
  );
}
