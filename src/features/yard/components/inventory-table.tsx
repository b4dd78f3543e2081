import { useMemo, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { flexRender, getCoreRowModel, useReactTable, type RowSelectionState } from '@tanstack/react-table';
import { buttonClass } from '../../../components/ui/button';
import { inventoryCsvUrl, inventoryQuery, type InventoryFilters } from '../api';
import { inventoryColumns } from './inventory-columns';
import { InventoryFilterBar } from './inventory-filters';
import { BulkBar } from './bulk-bar';

type Props = { filters: InventoryFilters; onFiltersChange: (next: InventoryFilters) => void };

/** The yard's whole stock, every status. Sorting, filtering and paging happen on the server. */
export function InventoryTable({ filters, onFiltersChange }: Props) {
  const { data, isFetching } = useQuery(inventoryQuery(filters));
  const [selection, setSelection] = useState<RowSelectionState>({});
  const items = useMemo(() => data?.items ?? [], [data]);
  const sort = filters.sort ?? 'code';
  const dir = filters.dir ?? 'asc';
  const table = useReactTable({
    data: items,
    columns: inventoryColumns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (r) => String(r.id),
    manualSorting: true,
    manualPagination: true,
    state: { rowSelection: selection, sorting: [{ id: sort, desc: dir === 'desc' }] },
    onRowSelectionChange: setSelection,
  });
  const selected = items.filter((r) => selection[String(r.id)]).map((r) => ({ id: r.id, code: r.code }));
  const sortBy = (id: string) => onFiltersChange({ ...filters, sort: id, dir: sort === id && dir === 'asc' ? 'desc' : 'asc' });
  const page = Number(filters.page ?? 1);
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;

  return (
    <div className="grid gap-3">
      <InventoryFilterBar values={filters} onChange={(next) => { setSelection({}); onFiltersChange(next); }} />
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p aria-live="polite">{data ? `${data.total} slabs` : 'Loading…'}{isFetching && data ? ' · updating…' : ''}</p>
        <a className={buttonClass('secondary')} href={inventoryCsvUrl(filters)} download>Download CSV</a>
      </div>
      <BulkBar selected={selected} onDone={() => setSelection({})} />
      <div className="overflow-x-auto rounded-md border border-line bg-surface-raised">
        <table className="w-full min-w-[56rem] border-collapse text-left text-sm">
          <caption className="sr-only">Yard inventory; column buttons sort</caption>
          <thead className="border-b border-line bg-surface-sunk">
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id}>
                {g.headers.map((h) => {
                  const sortable = h.column.getCanSort();
                  const active = sort === h.column.id;
                  return (
                    <th key={h.id} className="p-2" aria-sort={active ? (dir === 'asc' ? 'ascending' : 'descending') : undefined}>
                      {sortable ? (
                        <button type="button" className="inline-flex min-h-11 items-center gap-1 font-semibold" onClick={() => sortBy(h.column.id)}>
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden="true">{active ? (dir === 'asc' ? '▲' : '▼') : '↕'}</span>
                        </button>
                      ) : flexRender(h.column.columnDef.header, h.getContext())}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className={`border-b border-line ${row.getIsSelected() ? 'bg-accent-soft' : ''}`}>
                {row.getVisibleCells().map((cell) => <td key={cell.id} className="p-2">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>)}
              </tr>
            ))}
            {items.length === 0 && <tr><td className="p-4" colSpan={inventoryColumns.length}>No slabs match these filters.</td></tr>}
          </tbody>
        </table>
      </div>
      <nav aria-label="Inventory pages" className="flex items-center gap-2">
        <button type="button" className={buttonClass('secondary')} disabled={page <= 1} onClick={() => onFiltersChange({ ...filters, page: String(page - 1) })}>Previous</button>
        <span>Page {page} of {pages}</span>
        <button type="button" className={buttonClass('secondary')} disabled={page >= pages} onClick={() => onFiltersChange({ ...filters, page: String(page + 1) })}>Next</button>
      </nav>
    </div>
  );
}
