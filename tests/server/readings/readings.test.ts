import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { auditLog, millSettings, moistureReadings, slabs } from '../../../server/db/schema/index';
import { equilibriumMoistureContent } from '../../../shared/wood/index';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>;
let buyer: Awaited<ReturnType<TestApp['signedInAs']>>;
let log: Awaited<ReturnType<typeof logRow>>;
const today = new Date().toISOString().slice(0, 10);
const reading = (over: Record<string, unknown> = {}) => ({ measuredOn: today, mcPercent: 19.5, meterKind: 'pin', location: 'middle, 1 in deep', ...over });

beforeAll(async () => {
  t = await createTestApp();
  // A mill target other than the column default, to prove the setting is read.
  await t.db.insert(millSettings).values({ id: 1, millName: 'Hollow Creek Mill', yardAddress: '4 Sawdust Lane', contactEmail: 'yard@hollowcreek.test', targetMcPercent: 10 });
  log = await logRow(t.db, 'black-walnut', { milledOn: '2024-05-10' });
  seller = await t.signedInAs('seller');
  buyer = await t.signedInAs('buyer');
});
afterAll(() => t.close());

const slabState = async (id: number) => (await t.db.select().from(slabs).where(eq(slabs.id, id)))[0].dryingState;

describe('POST /api/slabs/:id/moisture-readings', () => {
  it('when a seller records 19.5 % on a green slab, it answers 201 and the slab becomes air-dry against the mill target', async () => {
    const slab = await slabRow(t.db, log, { dryingState: 'green', status: 'drying', mc: null, photo: false });
    const res = await seller.agent.post(`/api/slabs/${slab.id}/moisture-readings`).set('Origin', TEST_ORIGIN).send(reading());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      reading: { slabId: slab.id, mcPercent: 19.5, meterKind: 'pin', recordedBy: seller.id },
      slab: { id: slab.id, dryingState: 'air-dry', previousDryingState: 'green' },
      targetMcPercent: 10, emcPercent: null,
    });
    expect(await slabState(slab.id)).toBe('air-dry');
    const audits = await t.db.select().from(auditLog).where(eq(auditLog.entityId, String(slab.id)));
    expect(audits.find((a) => a.action === 'slab.drying-state')).toMatchObject({ actorId: seller.id, before: { dryingState: 'green' } });
  });

  it('when the reading is at the mill target (10 %), the slab becomes shop-dry', async () => {
    const slab = await slabRow(t.db, log, { mc: null, photo: false });
    const res = await seller.agent.post(`/api/slabs/${slab.id}/moisture-readings`).set('Origin', TEST_ORIGIN).send(reading({ mcPercent: 10, meterKind: 'pinless' }));
    expect(res.body.slab.dryingState).toBe('shop-dry');
    expect(await slabState(slab.id)).toBe('shop-dry');
  });

  it('when air temperature and humidity are given, it also answers the EMC from the shared formula', async () => {
    const slab = await slabRow(t.db, log, { photo: false, mc: null });
    const res = await seller.agent.post(`/api/slabs/${slab.id}/moisture-readings`).set('Origin', TEST_ORIGIN)
      .send(reading({ ambientTempF: 70, ambientRhPercent: 65 }));
    expect(res.status).toBe(201);
    // Wood Handbook Eq. 4-5 at 70 °F / 65 % RH is about 12 % (FPL-GTR-190 table 4-2 lists 12.0 for 70 °F, 65 %).
    expect(res.body.emcPercent).toBeCloseTo(Math.round(equilibriumMoistureContent({ temperatureF: 70, relativeHumidityPercent: 65 }) * 10) / 10, 5);
    expect(res.body.emcPercent).toBeGreaterThan(11.5);
    expect(res.body.emcPercent).toBeLessThan(12.5);
  });

  it('when a back-dated reading arrives, the drying state still follows the newest reading', async () => {
    const slab = await slabRow(t.db, log, { mc: null, photo: false, dryingState: 'green' });
    await seller.agent.post(`/api/slabs/${slab.id}/moisture-readings`).set('Origin', TEST_ORIGIN).send(reading({ mcPercent: 9 }));
    const res = await seller.agent.post(`/api/slabs/${slab.id}/moisture-readings`).set('Origin', TEST_ORIGIN)
      .send(reading({ measuredOn: '2024-06-01', mcPercent: 45, meterKind: 'oven-dry' }));
    expect(res.status).toBe(201);
    expect(res.body.slab.dryingState).toBe('shop-dry');
  });

  it('when the values are out of range or the date is in the future, it answers 400 with per-field messages and saves nothing', async () => {
    const slab = await slabRow(t.db, log, { mc: null, photo: false });
    const res = await seller.agent.post(`/api/slabs/${slab.id}/moisture-readings`).set('Origin', TEST_ORIGIN)
      .send(reading({ measuredOn: '2999-01-01', mcPercent: 250, meterKind: 'hammer', ambientTempF: 150, ambientRhPercent: -3 }));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fieldErrors).sort()).toEqual(['ambientRhPercent', 'ambientTempF', 'mcPercent', 'measuredOn', 'meterKind']);
    expect(await t.db.select().from(moistureReadings).where(eq(moistureReadings.slabId, slab.id))).toHaveLength(0);
  });

  it('when the slab does not exist, it answers 404', async () => {
    const res = await seller.agent.post('/api/slabs/999999/moisture-readings').set('Origin', TEST_ORIGIN).send(reading());
    expect(res.status).toBe(404);
  });

  it('when a visitor posts, it answers 401; when a buyer posts, 403', async () => {
    const slab = await slabRow(t.db, log, { photo: false });
    expect((await request(t.app).post(`/api/slabs/${slab.id}/moisture-readings`).send(reading())).status).toBe(401);
    expect((await buyer.agent.post(`/api/slabs/${slab.id}/moisture-readings`).set('Origin', TEST_ORIGIN).send(reading())).status).toBe(403);
  });
});

