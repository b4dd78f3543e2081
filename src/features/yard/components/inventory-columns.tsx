import { Link } from 'react-router';
import { createColumnHelper } from '@tanstack/react-table';
import type { YardSlabRow } from '../../../../shared/slab-input';
import { YARD_STATUS_LABELS } from '../../../../shared/slab-input';
import { formatCents, formatPercent } from '../../../../shared/wood/index';
import { BoardFeet, Length } from '../../../lib/units';
import { Tag } from '../../../components/ui/tag';
import { paths } from '../../../paths';

const col = createColumnHelper<YardSlabRow>();

/** Column ids match the API's sort names, so sorting a column sorts on the server. */
export const inventoryColumns = [
  col.display({
    id: 'select',
    header: ({ table }) => (
      <input type="checkbox" className="size-5" aria-label="Select every slab on this page"
        checked={table.getIsAllRowsSelected()} onChange={table.getToggleAllRowsSelectedHandler()} />
    ),
    cell: ({ row }) => (
      <input type="checkbox" className="size-5" aria-label={`Select ${row.original.code}`}
        checked={row.getIsSelected()} onChange={row.getToggleSelectedHandler()} />
    ),
    enableSorting: false,
  }),
  col.accessor('code', { header: 'Code', cell: (c) => <Link className="font-semibold text-accent underline" to={paths.yardSlab(c.row.original.id)}>{c.getValue()}</Link> }),
  col.accessor((r) => r.species.name, { id: 'species', header: 'Species' }),
  col.accessor('logCode', { id: 'log', header: 'Log', cell: (c) => <Link className="underline" to={paths.yardLog(c.row.original.logId)}>{c.getValue()}</Link> }),
  col.accessor('status', { header: 'Status', cell: (c) => <Tag tone={c.getValue() === 'listed' ? 'moss' : c.getValue() === 'withdrawn' ? 'danger' : 'neutral'}>{YARD_STATUS_LABELS[c.getValue()]}</Tag> }),
  col.accessor('thicknessIn', { header: 'Thick', cell: (c) => <Length inches={c.getValue()} /> }),
  col.accessor('widthIn', { header: 'Width', cell: (c) => <Length inches={c.getValue()} /> }),
  col.accessor('lengthIn', { header: 'Length', cell: (c) => <Length inches={c.getValue()} /> }),
  col.accessor('boardFeet', { header: 'Volume', cell: (c) => <BoardFeet value={c.getValue()} /> }),
  col.accessor('priceCents', { header: 'Price', cell: (c) => formatCents(c.getValue()) + (c.row.original.priceOverrideCents !== null ? ' (set)' : '') }),
  col.accessor('moisturePercent', { header: 'MC %', cell: (c) => { const v = c.getValue(); return v === null ? '—' : formatPercent(v); } }),
  col.accessor((r) => r.airDry?.expectedOn ?? null, {
    id: 'airDryExpectedOn', header: 'Air-dry by',
    cell: (c) => {
      const f = c.row.original.airDry;
      if (!f) return '—';
      if (f.basis === 'already-reached') return `since ${f.expectedOn}`;
      if (!f.expectedOn) return <span title={f.method}>no date</span>;
      return (
        <span title={f.method}>
          {f.expectedOn}
          {f.earliestOn !== f.latestOn && <span className="block text-xs text-ink-soft">{f.earliestOn} – {f.latestOn}</span>}
          {f.basis === 'rule-of-thumb' && <span className="block text-xs text-ink-soft">rule of thumb</span>}
        </span>
      );
    },
  }),
  col.accessor('photoCount', { header: 'Photos' }),
  col.accessor('yardStack', { header: 'Stack', cell: (c) => [c.getValue(), c.row.original.yardPosition].filter(Boolean).join(' · ') || '—' }),
];
