import { Link } from 'react-router';

type Props = { page: number; pageSize: number; total: number; hrefFor: (page: number) => string };

export function Pagination({ page, pageSize, total, hrefFor }: Props) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  if (pages <= 1) return null;
  const link = 'rounded-md border border-line bg-surface-raised px-3 py-2 min-h-11 inline-flex items-center hover:bg-accent-soft';
  return (
    <nav aria-label="Pages" className="flex items-center justify-center gap-3">
      {page > 1 ? <Link className={link} to={hrefFor(page - 1)} rel="prev">← Previous</Link> : <span className={`${link} opacity-40`} aria-hidden="true">← Previous</span>}
      <span>Page {page} of {pages}</span>
      {page < pages ? <Link className={link} to={hrefFor(page + 1)} rel="next">Next →</Link> : <span className={`${link} opacity-40`} aria-hidden="true">Next →</span>}
    </nav>
  );
}
