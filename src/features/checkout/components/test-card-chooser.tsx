import type { UseFormRegisterReturn } from 'react-hook-form';
import { TEST_CARDS } from '../../../../shared/checkout';

/** The payment fake's test cards. Clearly marked: nothing here touches a real card. */
export function TestCardChooser({ field, error }: { field: UseFormRegisterReturn; error?: string }) {
  return (
    <fieldset className="flex flex-col gap-2 rounded-md border-2 border-dashed border-caution bg-caution-soft p-4">
      <legend className="px-1 text-lg font-bold">Test mode — no real card is charged</legend>
      <p className="text-sm">This shop runs against a local payment simulator. Pick how the test payment should turn out.</p>
      {TEST_CARDS.map((c) => (
        <label key={c.token} className="flex min-h-11 items-center gap-2">
          <input type="radio" value={c.token} {...field} />
          <span>{c.label}</span>
        </label>
      ))}
      {error && <p role="alert" className="text-sm text-danger">{error}</p>}
    </fieldset>
  );
}
