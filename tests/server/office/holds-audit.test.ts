import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { auditLog, holds } from '../../../server/db/schema/index';
import { slabStatus } from './order-fixtures';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signedInAs']>>;
let buyer: Awaited<ReturnType<TestApp['signedInAs']>>;

beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signedInAs('admin', 'Tamsin Okonkwo-Reed');
  buyer = await t.signedInAs('buyer', 'Piet Hallowell');
});
afterAll(() => t.close());

async function heldSlab() {
  const log = await logRow(t.db, 'black-cherry');
  const slab = await slabRow(t.db, log, { status: 'held' });
  const [hold] = await t.db.insert(holds).values({ slabId: slab.id, buyerId: buyer.id, expiresAt: new Date(Date.now() + 3_600_000) }).returning();
  return { slab, hold };
}

describe('office holds', () => {
  it('lists active holds with slab, buyer and expiry', async () => {
    const { slab, hold } = await heldSlab();
    const res = await admin.agent.get('/api/office/holds');
    expect(res.status).toBe(200);
    expect(res.body.items).toContainEqual(expect.objectContaining({
      id: hold.id, slabId: slab.id, slabCode: slab.code, buyerName: 'Piet Hallowell', buyerEmail: buyer.email, expiresAt: hold.expiresAt.toISOString(),
    }));
  });

  it('releasing a hold by hand puts the slab back on sale and is audited', async () => {
    const { slab, hold } = await heldSlab();
    const res = await admin.agent.delete(`/api/office/holds/${hold.id}`).set('Origin', TEST_ORIGIN);
    expect(res.status).toBe(200);
    const [row] = await t.db.select().from(holds).where(eq(holds.id, hold.id));
    expect(row).toMatchObject({ status: 'released', closedBy: admin.id });
    expect(await slabStatus(t.db, slab.id)).toBe('listed');
    const audits = await t.db.select().from(auditLog).where(eq(auditLog.entityId, String(hold.id)));
    expect(audits.map((a) => a.action)).toEqual(['hold.release']);
    expect((await admin.agent.get('/api/office/holds')).body.items.map((h: { id: number }) => h.id)).not.toContain(hold.id);
  });

  it('releasing a hold that is no longer active answers 409; an unknown hold 404', async () => {
    const { hold } = await heldSlab();
    await admin.agent.delete(`/api/office/holds/${hold.id}`).set('Origin', TEST_ORIGIN);
    const again = await admin.agent.delete(`/api/office/holds/${hold.id}`).set('Origin', TEST_ORIGIN);
    expect(again.status).toBe(409);
    expect((await admin.agent.delete('/api/office/holds/999999').set('Origin', TEST_ORIGIN)).status).toBe(404);
  });
});

describe('GET /api/office/audit', () => {
  it('filters by actor, action, entity type and dates, newest first, with paging', async () => {
    await t.db.insert(auditLog).values([
      { actorId: 'a1', actorEmail: 'marguerite@yard.test', action: 'order.refund', entityType: 'order', entityId: '7', createdAt: new Date('2024-02-01T12:00:00Z') },
      { actorId: 'a2', actorEmail: 'lowell@yard.test', action: 'user.role', entityType: 'user', entityId: 'u9', createdAt: new Date('2024-02-03T12:00:00Z') },
      { actorId: 'a1', actorEmail: 'marguerite@yard.test', action: 'order.picked-up', entityType: 'order', entityId: '8', createdAt: new Date('2024-02-05T12:00:00Z') },
    ]);
    // Entries are told apart by their (distinct) days.
    const ids = async (q: string) => (await admin.agent.get(`/api/office/audit?${q}`)).body.items.map((e: { createdAt: string }) => e.createdAt.slice(0, 10));
    expect(await ids('actor=marguerite')).toEqual(['2024-02-05', '2024-02-01']);
    expect(await ids('action=user.role')).toEqual(['2024-02-03']);
    expect(await ids('entityType=order&from=2024-02-01&to=2024-02-04')).toEqual(['2024-02-01']);
    expect(await ids('from=2024-02-05&to=2024-02-05')).toEqual(['2024-02-05']);
    const page = await admin.agent.get('/api/office/audit?actor=yard.test&page=2');
    expect(page.body).toMatchObject({ total: 3, page: 2, pageSize: 50, items: [] });
    expect(page.body.actions).toEqual(expect.arrayContaining(['order.refund', 'user.role']));
  });

  it('answers 400 when the end date is before the start date or a date is malformed', async () => {
    expect((await admin.agent.get('/api/office/audit?from=2024-02-05&to=2024-02-01')).status).toBe(400);
    const bad = await admin.agent.get('/api/office/audit?from=yesterday');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fieldErrors.from).toBeDefined();
  });
});
