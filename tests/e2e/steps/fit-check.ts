import { expect } from 'vitest';
import type { Page } from 'playwright-core';
import { equilibriumMoistureContent } from '../../../shared/wood/index';
import { skippedStep } from '../journey';

/**
 * On a slab page: type the buyer's shop conditions into the fit check and read the answer. The
 * shown moisture content must be what the shared wood math gives for those conditions.
 * Returns false (and says so) when the slab page has no fit-check panel.
 */
export async function runFitCheck(page: Page, journeyName: string, shop = { temperatureF: 70, rhPercent: 30 }): Promise<boolean> {
  const fitCheck = page.getByRole('region', { name: /fit check/i });
  if (!(await fitCheck.count())) {
    skippedStep(journeyName, 'the slab page has no fit-check panel yet');
    return false;
  }
  await fitCheck.getByLabel('Temperature (°F)').fill(String(shop.temperatureF));
  await fitCheck.getByLabel('Relative humidity (%)').fill(String(shop.rhPercent));
  const emc = equilibriumMoistureContent({ temperatureF: shop.temperatureF, relativeHumidityPercent: shop.rhPercent }).toFixed(1);
  await expect.poll(() => fitCheck.textContent()).toContain(`settles at about ${emc} % moisture content`);
  // One line per grain orientation, each saying how the width will move.
  await expect.poll(() => fitCheck.getByRole('listitem').allTextContents()).toEqual([
    expect.stringMatching(/flatsawn.*(narrower|wider|hardly any change)/), expect.stringMatching(/quartersawn.*(narrower|wider|hardly any change)/),
  ]);
  return true;
}
