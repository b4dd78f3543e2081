import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { auditLog, holds, logs, moistureReadings, slabs } from '../../../server/db/schema/index';
import { millSettingsRow } from '../checkout/checkout-fixtures';
import { solid } from '../photos/photo-samples';
import { WET_LISTING_MARGIN_POINTS } from '../../../shared/slab-input';
import { ROUND_EVERY_DAYS } from '../../../shared/readings';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>;
beforeAll(async () => {
  t = await createTestApp();
  await millSettingsRow(t.db, { targetMcPercent: 8 });
  seller = await t.signedInAs('seller');
});
afterAll(() => t.close());

const del = (p: string, agent = seller.agent) => agent.delete(p).set('Origin', TEST_ORIGIN);
const patch = (id: number, body: object) => seller.agent.patch(`/api/slabs/${id}`).set('Origin', TEST_ORIGIN).send(body);
const audits = (action: string, entityId: number) =>
  t.db.select().from(auditLog).where(and(eq(auditLog.action, action), eq(auditLog.entityId, String(entityId))));
const daysAgo = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString().slice(0, 10);

describe('deleting a slab recorded by mistake', () => {
  it('a slab never put on sale goes, with its readings and photo files, and the audit log keeps what it was', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'black-cherry'), { status: 'drying', photo: false });
    const up = await seller.agent.post(`/api/slabs/${slab.id}/photos`).set('Origin', TEST_ORIGIN).attach('photos', await solid('jpeg', 120, 80), 'a.jpg');
    expect(up.status).toBe(201);
    const file = path.join(t.uploadsDir, path.basename(up.body.items[0].displayUrl));
    expect(fs.existsSync(file)).toBe(true);

    const res = await del(`/api/slabs/${slab.id}`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ deleted: slab.code });
    expect(await t.db.select().from(slabs).where(eq(slabs.id, slab.id))).toEqual([]);
    expect(await t.db.select().from(moistureReadings).where(eq(moistureReadings.slabId, slab.id))).toEqual([]);
    expect(fs.existsSync(file)).toBe(false);
    const [entry] = await audits('slab.delete', slab.id);
    expect(entry).toMatchObject({ actorEmail: seller.email, before: { code: slab.code, status: 'drying', photos: 1 }, after: null });
  });

  it('refuses with 409 and a plain reason a slab that is for sale, was ever listed, or was ever held', async () => {
    const log = await logRow(t.db, 'black-cherry');
    const listed = await slabRow(t.db, log, { status: 'listed' });
    const onceListed = await slabRow(t.db, log, { status: 'ready', listedAt: new Date('2026-01-05T10:00:00Z') });
    const onceHeld = await slabRow(t.db, log, { status: 'ready' });
    const buyer = await t.signedInAs('buyer');
    await t.db.insert(holds).values({ slabId: onceHeld.id, buyerId: buyer.id, status: 'released', createdAt: new Date(Date.now() - 3_600_000), expiresAt: new Date(Date.now() + 3_600_000), closedAt: new Date(), closedBy: buyer.id });

    const answers = await Promise.all([listed, onceListed, onceHeld].map((s) => del(`/api/slabs/${s.id}`)));
    expect(answers.map((a) => a.status)).toEqual([409, 409, 409]);
    expect(answers.map((a) => a.body.error.message)).toEqual([
      `Slab ${listed.code} cannot be deleted: it is or was on sale. Withdraw it instead, so its history stays.`,
      `Slab ${onceListed.code} cannot be deleted: it was put on sale on 2026-01-05. Withdraw it instead, so its history stays.`,
      `Slab ${onceHeld.code} cannot be deleted: a buyer has held it. Withdraw it instead, so its history stays.`,
    ]);
    expect(await t.db.select().from(slabs).where(eq(slabs.logId, log.id))).toHaveLength(3);
  });

  it('buyers cannot delete slabs (403) and an unknown slab is 404', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'black-cherry'), { status: 'drying' });
    const buyer = await t.signedInAs('buyer');
    expect((await del(`/api/slabs/${slab.id}`, buyer.agent)).status).toBe(403);
    expect((await del('/api/slabs/999999')).status).toBe(404);
  });
});

