import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { and, eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, matchedSetRow, slabRow } from '../../helpers/fixtures';
import { auditLog, emailOutbox, holds } from '../../../server/db/schema/index';
import { releaseExpiredHolds } from '../../../server/modules/holds/holds.service';
import { millSettingsRow } from '../checkout/checkout-fixtures';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>;
let admin: Awaited<ReturnType<TestApp['signedInAs']>>;

beforeAll(async () => {
  t = await createTestApp();
  await millSettingsRow(t.db);
  seller = await t.signedInAs('seller', 'Ilse Marrow');
  admin = await t.signedInAs('admin', 'Oren Pask');
});
afterAll(() => t.close());

const mark = (slabIds: number[]) => seller.agent.post('/api/matched-sets').set('Origin', TEST_ORIGIN).send({ slabIds });
const holdSet = (agent: Awaited<ReturnType<TestApp['signedInAs']>>['agent'], slabIds: number[]) =>
  agent.post('/api/holds/matched-set').set('Origin', TEST_ORIGIN).send({ slabIds });
const remainderMails = (to: string) => t.db.select().from(emailOutbox).where(and(eq(emailOutbox.toAddress, to), eq(emailOutbox.kind, 'matched-set-remainder')));

describe('the yard marks book-matched sets', () => {
  it('a marked set is the one record: the slab page names the set, the log page lists it, and neighbours left unmarked are only suggested', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const [a, b, c, d] = [await slabRow(t.db, log), await slabRow(t.db, log), await slabRow(t.db, log), await slabRow(t.db, log)];
    // The yard decides: no. 1 and no. 3 mirror each other (no. 2 had a shake and was cut thin), not 1 and 2.
    const res = await mark([c.id, a.id]);
    expect(res.status).toBe(201);
    expect(res.body.slabs.map((s: { code: string }) => s.code)).toEqual([a.code, c.code]);

    const pageA = (await request(t.app).get(`/api/slabs/${a.id}`)).body;
    expect(pageA.matchedSet.slabs.map((s: { id: number }) => s.id)).toEqual([a.id, c.id]);
    expect((await request(t.app).get(`/api/slabs/${b.id}`)).body.matchedSet).toBeNull();

    const logSets = await seller.agent.get(`/api/logs/${log.id}/matched-sets`);
    expect(logSets.body.sets).toHaveLength(1);
    // Suggestions: neighbours sawn one after the other that are in no set yet.
    expect(logSets.body.suggestions.map((p: Array<{ id: number }>) => p.map((s) => s.id))).toEqual([]);
    void d;
    const log2 = await logRow(t.db, 'black-walnut');
    const [e, f] = [await slabRow(t.db, log2), await slabRow(t.db, log2)];
    const sugg = await seller.agent.get(`/api/logs/${log2.id}/matched-sets`);
    expect(sugg.body.suggestions.map((p: Array<{ id: number }>) => p.map((s) => s.id))).toEqual([[e.id, f.id]]);
  });

  it('the pair hold takes the marked set (even when not neighbours) and refuses unmarked neighbours', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const [a, b, c] = [await slabRow(t.db, log), await slabRow(t.db, log), await slabRow(t.db, log)];
    await mark([a.id, c.id]);
    const { agent } = await t.signedInAs('buyer');
    expect((await holdSet(agent, [a.id, b.id])).status).toBe(400);
    const ok = await holdSet(agent, [a.id, c.id]);
    expect(ok.status).toBe(201);
    expect(ok.body.holds).toHaveLength(2);
  });

  it('refuses a slab already in a set (409), slabs from two logs (400), and buyers (403)', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const [a, b, c] = [await slabRow(t.db, log), await slabRow(t.db, log), await slabRow(t.db, log)];
    expect((await mark([a.id, b.id])).status).toBe(201);
    const again = await mark([b.id, c.id]);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('already_in_set');
    const other = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    expect((await mark([c.id, other.id])).status).toBe(400);
    const buyer = await t.signedInAs('buyer');
    expect((await buyer.agent.post('/api/matched-sets').set('Origin', TEST_ORIGIN).send({ slabIds: [c.id, a.id] })).status).toBe(403);
  });

  it('unmarking a set takes the pair off the slab page and the pair hold', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const [a, b] = [await slabRow(t.db, log), await slabRow(t.db, log)];
    const set = (await mark([a.id, b.id])).body;
    expect((await seller.agent.delete(`/api/matched-sets/${set.id}`).set('Origin', TEST_ORIGIN)).status).toBe(200);
    expect((await request(t.app).get(`/api/slabs/${a.id}`)).body.matchedSet).toBeNull();
    const { agent } = await t.signedInAs('buyer');
    expect((await holdSet(agent, [a.id, b.id])).status).toBe(400);
  });
});

describe('one slab of a held set leaves', () => {
  it('when the buyer releases one slab, the rest stays held, the buyer is e-mailed what stays and until when, and the change log says so', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const [a, b] = [await slabRow(t.db, log), await slabRow(t.db, log)];
    await matchedSetRow(t.db, [a, b]);
    const buyer = await t.signedInAs('buyer');
    const placed = (await holdSet(buyer.agent, [a.id, b.id])).body.holds as Array<{ id: number; slabId: number }>;
    const holdA = placed.find((h) => h.slabId === a.id)!;
    expect((await buyer.agent.delete(`/api/holds/${holdA.id}`).set('Origin', TEST_ORIGIN)).status).toBe(204);

    const [rest] = await t.db.select().from(holds).where(eq(holds.slabId, b.id));
    expect(rest.status).toBe('active');
    const [mail] = await remainderMails(buyer.email);
    expect(mail.subject).toContain(`slab ${a.code} is no longer held`);
    expect(mail.text).toContain(`The rest of the set — ${b.code} — stays held for you until`);
    const [entry] = await t.db.select().from(auditLog).where(and(eq(auditLog.action, 'matched-set.rest-still-held'), eq(auditLog.entityId, String(a.id))));
    expect(entry.after).toMatchObject({ why: 'released-by-buyer', restSlabCodes: [b.code] });
  });

  it('when the office releases one slab, or one hold runs out before the other, the buyer is told the same way', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const [a, b, c] = [await slabRow(t.db, log), await slabRow(t.db, log), await slabRow(t.db, log)];
    await matchedSetRow(t.db, [a, b, c]);
    const buyer = await t.signedInAs('buyer');
    const placed = (await holdSet(buyer.agent, [a.id, b.id, c.id])).body.holds as Array<{ id: number; slabId: number }>;
    expect((await admin.agent.delete(`/api/office/holds/${placed[0].id}`).set('Origin', TEST_ORIGIN)).status).toBe(200);
    expect((await remainderMails(buyer.email))[0].text).toMatch(/was released by the mill office/);

    await t.db.update(holds).set({ createdAt: new Date(Date.now() - 3_600_000), expiresAt: new Date(Date.now() - 60_000) }).where(eq(holds.id, placed[1].id));
    await releaseExpiredHolds(t.db, { now: new Date() });
    const mails = await remainderMails(buyer.email);
    expect(mails).toHaveLength(2);
    expect(mails.some((m) => /ran out of hold time/.test(m.text) && m.text.includes(c.code))).toBe(true);
    expect((await t.db.select().from(holds).where(eq(holds.id, placed[2].id)))[0].status).toBe('active');
  });
});
