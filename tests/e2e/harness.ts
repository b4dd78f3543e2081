import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, inject } from 'vitest';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
export const SCREENS_DIR = path.resolve('test-results/screens');

// Flags keep a headless run quiet and self-contained: no first-run screens, no calls home.
const CHROMIUM_ARGS = [
  '--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking',
  '--disable-component-update', '--disable-sync', '--disable-quic',
];

export type Stickerline = {
  url: string;
  mailWebPort: number;
  browser: Browser;
  /** A fresh browser context (its own cookies) with one page, at desktop size unless told. */
  newPage(opts?: { width?: number; height?: number; bypassCSP?: boolean }): Promise<{ context: BrowserContext; page: Page }>;
};

/**
 * Registers beforeAll/afterAll for one journey file: a fresh Chromium (its own temporary
 * profile) against the product the global setup started. Hands back a getter for the tests.
 */
export function useStickerline(): () => Stickerline {
  let browser: Browser | null = null;
  const url = inject('e2eUrl');
  beforeAll(async () => {
    if (!fs.existsSync(CHROMIUM)) {
      throw new Error(`No Chromium at ${CHROMIUM}: install the Debian package (apt-get install -y chromium).`);
    }
    browser = await chromium.launch({ executablePath: CHROMIUM, args: CHROMIUM_ARGS });
  });
  afterAll(async () => { await browser?.close(); });
  return () => {
    const open = browser;
    if (!open) throw new Error('Chromium did not start (see beforeAll)');
    return {
      url,
      mailWebPort: inject('e2eMailWebPort'),
      browser: open,
      async newPage({ width = 1280, height = 900, bypassCSP = false } = {}) {
        const context = await open.newContext({ baseURL: url, viewport: { width, height }, bypassCSP });
        context.setDefaultTimeout(15_000);
        const page = await context.newPage();
        page.on('pageerror', (err) => console.error(`[browser] ${err.message}`));
        return { context, page };
      },
    };
  };
}

/** Keeps a picture of the journey's last screen (git-ignored) for whoever reads a failure. */
export async function saveScreen(page: Page, journey: string) {
  fs.mkdirSync(SCREENS_DIR, { recursive: true });
  await page.screenshot({ path: path.join(SCREENS_DIR, `${journey}.png`), fullPage: true });
}
