import { useQuery } from '@tanstack/react-query';
import { speciesQuery } from '../api';
import { SelectField, TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { SLAB_SORTS, SLAB_SORT_LABELS } from '../../../../shared/slabs';
import { DRYING_STATES } from '../../../../shared/wood/index';

type Props = { values: Record<string, string>; onChange: (next: Record<string, string>) => void };

/**
 * Filters live in the URL: each change replaces the search params, so a filtered view can be
 * bookmarked or shared. Number boxes apply when they lose focus or on Enter.
 */
export function CatalogueFilters({ values, onChange }: Props) {
  const { data: species = [] } = useQuery(speciesQuery());
  const set = (key: string, value: string) => {
    const next = { ...values, [key]: value };
    if (!value) delete next[key];
    delete next.page;
    onChange(next);
  };
  const numberBox = (key: string, label: string, hint?: string, step = '0.25') => (
    <TextField
      key={`${key}-${values[key] ?? ''}`}
      label={label}
      hint={hint}
      type="number"
      inputMode="decimal"
      min="0"
      step={step}
      defaultValue={values[key] ?? ''}
      onBlur={(e) => e.currentTarget.value !== (values[key] ?? '') && set(key, e.currentTarget.value)}
      onKeyDown={(e) => e.key === 'Enter' && set(key, e.currentTarget.value)}
    />
  );
  return (
    <form role="search" aria-label="Filter slabs" className="grid gap-3" onSubmit={(e) => e.preventDefault()}>
      <SelectField label="Species" value={values.species ?? ''} onChange={(e) => set('species', e.target.value)}>
        <option value="">All species</option>
        {species.map((s) => <option key={s.slug} value={s.slug}>{s.name}</option>)}
      </SelectField>
      <div className="grid grid-cols-2 gap-2">
        {numberBox('minThicknessIn', 'Thickness from (in)')}
        {numberBox('maxThicknessIn', 'Thickness to (in)')}
      </div>
      <div className="grid grid-cols-2 gap-2">
        {numberBox('minLengthIn', 'Length at least (in)', undefined, '1')}
        {numberBox('minWidthIn', 'Width at least (in)', undefined, '1')}
      </div>
      <TextField
        key={`price-${values.maxPriceCents ?? ''}`}
        label="Price up to ($)"
        type="number"
        inputMode="numeric"
        min="0"
        step="1"
        defaultValue={values.maxPriceCents ? String(Number(values.maxPriceCents) / 100) : ''}
        onBlur={(e) => set('maxPriceCents', e.currentTarget.value ? String(Math.round(Number(e.currentTarget.value) * 100)) : '')}
        onKeyDown={(e) => e.key === 'Enter' && set('maxPriceCents', e.currentTarget.value ? String(Math.round(Number(e.currentTarget.value) * 100)) : '')}
      />
      <SelectField label="Edges" value={values.liveEdge ?? ''} onChange={(e) => set('liveEdge', e.target.value)}>
        <option value="">Any edge</option>
        <option value="yes">Live edge (one or both sides)</option>
        <option value="both">Live edge, both sides</option>
        <option value="one">Live edge, one side</option>
        <option value="none">Square edges</option>
      </SelectField>
      <SelectField label="Dryness" value={values.dryingState ?? ''} onChange={(e) => set('dryingState', e.target.value)}>
        <option value="">Any</option>
        {DRYING_STATES.map((d) => <option key={d.state} value={d.state}>{d.label}</option>)}
      </SelectField>
      <SelectField label="Show" value={values.availability ?? 'available'} onChange={(e) => set('availability', e.target.value === 'available' ? '' : e.target.value)}>
        <option value="available">For sale now</option>
        <option value="upcoming">Still drying (coming later)</option>
        <option value="all">Everything in the yard</option>
      </SelectField>
      <SelectField label="Sort by" value={values.sort ?? 'newest'} onChange={(e) => set('sort', e.target.value === 'newest' ? '' : e.target.value)}>
        {SLAB_SORTS.map((s) => <option key={s} value={s}>{SLAB_SORT_LABELS[s]}</option>)}
      </SelectField>
      <Button variant="secondary" onClick={() => onChange({})}>Clear filters</Button>
    </form>
  );
}
