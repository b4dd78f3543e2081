import { describe, expect, it } from 'vitest';
import { useStickerline } from './harness';
import { journey } from './journey';
import { browseToSlab } from './steps/browse';

const stickerline = useStickerline();

describe('a buyer reading the trade advice on a slab page', () => {
  it('sees the drying forecast with its range and lifting advice from the NIOSH equation, both as the server worked them out', async () => {
    const { page, context } = await stickerline().newPage();
    await journey(page, 'slab-trade-advice', async () => {
      const slab = await browseToSlab(page, { species: 'Black walnut', minThicknessIn: '2' });
      const api = await (await page.request.get(`/api/slabs/${slab.id}`)).json();

      const forecast = page.getByTestId('drying-forecast');
      await forecast.waitFor();
      const forecastText = (await forecast.textContent()) ?? '';
      expect(forecastText).toContain(api.dryingForecast.method.slice(0, 40));
      if (api.dryingForecast.expectedOn) expect(forecastText).toContain(api.dryingForecast.expectedOn);
      if (api.dryingForecast.earliestOn !== api.dryingForecast.latestOn) {
        expect(forecastText).toContain(api.dryingForecast.earliestOn);
        expect(forecastText).toContain(api.dryingForecast.latestOn);
      }
      expect(forecastText).toMatch(/readings|rule of thumb|Air-dry/i);

      const lifting = page.getByTestId('lifting-advice');
      const liftText = (await lifting.textContent()) ?? '';
      expect(liftText).toContain(api.lifting.message);
      // A walnut slab 2 in and thicker is far over the recommended limit: no crew count, equipment by trained operators.
      expect(api.lifting.tier).toBe('equipment');
      expect(liftText).toMatch(/Cart, forklift or hoist only/);
      expect(liftText).toMatch(/trained operators only/);
      expect(liftText).not.toMatch(/at least \d+ people/);
      const caution = page.getByText(/revised NIOSH lifting equation \(NIOSH Pub\. 94-110\)/);
      await expect.poll(() => caution.count()).toBeGreaterThan(0);

      // The flattening panel says what is charged, and finishing carries its caution.
      await expect.poll(() => page.getByText(/flattens both faces/).count()).toBeGreaterThan(0);
      await expect.poll(() => page.getByTestId('caution-finishing').count()).toBeGreaterThan(0);
    });
    await context.close();
  });
});
