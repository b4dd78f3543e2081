import type { Page } from 'playwright-core';
import { saveScreen } from './harness';

/**
 * Runs one journey and keeps a picture of its last screen whether it passed or failed, so a red
 * run in CI can be read without re-running it.
 */
export async function journey(page: Page, name: string, steps: () => Promise<void>) {
  try {
    await steps();
  } finally {
    await saveScreen(page, name).catch((e) => console.error(`no screenshot for ${name}: ${e}`));
  }
}

/** Steps a journey skipped because a screen has not landed yet; printed so nobody mistakes a skip for a pass. */
export function skippedStep(journeyName: string, why: string) {
  console.warn(`[e2e] ${journeyName}: step skipped — ${why}`);
}
