import type { BrowserContext, Page } from 'playwright-core';
import { DEMO_ACCOUNTS, type DemoAccount } from '../../../server/seed/demo-data';

export function demoAccount(role: DemoAccount['role'], nth = 0): DemoAccount {
  const found = DEMO_ACCOUNTS.filter((a) => a.role === role)[nth];
  if (!found) throw new Error(`the demo data has no ${role} account #${nth + 1}`);
  return found;
}

/** True when the app has a screen at `path` (the router answers unknown paths with "Not found"). */
export async function screenExists(page: Page, path: string): Promise<boolean> {
  await page.goto(path);
  await page.locator('main h1').first().waitFor();
  return (await page.locator('main h1').first().textContent())?.trim() !== 'Not found';
}

/**
 * Signs in through the sign-in screen, as a person would: e-mail, password, the button.
 * Lands wherever the app sends them afterwards.
 */
export async function signInThroughForm(page: Page, account: { email: string; password: string }, next?: string) {
  await page.goto(next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in');
  await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
  await page.getByLabel('E-mail').fill(account.email);
  await page.getByLabel('Password', { exact: true }).fill(account.password);
  await page.getByRole('main').getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

/**
 * Signs in behind the scenes through the auth API (for checks that are about a page, not about
 * signing in, such as accessibility scans). The browser context keeps the session cookie.
 */
export async function signInQuietly(context: BrowserContext, baseUrl: string, account: { email: string; password: string }) {
  const res = await context.request.post(`${baseUrl}/api/auth/sign-in/email`, {
    headers: { Origin: baseUrl }, data: { email: account.email, password: account.password },
  });
  if (!res.ok()) throw new Error(`signing in ${account.email} failed: ${res.status()} ${await res.text()}`);
}

let buyerCounter = 0;

/** A new buyer identity for one journey; invented names, an address only the mail catcher sees. */
export function newBuyer(first: string) {
  buyerCounter += 1;
  const stamp = `${Date.now().toString(36)}${buyerCounter}`;
  return { name: `${first} Marrowby`, email: `${first.toLowerCase()}.${stamp}@example.test`, password: `sawdust-and-sticks-${stamp}` };
}

/** Opens an account on the sign-up screen; the app signs the new buyer in and sends them on. */
export async function signUpThroughForm(page: Page, buyer: { name: string; email: string; password: string }) {
  await page.getByRole('heading', { level: 1, name: 'Open an account' }).waitFor();
  await page.getByLabel('Your name').fill(buyer.name);
  await page.getByLabel('E-mail').fill(buyer.email);
  await page.getByLabel('Password', { exact: true }).fill(buyer.password);
  await page.getByRole('button', { name: 'Open my account' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-up'));
}
