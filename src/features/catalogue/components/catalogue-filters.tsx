import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { speciesQuery } from '../api';
import { SelectField, TextField } from '../../../components/ui/field';
import { InchesField } from '../../../components/ui/inches-field';
import { Button } from '../../../components/ui/button';
import { CATALOGUE_FILTER_LABELS, SLAB_SORTS, SLAB_SORT_LABELS } from '../../../../shared/slabs';
import { DRYING_STATES, centsAsPlainDollars, inchesForInput, parseDollarsToCents, parseInches } from '../../../../shared/wood/index';

type Props = {
  values: Record<string, string>;
  onChange: (next: Record<string, string>) => void;
  /** Messages about the filters now in the address (from the shared query schema), by filter name. */
  fieldErrors?: Record<string, string[] | undefined>;
};

type SizeKey = 'minThicknessIn' | 'maxThicknessIn' | 'minLengthIn' | 'minWidthIn';

/** What a box shows for a value in the address: the shop's fraction for a number, the raw text otherwise. */
const shownSize = (raw: string | undefined) => (raw === undefined ? '' : raw.trim() !== '' && Number.isFinite(Number(raw)) ? inchesForInput(Number(raw)) : raw);
const shownDollars = (raw: string | undefined) => (raw && /^\d+$/.test(raw) ? centsAsPlainDollars(Number(raw)).replace(/\.00$/, '') : raw ?? '');

/**
 * Filters live in the URL: each change replaces the search params, so a filtered view can be
 * bookmarked or shared. Size boxes take decimals or fractions ("2 1/4", "8/4" for a thickness)
 * and apply when they lose focus or on Enter; a size that cannot be read stays in its box with
 * the reason beside it, and the address keeps the last good value.
 */
export function CatalogueFilters({ values, onChange, fieldErrors = {} }: Props) {
  const { data: species = [] } = useQuery(speciesQuery());
  const [typed, setTyped] = useState<Record<string, { text: string; error: string }>>({});
  const set = (key: string, value: string) => {
    const next = { ...values, [key]: value };
    if (!value) delete next[key];
    delete next.page;
    setTyped(({ [key]: _dropped, ...rest }) => rest);
    onChange(next);
  };
  const commit = (key: string, text: string, read: (t: string) => string) => {
    if (text.trim() === '') return set(key, '');
    try {
      const value = read(text);
      if (value !== (values[key] ?? '')) set(key, value);
      else setTyped(({ [key]: _dropped, ...rest }) => rest);
    } catch (e) {
      setTyped((t) => ({ ...t, [key]: { text, error: e instanceof Error ? e.message : 'That could not be read.' } }));
    }
  };
  const errorFor = (key: keyof typeof CATALOGUE_FILTER_LABELS) => {
    const own = typed[key]?.error;
    if (own) return `${CATALOGUE_FILTER_LABELS[key]}: ${own}`;
    return fieldErrors[key]?.[0];
  };
  const sizeBox = (key: SizeKey, hint?: string) => (
    <InchesField
      key={`${key}-${values[key] ?? ''}`}
      label={`${CATALOGUE_FILTER_LABELS[key]} (in)`}
      hint={hint}
      defaultValue={typed[key]?.text ?? shownSize(values[key])}
      error={errorFor(key)}
      onBlur={(e) => commit(key, e.currentTarget.value, (t) => String(parseInches(t, { thickness: key.includes('Thickness') })))}
      onKeyDown={(e) => e.key === 'Enter' && commit(key, e.currentTarget.value, (t) => String(parseInches(t, { thickness: key.includes('Thickness') })))}
    />
  );
  const readDollars = (t: string) => String(parseDollarsToCents(t));
  return (
    <form role="search" aria-label="Filter slabs" className="grid gap-3" onSubmit={(e) => e.preventDefault()}>
      <SelectField label="Species" value={values.species ?? ''} onChange={(e) => set('species', e.target.value)}>
        <option value="">All species</option>
        {species.map((s) => <option key={s.slug} value={s.slug}>{s.name}</option>)}
      </SelectField>
      <div className="grid grid-cols-2 gap-2">
        {sizeBox('minThicknessIn')}
        {sizeBox('maxThicknessIn')}
      </div>
      <p className="-mt-2 text-sm text-ink-soft">Sizes as 2.25, 2 1/4 or 9/4.</p>
      <div className="grid grid-cols-2 gap-2">
        {sizeBox('minLengthIn')}
        {sizeBox('minWidthIn')}
      </div>
      <TextField
        key={`price-${values.maxPriceCents ?? ''}`}
        label={`${CATALOGUE_FILTER_LABELS.maxPriceCents} ($)`}
        inputMode="decimal"
        autoComplete="off"
        defaultValue={typed.maxPriceCents?.text ?? shownDollars(values.maxPriceCents)}
        error={errorFor('maxPriceCents')}
        onBlur={(e) => commit('maxPriceCents', e.currentTarget.value, readDollars)}
        onKeyDown={(e) => e.key === 'Enter' && commit('maxPriceCents', e.currentTarget.value, readDollars)}
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
      <Button variant="secondary" onClick={() => { setTyped({}); onChange({}); }}>Clear filters</Button>
    </form>
  );
}
