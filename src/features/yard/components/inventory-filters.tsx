import { useQuery } from '@tanstack/react-query';
import { SLAB_STATUSES } from '../../../../shared/slabs';
import { SLAB_STATUS_LABELS } from '../../../../shared/slabs';
import { SelectField, TextField } from '../../../components/ui/field';
import { logListQuery, yardSpeciesQuery, type InventoryFilters } from '../api';

type Props = { values: InventoryFilters; onChange: (next: InventoryFilters) => void };

/** Filters are kept in the URL so a view can be bookmarked, shared or exported as it is. */
export function InventoryFilterBar({ values, onChange }: Props) {
  const { data: species = [] } = useQuery(yardSpeciesQuery());
  const { data: logs = [] } = useQuery(logListQuery());
  const set = (key: string, value: string) => {
    const next = { ...values, [key]: value };
    if (!value) delete next[key];
    delete next.page;
    onChange(next);
  };
  return (
    <form role="search" aria-label="Filter the yard inventory" className="grid gap-2 sm:grid-cols-5" onSubmit={(e) => e.preventDefault()}>
      <SelectField label="Status" value={values.status ?? ''} onChange={(e) => set('status', e.target.value)}>
        <option value="">Any status</option>
        {SLAB_STATUSES.map((s) => <option key={s} value={s}>{SLAB_STATUS_LABELS[s]}</option>)}
      </SelectField>
      <SelectField label="Species" value={values.species ?? ''} onChange={(e) => set('species', e.target.value)}>
        <option value="">Any species</option>
        {species.map((s) => <option key={s.slug} value={s.slug}>{s.name}</option>)}
      </SelectField>
      <SelectField label="Log" value={values.log ?? ''} onChange={(e) => set('log', e.target.value)}>
        <option value="">Any log</option>
        {logs.map((l) => <option key={l.id} value={l.id}>{l.code}</option>)}
      </SelectField>
      <TextField key={`stack-${values.stack ?? ''}`} label="Stack" defaultValue={values.stack ?? ''}
        onBlur={(e) => e.currentTarget.value !== (values.stack ?? '') && set('stack', e.currentTarget.value.trim())}
        onKeyDown={(e) => e.key === 'Enter' && set('stack', e.currentTarget.value.trim())} />
      <TextField key={`q-${values.q ?? ''}`} label="Search" type="search" placeholder="Code, species, notes" defaultValue={values.q ?? ''}
        onBlur={(e) => e.currentTarget.value !== (values.q ?? '') && set('q', e.currentTarget.value.trim())}
        onKeyDown={(e) => e.key === 'Enter' && set('q', e.currentTarget.value.trim())} />
    </form>
  );
}
