import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { averageWidthIn, boardFeet, roundBoardFeet } from '../../shared/wood/index';
import { useStickerline } from './harness';
import { journey } from './journey';
import { grainyJpeg } from './steps/photo';
import { demoAccount, signInThroughForm } from './steps/session';

const stickerline = useStickerline();

// Sizes typed the way the yard writes them: fractions, a dash, a unicode half, an inch mark.
const WIDTHS = ['17 1/2', '18-1/4', '19"'];
const WIDTHS_IN = [17.5, 18.25, 19];
const THICKNESS = '9/4';
const THICKNESS_IN = 2.25;
const LENGTH = '83 ½';
const LENGTH_IN = 83.5;

/** Slows uploads to about 64 kB/s (Chromium's network emulation) so the progress bar has time to show. */
async function slowUploads(page: Page) {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 20, downloadThroughput: -1, uploadThroughput: 64 * 1024 });
  return () => cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
}

describe('a seller at the yard desk', () => {
  it('records a log and a slab, adds a photo and a reading, puts it on sale and finds it in the catalogue', async () => {
    const { page, context } = await stickerline().newPage();
    await journey(page, 'seller-records-and-lists', async () => {
      await signInThroughForm(page, demoAccount('seller'));
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Yard desk' }).click();
      await page.getByRole('heading', { level: 1, name: 'Yard desk' }).waitFor();
      // This run's address is loopback, so the phone panel explains how to reach phones instead of a QR code.
      await page.getByText('Open the shop on a phone').click();
      await page.getByText('Phones cannot open this address yet').waitFor();

      // The log, as it came off the trailer.
      await page.getByRole('main').getByRole('link', { name: 'Record a log' }).click();
      await page.getByRole('heading', { level: 1, name: 'Record a log' }).waitFor();
      await page.getByLabel('Species').selectOption({ label: 'Black walnut' });
      await page.getByLabel('Felled on').fill('2024-03-02');
      await page.getByLabel('Milled on').fill('2024-04-11');
      await page.getByLabel('Length (in)').fill('96');
      await page.getByLabel('Butt diameter (in)').fill('26 1/4');
      await page.getByLabel('Top diameter (in)').fill('21-3/8"');
      await page.getByLabel('Where it came from').fill('Storm-felled hedgerow tree from Tansy Lane, Quennadale.');
      await page.getByRole('button', { name: 'Record log' }).click();
      const logHeading = page.getByRole('heading', { level: 1, name: /^Log L-\d{4}-\d{2}/ });
      await logHeading.waitFor();
      const logCode = /L-\d{4}-\d{2}/.exec((await logHeading.textContent()) ?? '')![0];

      // A slab from it, measured at three stations.
      await page.getByRole('link', { name: 'Add slab to this log' }).click();
      await page.getByRole('button', { name: 'Record slab' }).waitFor();
      await page.getByLabel('Thickness (in)').fill(THICKNESS);
      await page.getByLabel('Length (in)').fill(LENGTH);
      const widths = page.getByRole('group', { name: 'Widths along the slab (in)' });
      while ((await widths.getByRole('textbox').count()) < WIDTHS.length) await widths.getByRole('button', { name: 'Add a station' }).click();
      // A slip first: "1/2/3" is no size, and the form says so at that box without losing the rest.
      await widths.getByLabel('Station 1').fill('1/2/3');
      await page.getByRole('button', { name: 'Record slab' }).click();
      await widths.getByText('"1/2/3" is not a size we can read').waitFor();
      expect(await page.getByLabel('Thickness (in)').inputValue()).toBe(THICKNESS);
      for (const [i, w] of WIDTHS.entries()) await widths.getByLabel(`Station ${i + 1}`).fill(w);
      // The live tally must agree with the shared board-foot formula on the sizes as read.
      const bf = roundBoardFeet(boardFeet({ thicknessIn: THICKNESS_IN, widthIn: averageWidthIn(WIDTHS_IN), lengthIn: LENGTH_IN }));
      await expect.poll(() => widths.textContent()).toContain(`${bf} bd ft`);
      await expect.poll(() => widths.textContent()).toContain('Average width 18 1/4 in');
      await page.getByLabel('Live edge').selectOption({ index: 2 });
      await page.getByLabel('Status').selectOption({ label: 'Dry, not yet for sale' });
      await page.getByLabel('Description for buyers').fill('Dark heartwood with a sapwood stripe along one edge.');
      await page.getByRole('button', { name: 'Record slab' }).click();
      const slabHeading = page.getByRole('heading', { level: 1, name: new RegExp(`${logCode}-\\d{2}`) });
      await slabHeading.waitFor();
      const slabCode = new RegExp(`${logCode}-\\d{2}`).exec((await slabHeading.textContent()) ?? '')![0];
      // Saved as read: the record shows the sizes back in the shop's fractions.
      expect(await page.getByLabel('Thickness (in)').inputValue()).toBe('2 1/4');
      expect(await page.getByLabel('Length (in)').inputValue()).toBe('83 1/2');

      // A photo, with the upload's progress visible on the way.
      await page.getByRole('navigation', { name: 'Slab pages' }).getByRole('link', { name: /^Photos/ }).click();
      await page.getByRole('heading', { level: 1, name: 'Slab photos' }).waitFor();
      await page.getByLabel('Add photos').setInputFiles({ name: 'slab-face.jpg', mimeType: 'image/jpeg', buffer: await grainyJpeg() });
      const fullSpeed = await slowUploads(page);
      await page.getByRole('button', { name: 'Upload 1 photo' }).click();
      const progress = page.getByRole('progressbar');
      await progress.waitFor();
      expect(await page.getByText(/Uploading 1 photo… \d+ %|Preparing the photos…/).count()).toBe(1);
      await page.getByRole('status').filter({ hasText: '1 photo added.' }).waitFor({ timeout: 30_000 });
      await fullSpeed();
      await page.getByRole('heading', { name: /^Photos \(1 of \d+\)$/ }).waitFor();

      // A moisture reading.
      await page.getByRole('link', { name: '← Slab record' }).click();
      await page.getByRole('navigation', { name: 'Slab pages' }).getByRole('link', { name: /^Moisture readings/ }).click();
      await page.getByRole('heading', { level: 1, name: 'Slab moisture' }).waitFor();
      await page.getByLabel('Moisture content (%)').fill('11.5');
      await page.getByRole('button', { name: 'Save reading' }).click();
      await page.getByRole('status').filter({ hasText: 'Reading saved' }).waitFor();

      // On sale.
      await page.getByRole('link', { name: '← Slab record' }).click();
      await page.getByRole('button', { name: 'Save slab' }).waitFor();
      await page.getByLabel('Status').selectOption({ label: 'For sale' });
      await page.getByRole('button', { name: 'Save slab' }).click();
      await expect.poll(() => page.getByLabel('Status').evaluate((s: HTMLSelectElement) => s.selectedOptions[0]?.textContent)).toBe('For sale');

      // A buyer's view: the newest walnut in the catalogue.
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Slabs' }).click();
      await page.getByRole('search', { name: 'Filter slabs' }).getByRole('combobox', { name: 'Species' }).selectOption({ label: 'Black walnut' });
      await page.waitForURL(/species=black-walnut/);
      const card = page.getByRole('list', { name: 'Slabs' }).getByRole('listitem').filter({ hasText: slabCode });
      await card.waitFor();
      await card.getByRole('link').click();
      await page.getByText(`Slab ${slabCode}`).waitFor();
      expect(await page.getByText('For sale', { exact: true }).count()).toBeGreaterThan(0);
    });
    await context.close();
  });
});
