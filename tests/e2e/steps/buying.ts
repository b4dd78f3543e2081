import { expect } from 'vitest';
import type { Page } from 'playwright-core';

/** "$1,234.56" → 123456: read money as a person reads it off the screen. */
export const centsFrom = (text: string) => Math.round(Number(/\$([\d,]+\.\d{2})/.exec(text)?.[1].replace(/,/g, '')) * 100);

/** How the e-mails write money ($1234.56, no grouping). */
export const mailMoney = (cents: number) => `$${(cents / 100).toFixed(2)}`;

/** On a slab page that is for sale: press Reserve and wait for the confirmation. */
export async function reserveOpenSlab(page: Page, code: string) {
  await page.getByRole('button', { name: 'Reserve this slab' }).click();
  await page.getByRole('status').filter({ hasText: `Slab ${code} is held for you.` }).waitFor();
}

export type BookedOrder = { id: number; code: string; totalCents: number; pickupOn: string; startsAt: string; endsAt: string };

/**
 * From a held slab's confirmation: open the reservations, go to checkout, take the first open
 * pickup time, go to the payment page (the local fake's), let the test payment succeed, and land
 * back on the order page.
 */
export async function checkOutHeldSlabs(page: Page, codes: string[]): Promise<BookedOrder> {
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My holds' }).click();
  await page.getByRole('heading', { level: 1, name: 'My holds' }).waitFor();
  for (const code of codes) await page.getByRole('link', { name: new RegExp(`slab ${code}$`) }).waitFor();
  await page.getByRole('link', { name: 'Go to checkout' }).click();

  await page.getByRole('heading', { level: 1, name: 'Checkout' }).waitFor();
  const times = page.getByRole('group', { name: 'Pickup time' });
  const slot = times.getByRole('radio', { disabled: false }).first();
  await slot.check();
  const [, pickupOn] = (await slot.getAttribute('value'))!.split('|');
  const slotLabel = (await slot.locator('xpath=..').textContent()) ?? '';
  const [, startsAt, endsAt] = /(\d{2}:\d{2})–(\d{2}:\d{2})/.exec(slotLabel)!;
  const pay = page.getByRole('button', { name: /^Go to payment — \$/ });
  const totalCents = centsFrom((await pay.textContent()) ?? '');
  await pay.click();

  // The local test payment page stands where the provider's page would be; it shows the same total.
  await page.waitForURL(/\/pay\/cs_test_/, { timeout: 30_000 });
  await page.getByText('Local test payment page.').waitFor();
  expect(centsFrom((await page.getByRole('row', { name: /Total/ }).textContent()) ?? '')).toBe(totalCents);
  await page.getByRole('button', { name: 'Test payment succeeds' }).click();

  await page.waitForURL(/\/orders\/\d+/, { timeout: 30_000 });
  const heading = page.getByRole('heading', { level: 1, name: /^Order / });
  const code = ((await heading.textContent()) ?? '').replace(/^Order /, '').trim();
  await page.getByRole('status').filter({ hasText: 'Paid' }).waitFor();
  const pickup = page.getByRole('region', { name: 'Pickup' });
  await expect.poll(() => pickup.textContent()).toContain(`${pickupOn}, ${startsAt}–${endsAt}`);
  for (const c of codes) await page.getByRole('link', { name: new RegExp(`slab ${c}$`) }).waitFor();
  const totals = (await page.getByRole('region', { name: 'Slabs' }).textContent()) ?? '';
  expect(centsFrom(totals.slice(totals.lastIndexOf('Total')))).toBe(totalCents);
  return { id: Number(/\/orders\/(\d+)/.exec(page.url())![1]), code, totalCents, pickupOn, startsAt, endsAt };
}