describe('deleting a log recorded by mistake', () => {
  it('a log without slabs goes and is audited; a log with slabs is refused (409) until they are gone', async () => {
    const empty = await logRow(t.db, 'white-oak');
    const res = await del(`/api/logs/${empty.id}`);
    expect(res.status).toBe(200);
    expect(await t.db.select().from(logs).where(eq(logs.id, empty.id))).toEqual([]);
    expect(await audits('log.delete', empty.id)).toHaveLength(1);

    const used = await logRow(t.db, 'white-oak');
    const slab = await slabRow(t.db, used, { status: 'drying' });
    const refused = await del(`/api/logs/${used.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toBe(`Log ${used.code} cannot be deleted: a slab was recorded from it. Delete that slab first (only slabs never put on sale can be deleted).`);
    expect((await del(`/api/slabs/${slab.id}`)).status).toBe(200);
    expect((await del(`/api/logs/${used.id}`)).status).toBe(200);
  });
});

describe('listing a slab well above the target moisture content', () => {
  const wet = 8 + WET_LISTING_MARGIN_POINTS + 0.5;

  it('asks for confirmation first (409 at the status field), then lists it and records the reading it was listed at', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'red-maple'), { status: 'ready', mc: wet });
    const first = await patch(slab.id, { status: 'listed' });
    expect(first.status).toBe(409);
    expect(first.body.error.code).toBe('confirm_wet_listing');
    expect(first.body.error.fieldErrors.status[0]).toContain(`last read ${wet} % moisture content, well above the mill's target of 8 %`);
    expect((await t.db.select().from(slabs).where(eq(slabs.id, slab.id)))[0].status).toBe('ready');

    const second = await patch(slab.id, { status: 'listed', confirmAboveTargetMc: true });
    expect(second.status).toBe(200);
    expect(second.body.status).toBe('listed');
    const [entry] = await audits('slab.status', slab.id);
    expect(entry.after).toEqual({ status: 'listed', listedAboveTargetMcPercent: wet });
  });

  it('a slab at or near the target lists without a question, and bulk listing leaves a wet slab for its own page', async () => {
    const log = await logRow(t.db, 'red-maple');
    const dry = await slabRow(t.db, log, { status: 'ready', mc: 8 + WET_LISTING_MARGIN_POINTS });
    const damp = await slabRow(t.db, log, { status: 'ready', mc: wet });
    expect((await patch(dry.id, { status: 'listed' })).status).toBe(200);
    const bulk = await seller.agent.post('/api/yard/slabs/bulk').set('Origin', TEST_ORIGIN).send({ ids: [damp.id], action: 'list' });
    expect(bulk.body.results).toEqual([expect.objectContaining({ id: damp.id, ok: false, code: 'confirm_wet_listing' })]);
  });
});

describe('defects with where they are', () => {
  it('records the fuller list of defects with face and distance from the butt end, typed as fractions', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const res = await seller.agent.post('/api/slabs').set('Origin', TEST_ORIGIN).send({
      logId: log.id, thicknessIn: '2', widthsIn: ['20', '21'], lengthIn: '96',
      defects: [
        { kind: 'loose-knot', note: 'about 1 in across', face: 'top', fromButtIn: '34 1/2' },
        { kind: 'embedded-metal', note: 'old fence staple', face: 'edge', fromButtIn: '80' },
        { kind: 'shake', note: '', face: null, fromButtIn: '' },
      ],
    });
    expect(res.status).toBe(201);
    expect(res.body.defects).toEqual([
      { kind: 'loose-knot', note: 'about 1 in across', face: 'top', fromButtIn: 34.5 },
      { kind: 'embedded-metal', note: 'old fence staple', face: 'edge', fromButtIn: 80 },
      { kind: 'shake', note: '', face: null, fromButtIn: null },
    ]);
  });

  it('refuses a defect beyond the end of the slab, or a kind not on the list, at the field (400)', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const base = { logId: log.id, thicknessIn: 2, widthsIn: [20, 21], lengthIn: 96 };
    const past = await seller.agent.post('/api/slabs').set('Origin', TEST_ORIGIN).send({ ...base, defects: [{ kind: 'wane', note: '', fromButtIn: 97 }] });
    expect(past.status).toBe(400);
    expect(past.body.error.fieldErrors['defects.0.fromButtIn']).toEqual(['The slab is only 96 in long']);
    const odd = await seller.agent.post('/api/slabs').set('Origin', TEST_ORIGIN).send({ ...base, defects: [{ kind: 'bark-inclusion-ish', note: '' }] });
    expect(odd.status).toBe(400);
    expect(odd.body.error.fieldErrors['defects.0.kind']).toEqual(['Choose the kind of defect from the list']);
  });
});

describe('a moisture round from a stack', () => {
  it('lists the slabs of one stack in yard order, leaving out sold and withdrawn ones', async () => {
    const log = await logRow(t.db, 'sugar-maple');
    const third = await slabRow(t.db, log, { status: 'drying', yardStack: 'Round-A', yardPosition: 'row 1, 10th from top' });
    const first = await slabRow(t.db, log, { status: 'ready', yardStack: 'Round-A', yardPosition: 'row 1, 2nd from top' });
    const second = await slabRow(t.db, log, { status: 'listed', yardStack: 'Round-A', yardPosition: 'row 1, 3rd from top' });
    await slabRow(t.db, log, { status: 'sold', yardStack: 'Round-A', yardPosition: 'row 1, 1st from top' });
    await slabRow(t.db, log, { status: 'withdrawn', yardStack: 'Round-A', yardPosition: 'row 1, 4th from top' });
    const res = await seller.agent.get('/api/yard/moisture-round').query({ stack: 'Round-A' });
    expect(res.status).toBe(200);
    expect(res.body.items.map((s: { code: string }) => s.code)).toEqual([first.code, second.code, third.code]);
    expect(res.body.items[0]).toMatchObject({ speciesName: 'Sugar maple', lastMcPercent: 9 });
    expect((await seller.agent.get('/api/yard/moisture-round')).status).toBe(400);
  });

  it(`says a stack is due when its oldest latest reading is ${ROUND_EVERY_DAYS} days old or a slab has none`, async () => {
    const log = await logRow(t.db, 'sugar-maple');
    const fresh = await slabRow(t.db, log, { status: 'drying', yardStack: 'Round-B', mc: null });
    await t.db.insert(moistureReadings).values({ slabId: fresh.id, measuredOn: daysAgo(3), mcPercent: 30, meterKind: 'pin' });
    const stale = await slabRow(t.db, log, { status: 'drying', yardStack: 'Round-C', mc: null });
    await t.db.insert(moistureReadings).values({ slabId: stale.id, measuredOn: daysAgo(ROUND_EVERY_DAYS + 1), mcPercent: 30, meterKind: 'pin' });
    await slabRow(t.db, log, { status: 'drying', yardStack: 'Round-D', mc: null });
    const { body } = await seller.agent.get('/api/yard/stacks');
    const due = Object.fromEntries(body.items.map((s: { stack: string; due: boolean }) => [s.stack, s.due]));
    expect(due).toMatchObject({ 'Round-B': false, 'Round-C': true, 'Round-D': true });
  });
});
