import { describe, expect, it } from 'vitest';
import { useStickerline } from './harness';
import { journey } from './journey';
import { describeViolations, seriousViolations } from './axe';
import { demoAccount, signInThroughForm } from './steps/session';
import { BATCH_MAX_ROWS } from '../../shared/readings';

const stickerline = useStickerline();

describe('the yard fixes its own mistakes', () => {
  it('a slab recorded on the wrong log is deleted from its page and is gone from the log', async () => {
    const app = stickerline();
    const { page, context } = await app.newPage({ bypassCSP: true });
    await journey(page, 'yard-delete-mistaken-slab', async () => {
      await signInThroughForm(page, demoAccount('seller'));
      // The mistake: a slab typed against a log (through the same API the form uses).
      const logs = (await (await context.request.get('/api/logs')).json()).items as { id: number; code: string }[];
      const log = logs[0];
      const made = await context.request.post('/api/slabs', {
        headers: { Origin: app.url }, data: { logId: log.id, thicknessIn: '2 1/4', widthsIn: ['18', '19'], lengthIn: '72', status: 'drying' },
      });
      expect(made.status()).toBe(201);
      const slab = (await made.json()) as { id: number; code: string };

      await page.goto(`/yard/slabs/${slab.id}`);
      await page.getByRole('heading', { level: 1, name: `Slab ${slab.code}` }).waitFor();
      expect(describeViolations(`/yard/slabs/${slab.id}`, await seriousViolations(page))).toBe('');
      await page.getByRole('button', { name: 'Delete this slab…' }).click();
      await page.getByRole('button', { name: `Yes, delete slab ${slab.code}` }).click();

      await page.waitForURL(new RegExp(`/yard/logs/${log.id}$`));
      await page.getByRole('status').filter({ hasText: `Slab ${slab.code} was deleted.` }).waitFor();
      expect(await page.getByRole('link', { name: slab.code, exact: true }).count()).toBe(0);
      expect((await context.request.get(`/api/yard/slabs/${slab.id}`)).status()).toBe(404);
    });
    await context.close();
  });

  it('a slab that was for sale offers no delete, and the API refuses it with the reason', async () => {
    const app = stickerline();
    const { page, context } = await app.newPage();
    await journey(page, 'yard-keeps-sold-history', async () => {
      await signInThroughForm(page, demoAccount('seller'));
      const listed = (await (await context.request.get('/api/yard/slabs?status=listed&pageSize=1')).json()).items[0] as { id: number; code: string };
      await page.goto(`/yard/slabs/${listed.id}`);
      await page.getByRole('heading', { level: 1, name: `Slab ${listed.code}` }).waitFor();
      expect(await page.getByRole('button', { name: 'Delete this slab…' }).count()).toBe(0);
      const refused = await context.request.delete(`/api/slabs/${listed.id}`, { headers: { Origin: app.url } });
      expect(refused.status()).toBe(409);
      expect((await refused.json()).error.message).toContain('Withdraw it instead');
    });
    await context.close();
  });

  it('starts a moisture round from a stack: the stack\'s slabs fill the form in yard order', async () => {
    const app = stickerline();
    const { page, context } = await app.newPage({ bypassCSP: true });
    await journey(page, 'yard-round-from-stack', async () => {
      await signInThroughForm(page, demoAccount('seller'));
      await page.goto('/yard/readings');
      await page.getByRole('heading', { level: 1, name: 'Moisture round' }).waitFor();
      const picker = page.getByRole('combobox', { name: 'Stack' });
      await expect.poll(() => picker.locator('option').count()).toBeGreaterThan(1);
      const stack = (await picker.locator('option').nth(1).getAttribute('value'))!;
      await picker.selectOption(stack);
      await page.getByRole('button', { name: 'Fill in this stack' }).click();
      const round = (await (await context.request.get(`/api/yard/moisture-round?stack=${encodeURIComponent(stack)}`)).json()).items as { code: string }[];
      await page.getByRole('status').filter({ hasText: `Round of stack ${stack}: ${Math.min(round.length, BATCH_MAX_ROWS)} slab` }).waitFor();
      const codes = await page.getByLabel('Slab code').evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value));
      expect(codes).toEqual(round.slice(0, BATCH_MAX_ROWS).map((s) => s.code));
      expect(describeViolations('/yard/readings', await seriousViolations(page))).toBe('');
    });
    await context.close();
  });
});
