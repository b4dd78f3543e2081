import type { Page } from 'playwright-core';
import { saveScreen } from './harness';

/**
 * Runs one journey and keeps a picture of its last screen whether it passed or failed, so a red
 * run in CI can be read without re-running it. A script error thrown in the page fails the
 * journey too, even when the screen happened to look right.
 */
export async function journey(page: Page, name: string, steps: () => Promise<void>) {
  const crashes: string[] = [];
  const onError = (err: Error) => crashes.push(err.message);
  page.on('pageerror', onError);
  try {
    await steps();
  } finally {
    page.off('pageerror', onError);
    await saveScreen(page, name).catch((e) => console.error(`no screenshot for ${name}: ${e}`));
  }
  if (crashes.length) throw new Error(`${name}: the page threw ${crashes.length} script error(s):\n  ${crashes.join('\n  ')}`);
}

/** Steps a journey skipped because a screen has not landed yet; printed so nobody mistakes a skip for a pass. */
export function skippedStep(journeyName: string, why: string) {
  console.warn(`[e2e] ${journeyName}: step skipped — ${why}`);
}
