import { Link } from 'react-router';

type Props = { page: number; pageSize: number; total: number; hrefFor: (page: number) => string };

export function Pagination({ page, pageSize, total, hrefFor }: Props) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  if (pages <= 1) return null;
  const box = 'rounded-md border border-line bg-surface-raised px-3 py-2 min-h-11 inline-flex items-center';
  const link = `${box} hover:bg-accent-soft`;
  // Faded with the soft ink (not opacity): a see-through label fails the 4.5:1 contrast minimum.
  const idle = `${box} border-dashed text-ink-soft`;
  return (
    <nav aria-label="Pages" className="flex items-center justify-center gap-3">
      {page > 1 ? <Link className={link} to={hrefFor(page - 1)} rel="prev">← Previous</Link> : <span className={idle} aria-hidden="true">← Previous</span>}
      <span>Page {page} of {pages}</span>
      {page < pages ? <Link className={link} to={hrefFor(page + 1)} rel="next">Next →</Link> : <span className={idle} aria-hidden="true">Next →</span>}
    </nav>
  );
}
