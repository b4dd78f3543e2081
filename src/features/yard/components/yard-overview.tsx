import { Link } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { SLAB_STATUSES } from '../../../../shared/slabs';
import { YARD_STATUS_LABELS } from '../../../../shared/slab-input';
import { buttonClass } from '../../../components/ui/button';
import { PageTitle } from '../../../components/ui/page-title';
import { paths } from '../../../paths';
import { inventoryQuery, type InventoryFilters } from '../api';
import { InventoryTable } from './inventory-table';
import { PhoneLink } from './phone-link';
import { SafetyNotice } from '../../../components/safety-caution';
import { EQUIPMENT_CAUTION, STAFF_DUST_NOISE_CAUTION } from '../../../../shared/safety';

type Props = { filters: InventoryFilters; onFiltersChange: (next: InventoryFilters) => void };

/** The yard desk's front page: how much stock sits in each status, then the inventory itself. */
export function YardOverview({ filters, onFiltersChange }: Props) {
  const { data } = useQuery(inventoryQuery(filters));
  return (
    <div className="grid gap-6">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <PageTitle>Yard desk</PageTitle>
        <div className="flex flex-wrap gap-2">
          <Link to={paths.yardLogs()} className={buttonClass('secondary')}>Log book</Link>
          <Link to={paths.yardLogNew()} className={buttonClass('secondary')}>Record a log</Link>
          <Link to={paths.yardSlabNew()} className={buttonClass('primary')}>Record a slab</Link>
        </div>
      </div>
      <nav aria-label="Slabs by status">
        <ul className="grid grid-cols-2 gap-2 sm:grid-cols-4 lg:grid-cols-7">
          {SLAB_STATUSES.map((s) => (
            <li key={s}>
              <button type="button" onClick={() => onFiltersChange({ status: s })}
                aria-pressed={filters.status === s}
                className={`flex min-h-11 w-full flex-col rounded-md border p-3 text-left ${filters.status === s ? 'border-accent bg-accent-soft' : 'border-line bg-surface-raised hover:bg-surface-sunk'}`}>
                <span className="text-2xl font-bold">{data?.counts[s] ?? '–'}</span>
                <span className="text-sm">{YARD_STATUS_LABELS[s]}</span>
              </button>
            </li>
          ))}
        </ul>
      </nav>
      <PhoneLink />
      <InventoryTable filters={filters} onFiltersChange={onFiltersChange} />
      <div className="grid gap-3 lg:grid-cols-2">
        <SafetyNotice caution={EQUIPMENT_CAUTION} />
        <SafetyNotice caution={STAFF_DUST_NOISE_CAUTION} />
      </div>
    </div>
  );
}
