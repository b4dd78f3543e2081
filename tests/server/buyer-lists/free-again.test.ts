import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, waitForMail, mailTo, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { emailOutbox, slabWatches } from '../../../server/db/schema/index';
import { releaseExpiredHolds } from '../../../server/modules/holds/holds.service';
import { flushOutbox } from '../../../server/lib/outbox';
import { hold, millSettingsRow } from '../checkout/checkout-fixtures';

let t: TestApp;
let log: Awaited<ReturnType<typeof logRow>>;
beforeAll(async () => { t = await createTestApp(); await millSettingsRow(t.db, { holdHours: 24 }); log = await logRow(t.db, 'white-oak'); });
afterAll(() => t.close());

type Agent = Awaited<ReturnType<TestApp['signedInAs']>>['agent'];
const watch = (agent: Agent, id: number) => agent.post(`/api/slabs/${id}/watch`).set('Origin', TEST_ORIGIN);
const kindsTo = async (email: string) =>
  (await t.db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, email))).map((r) => r.kind);

describe('placing a hold', () => {
  it('e-mails the buyer which slab is held and until when', async () => {
    const slab = await slabRow(t.db, log);
    const buyer = await t.signedInAs('buyer', 'Orla Fenwick');
    expect((await hold(buyer.agent, slab.id)).status).toBe(201);
    const mail = await waitForMail(buyer.email, (m) => m.subject === `Slab ${slab.code} is held for you`);
    expect(mail.text).toContain('Orla Fenwick');
    expect(mail.text).toMatch(/set aside for you until \w{3}, \w{3} \d{1,2}, \d{4}, \d{2}:\d{2} \(UTC\)/);
    expect(mail.text).toContain('/reservations');
  });
});

describe('"tell me when this held slab comes free"', () => {
  it('when the holder releases it, the watcher gets exactly one e-mail, and a second release sends no more', async () => {
    const slab = await slabRow(t.db, log);
    const holder = await t.signedInAs('buyer');
    const watcher = await t.signedInAs('buyer', 'Pell Ashdown');
    const first = await hold(holder.agent, slab.id);
    expect((await watch(watcher.agent, slab.id)).status).toBe(201);
    expect((await watch(watcher.agent, slab.id)).status).toBe(201); // asking twice keeps one request
    expect((await watcher.agent.get('/api/me/slab-marks')).body.watchedSlabIds).toEqual([slab.id]);

    expect((await holder.agent.delete(`/api/holds/${first.body.hold.id}`).set('Origin', TEST_ORIGIN)).status).toBe(204);
    const mail = await waitForMail(watcher.email, (m) => m.subject === `Slab ${slab.code} is for sale again`);
    expect(mail.text).toContain('Pell Ashdown');
    expect(mail.text).toContain(`/slabs/${slab.id}`);
    expect((await watcher.agent.get('/api/me/slab-marks')).body.watchedSlabIds).toEqual([]);

    // Held and let go again: the request was answered once, so no second message.
    const again = await hold(holder.agent, slab.id);
    await holder.agent.delete(`/api/holds/${again.body.hold.id}`).set('Origin', TEST_ORIGIN);
    expect(await kindsTo(watcher.email)).toEqual(['slab-free-again']);
  });

  it('when the hold runs out, the sweep tells the watcher through the outbox', async () => {
    const slab = await slabRow(t.db, log);
    const holder = await t.signedInAs('buyer');
    const watcher = await t.signedInAs('buyer');
    const placed = await hold(holder.agent, slab.id);
    await watch(watcher.agent, slab.id);
    await releaseExpiredHolds(t.db, { now: new Date(Date.parse(placed.body.hold.expiresAt) + 1000), publicUrl: 'http://yard.test' });
    expect(await kindsTo(watcher.email)).toEqual(['slab-free-again']);
    await flushOutbox(t.db, t.mailer);
    const mail = await waitForMail(watcher.email, (m) => m.subject.includes(slab.code));
    expect(mail.text).toContain(`http://yard.test/slabs/${slab.id}`);
  });

  it('when the office releases the hold, the watcher is told', async () => {
    const slab = await slabRow(t.db, log);
    const holder = await t.signedInAs('buyer');
    const watcher = await t.signedInAs('buyer');
    const admin = await t.signedInAs('admin');
    const placed = await hold(holder.agent, slab.id);
    await watch(watcher.agent, slab.id);
    expect((await admin.agent.delete(`/api/office/holds/${placed.body.hold.id}`).set('Origin', TEST_ORIGIN)).status).toBe(200);
    await waitForMail(watcher.email, (m) => m.subject === `Slab ${slab.code} is for sale again`);
  });

  it('when the held slab is bought instead, nobody is told it is free', async () => {
    const slab = await slabRow(t.db, log);
    const holder = await t.signedInAs('buyer');
    const watcher = await t.signedInAs('buyer');
    await hold(holder.agent, slab.id);
    await watch(watcher.agent, slab.id);
    await t.db.execute(`update slabs set status = 'sold' where id = ${slab.id}`);
    await t.db.execute(`update holds set status = 'converted', closed_at = now() where slab_id = ${slab.id}`);
    await releaseExpiredHolds(t.db, { now: new Date(Date.now() + 48 * 3_600_000) });
    expect(await kindsTo(watcher.email)).toEqual([]);
    expect(await mailTo(watcher.email)).toEqual([]);
  });

  it('refuses with a plain 409 when the slab is for sale, sold, not ready, or held by the asker; 401 for visitors', async () => {
    const listed = await slabRow(t.db, log);
    const sold = await slabRow(t.db, log, { status: 'sold' });
    const drying = await slabRow(t.db, log, { status: 'drying' });
    const mine = await slabRow(t.db, log);
    const buyer = await t.signedInAs('buyer');
    await hold(buyer.agent, mine.id);
    const answers = await Promise.all([listed, sold, drying, mine].map((s) => watch(buyer.agent, s.id)));
    expect(answers.map((a) => a.status)).toEqual([409, 409, 409, 409]);
    expect(answers.map((a) => a.body.error.message)).toEqual([
      `Slab ${listed.code} is for sale right now: you can reserve it.`,
      `Slab ${sold.code} is sold, so it will not come free.`,
      `Slab ${drying.code} is not for sale yet. Save it to find it again later.`,
      `You are holding slab ${mine.code} yourself.`,
    ]);
    const { default: request } = await import('supertest');
    expect((await request(t.app).post(`/api/slabs/${mine.id}/watch`).set('Origin', TEST_ORIGIN)).status).toBe(401);
    expect(await t.db.select().from(slabWatches).where(eq(slabWatches.userId, buyer.id))).toEqual([]);
  });

  it('a buyer can take back the request before the slab comes free', async () => {
    const slab = await slabRow(t.db, log);
    const holder = await t.signedInAs('buyer');
    const watcher = await t.signedInAs('buyer');
    const placed = await hold(holder.agent, slab.id);
    await watch(watcher.agent, slab.id);
    expect((await watcher.agent.delete(`/api/slabs/${slab.id}/watch`).set('Origin', TEST_ORIGIN)).status).toBe(204);
    await holder.agent.delete(`/api/holds/${placed.body.hold.id}`).set('Origin', TEST_ORIGIN);
    expect(await kindsTo(watcher.email)).toEqual([]);
  });
});
