import { useForm, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { ApiError, friendlyMessage } from '../../../lib/api-client';
import { millRulesSchema, type MillRules, type MillRulesView } from '../../../../shared/mill-rules';
import { useSaveMillRules } from '../api';

// Money is typed in dollars and kept in cents: the DOM shows dollars, setValueAs stores cents.
const toCents = (v: unknown) => (v === '' || v === null || v === undefined ? Number.NaN : Math.round(Number(v) * 100));
const dollars = (cents: number) => (cents / 100).toFixed(2);
const num = { valueAsNumber: true } as const;

/** The mill's prices and rules, saved together; saving reprices every unsold slab. */
export function MillRulesForm({ initial }: { initial: MillRulesView }) {
  const save = useSaveMillRules();
  const { species, figures, ...values } = initial;
  const { register, handleSubmit, setError, formState: { errors } } = useForm<MillRules>({
    resolver: zodResolver(millRulesSchema),
    defaultValues: { ...values, minimumChargeCents: undefined, flatteningCentsPerSqFt: undefined, speciesRates: undefined },
  });
  const onSubmit = (input: MillRules) =>
    save.mutate(input, {
      onError: (err) => {
        if (err instanceof ApiError) for (const [field, msgs] of Object.entries(err.fieldErrors)) setError(field as FieldPath<MillRules>, { message: msgs[0] });
      },
    });
  const rateError = (slug: string) => (errors.speciesRates as Record<string, { message?: string }> | undefined)?.[slug]?.message;
  const premiumError = (slug: string) => (errors.figurePremiums as Record<string, { message?: string }> | undefined)?.[slug]?.message;

  return (
    <form onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-6" noValidate>
      <fieldset className="grid gap-3 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-bold">The mill</legend>
        <TextField label="Mill name" {...register('millName')} error={errors.millName?.message} />
        <TextField label="Contact e-mail for buyers" type="email" {...register('contactEmail')} error={errors.contactEmail?.message} />
      </fieldset>

      <fieldset className="grid gap-3 sm:grid-cols-3">
        <legend className="mb-2 text-lg font-bold">Holds and drying</legend>
        <TextField label="Hold length (hours)" type="number" min={1} {...register('holdHours', num)} error={errors.holdHours?.message} />
        <TextField label="Target moisture content (%)" type="number" step="0.5" {...register('targetMcPercent', num)} error={errors.targetMcPercent?.message} hint="Furniture stock is usually 6–8 %." />
        <TextField label="A reading counts as recent for (days)" type="number" {...register('maxReadingAgeDays', num)} error={errors.maxReadingAgeDays?.message} hint="Needed to put a slab up for sale." />
        <SelectField label="When a buyer does not come" {...register('noShowRule')} error={errors.noShowRule?.message}>
          <option value="keep">Keep the order and the money</option>
          <option value="release-and-refund">Put the slabs back on sale and refund</option>
        </SelectField>
      </fieldset>

      <fieldset className="grid gap-3 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-bold">Price rules</legend>
        <TextField label="Minimum charge per slab ($)" type="number" step="0.01" min={0} defaultValue={dollars(values.minimumChargeCents)} {...register('minimumChargeCents', { setValueAs: toCents })} error={errors.minimumChargeCents?.message} />
        <TextField label="Flattening service ($ per sq ft of face)" type="number" step="0.01" min={0} defaultValue={dollars(values.flatteningCentsPerSqFt)} {...register('flatteningCentsPerSqFt', { setValueAs: toCents })} error={errors.flatteningCentsPerSqFt?.message} />
        <TextField label="Thick stock from (in)" type="number" step="0.25" {...register('thickPremiumMinIn', num)} error={errors.thickPremiumMinIn?.message} />
        <TextField label="Thick stock multiplier (1 = none)" type="number" step="0.05" {...register('thickPremiumMultiplier', num)} error={errors.thickPremiumMultiplier?.message} />
      </fieldset>

      <fieldset className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        <legend className="mb-2 text-lg font-bold">Price per board foot ($)</legend>
        {species.map((s) => (
          <TextField key={s.slug} label={s.name} type="number" step="0.25" min={0} defaultValue={dollars(s.ratePerBoardFootCents)}
            {...register(`speciesRates.${s.slug}` as FieldPath<MillRules>, { setValueAs: toCents })} error={rateError(s.slug)} />
        ))}
      </fieldset>

      <fieldset className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        <legend className="mb-2 text-lg font-bold">Figure premiums (price multiplier; only a slab's largest one applies)</legend>
        {figures.map((f) => (
          <TextField key={f.slug} label={f.label} type="number" step="0.05" min={1}
            {...register(`figurePremiums.${f.slug}` as FieldPath<MillRules>, num)} error={premiumError(f.slug)} />
        ))}
      </fieldset>

      {save.isError && !(save.error instanceof ApiError && Object.keys(save.error.fieldErrors).length) && <Notice tone="danger" role="alert">{friendlyMessage(save.error)}</Notice>}
      {save.isSuccess && <Notice tone="success" role="status">Saved. {save.data.repricedSlabs} unsold {save.data.repricedSlabs === 1 ? 'slab was' : 'slabs were'} repriced; sold slabs keep their price.</Notice>}
      <Button type="submit" className="self-start" disabled={save.isPending}>{save.isPending ? 'Saving…' : 'Save prices and rules'}</Button>
    </form>
  );
}
