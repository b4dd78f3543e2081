import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { createTestApp, waitForMail, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { emailOutbox, holds, slabs } from '../../../server/db/schema/index';
import { releaseExpiredHolds } from '../../../server/modules/holds/holds.service';
import { flushOutbox } from '../../../server/lib/outbox';
import { hold, millSettingsRow } from '../checkout/checkout-fixtures';

let t: TestApp;
beforeAll(async () => { t = await createTestApp(); await millSettingsRow(t.db); });
afterAll(async () => { await t.close(); });

describe('expired holds', () => {
  it('when the hold time has passed, the sweep puts the slab back on sale and e-mails the buyer', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    const buyer = await t.signedInAs('buyer', 'Wren Callow');
    const { body } = await hold(buyer.agent, slab.id);

    const early = await releaseExpiredHolds(t.db, { now: new Date() });
    expect(early.released).toBe(0);

    const later = new Date(Date.parse(body.hold.expiresAt) + 1000);
    const { released } = await releaseExpiredHolds(t.db, { now: later, publicUrl: 'http://yard.test' });
    expect(released).toBe(1);
    const [h] = await t.db.select().from(holds).where(eq(holds.id, body.hold.id));
    expect(h.status).toBe('expired');
    expect((await t.db.select().from(slabs).where(eq(slabs.id, slab.id)))[0].status).toBe('listed');
    const queued = await t.db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, buyer.email));
    expect(queued.map((q) => q.kind)).toEqual(['hold-placed', 'hold-expired']);

    await flushOutbox(t.db, t.mailer);
    const mail = await waitForMail(buyer.email, (m) => m.subject.includes(slab.code) && m.subject.includes('ended'));
    expect(mail.text).toContain('Wren Callow');
    expect(mail.text).toContain('back on sale');
  });

  it('an expired hold no longer shows in the buyer’s list even before the sweep runs', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    const buyer = await t.signedInAs('buyer');
    const { body } = await hold(buyer.agent, slab.id);
    await t.db.update(holds).set({ createdAt: new Date(Date.now() - 3_600_000), expiresAt: new Date(Date.now() - 1000) }).where(eq(holds.id, body.hold.id));
    expect((await buyer.agent.get('/api/holds')).body.holds).toEqual([]);
  });

  it('a failed send is kept and retried later, not lost', async () => {
    await t.db.insert(emailOutbox).values({ toAddress: 'nobody@example.test', subject: 's', html: '<p>h</p>', text: 't', kind: 'test' });
    const broken = { send: async () => { throw new Error('SMTP down'); }, verify: async () => { throw new Error('SMTP down'); }, close: () => undefined };
    const result = await flushOutbox(t.db, broken);
    expect(result.failed).toBeGreaterThanOrEqual(1);
    const [row] = await t.db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, 'nobody@example.test'));
    expect(row.status).toBe('pending');
    expect(row.attempts).toBe(1);
    expect(row.lastError).toContain('SMTP down');
    expect(row.sendAfter.getTime()).toBeGreaterThan(Date.now());
  });
});
