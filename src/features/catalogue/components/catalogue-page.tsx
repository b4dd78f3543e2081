import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { slabListQuery } from '../api';
import { SlabCard } from './slab-card';
import { CatalogueFilters } from './catalogue-filters';
import { Pagination } from './pagination';
import { PageTitle } from '../../../components/ui/page-title';
import { Notice } from '../../../components/ui/notice';
import { friendlyMessage } from '../../../lib/api-client';
import { paths } from '../../../paths';
import { z } from 'zod';
import { parseSlabListQuery } from '../../../../shared/slabs';

export function CataloguePage() {
  const [params, setParams] = useSearchParams();
  const filters = Object.fromEntries(params.entries());
  // The same schema the server uses: a filter it would refuse is marked at its box, not fetched.
  const checked = parseSlabListQuery(filters);
  const fieldErrors = checked.success ? {} : z.flattenError(checked.error).fieldErrors as Record<string, string[] | undefined>;
  const { data, error, isFetching } = useQuery({ ...slabListQuery(filters), enabled: checked.success });
  const activeCount = Object.keys(filters).filter((k) => !['page', 'sort'].includes(k)).length;

  return (
    <div className="grid gap-6 lg:grid-cols-[18rem_1fr]">
      <aside className="lg:sticky lg:top-4 lg:self-start">
        <details className="rounded-lg border border-line bg-surface-raised p-3 lg:hidden">
          <summary className="min-h-11 cursor-pointer py-2 font-semibold">Filters and sort{activeCount ? ` (${activeCount} on)` : ''}</summary>
          <div className="pt-3"><CatalogueFilters values={filters} fieldErrors={fieldErrors} onChange={(next) => setParams(next)} /></div>
        </details>
        <div className="hidden rounded-lg border border-line bg-surface-raised p-4 lg:block">
          <h2 className="mb-3 text-lg font-bold">Find a slab</h2>
          <CatalogueFilters values={filters} fieldErrors={fieldErrors} onChange={(next) => setParams(next)} />
        </div>
      </aside>
      <section aria-labelledby="catalogue-title" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <PageTitle title="Slabs">
            <span id="catalogue-title">Slabs in the yard</span>
          </PageTitle>
          <p aria-live="polite" className="text-ink-soft">
            {data ? `${data.total} ${data.total === 1 ? 'slab' : 'slabs'}` : ''}{isFetching ? ' · updating…' : ''}
          </p>
        </div>
        {!checked.success && (
          <Notice tone="danger" role="alert" title="Check the filters">
            {Object.values(fieldErrors).flat().filter(Boolean).join(' ') || 'One of the filters could not be used.'}
          </Notice>
        )}
        {checked.success && error && <Notice tone="danger" role="alert" title="These filters did not work">{friendlyMessage(error)}</Notice>}
        {data && data.items.length === 0 && (
          <Notice title="Nothing matches">Try a wider thickness range or clear some filters.</Notice>
        )}
        {data && (
          <ul className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3" aria-label="Slabs">
            {data.items.map((s) => <SlabCard key={s.id} slab={s} />)}
          </ul>
        )}
        {data && (
          <Pagination page={data.page} pageSize={data.pageSize} total={data.total} hrefFor={(page) => paths.catalogue({ ...filters, page })} />
        )}
      </section>
    </div>
  );
}