describe('GET /api/slabs/:id/moisture-readings', () => {
  it('lists the readings oldest first with the target and the air-dry ready date (one year per inch)', async () => {
    const slab = await slabRow(t.db, log, { thicknessIn: 2, mc: 30, photo: false });
    await seller.agent.post(`/api/slabs/${slab.id}/moisture-readings`).set('Origin', TEST_ORIGIN).send(reading({ measuredOn: '2024-09-01', mcPercent: 40 }));
    const res = await seller.agent.get(`/api/slabs/${slab.id}/moisture-readings`);
    expect(res.status).toBe(200);
    expect(res.body.items.map((r: { mcPercent: number }) => r.mcPercent)).toEqual([40, 30]);
    // Milled 2024-05-10, 2 in thick → 24 months (common practice: a year per inch).
    expect(res.body).toMatchObject({ targetMcPercent: 10, airDryReadyOn: '2026-05-10', slab: { id: slab.id, milledOn: '2024-05-10' } });
  });

  it('is for staff only: visitor 401, buyer 403', async () => {
    const slab = await slabRow(t.db, log, { photo: false });
    expect((await request(t.app).get(`/api/slabs/${slab.id}/moisture-readings`)).status).toBe(401);
    expect((await buyer.agent.get(`/api/slabs/${slab.id}/moisture-readings`)).status).toBe(403);
  });
});

describe('DELETE /api/moisture-readings/:id', () => {
  it('removes the reading, records it in the audit log and recomputes the drying state from what is left', async () => {
    const slab = await slabRow(t.db, log, { mc: 25, photo: false, dryingState: 'air-drying' });
    const added = await seller.agent.post(`/api/slabs/${slab.id}/moisture-readings`).set('Origin', TEST_ORIGIN).send(reading({ mcPercent: 9, confirmed: true }));
    expect(await slabState(slab.id)).toBe('shop-dry');
    const res = await seller.agent.delete(`/api/moisture-readings/${added.body.reading.id}`).set('Origin', TEST_ORIGIN);
    expect(res.status).toBe(200);
    expect(res.body.slab.dryingState).toBe('air-drying');
    expect(await t.db.select().from(moistureReadings).where(eq(moistureReadings.id, added.body.reading.id))).toHaveLength(0);
    const [audit] = await t.db.select().from(auditLog).where(eq(auditLog.action, 'moisture-reading.delete'));
    expect(audit).toMatchObject({ actorId: seller.id, entityId: String(added.body.reading.id), before: { mcPercent: 9 } });
  });

  it('answers 404 for an unknown reading, 401 for a visitor and 403 for a buyer', async () => {
    expect((await seller.agent.delete('/api/moisture-readings/999999').set('Origin', TEST_ORIGIN)).status).toBe(404);
    expect((await request(t.app).delete('/api/moisture-readings/1')).status).toBe(401);
    expect((await buyer.agent.delete('/api/moisture-readings/1').set('Origin', TEST_ORIGIN)).status).toBe(403);
  });
});
