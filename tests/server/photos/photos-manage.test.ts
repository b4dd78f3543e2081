import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { auditLog } from '../../../server/db/schema/index';
import { solid } from './photo-samples';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>;
let buyer: Awaited<ReturnType<TestApp['signedInAs']>>;
let log: Awaited<ReturnType<typeof logRow>>;
type Photo = { id: number; isCover: boolean; position: number; displayUrl: string; thumbUrl: string; altText: string };

beforeAll(async () => {
  t = await createTestApp();
  log = await logRow(t.db, 'black-cherry');
  seller = await t.signedInAs('seller');
  buyer = await t.signedInAs('buyer');
});
afterAll(() => t.close());

/** A slab with three uploaded photos: [cover, second, third]. */
async function slabWithThree() {
  const slab = await slabRow(t.db, log, { photo: false });
  const jpeg = await solid('jpeg', 120, 80);
  const res = await seller.agent.post(`/api/slabs/${slab.id}/photos`).set('Origin', TEST_ORIGIN)
    .attach('photos', jpeg, 'a.jpg').attach('photos', jpeg, 'b.jpg').attach('photos', jpeg, 'c.jpg');
  expect(res.status).toBe(201);
  return { slab, photos: res.body.items as Photo[] };
}
const list = async (slabId: number) => (await seller.agent.get(`/api/slabs/${slabId}/photos`)).body.items as Photo[];
const exists = (url: string) => fs.existsSync(path.join(t.uploadsDir, path.basename(url)));

describe('PATCH /api/slabs/:id/photos/:photoId', () => {
  it('when a seller makes the third photo the cover, it is the only cover and the public slab page leads with it', async () => {
    const { slab, photos } = await slabWithThree();
    const res = await seller.agent.patch(`/api/slabs/${slab.id}/photos/${photos[2].id}`).set('Origin', TEST_ORIGIN).send({ isCover: true, altText: 'Book-matched pair, oiled' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: photos[2].id, isCover: true, altText: 'Book-matched pair, oiled' });
    expect((await list(slab.id)).map((p) => p.isCover)).toEqual([false, false, true]);
    const page = await request(t.app).get(`/api/slabs/${slab.id}`);
    expect(page.body.coverPhotoUrl).toBe(photos[2].displayUrl);
  });

  it('answers 400 for unknown fields or a cover set to false, and 404 for a photo of another slab', async () => {
    const { slab, photos } = await slabWithThree();
    const other = await slabWithThree();
    expect((await seller.agent.patch(`/api/slabs/${slab.id}/photos/${photos[0].id}`).set('Origin', TEST_ORIGIN).send({ isCover: false })).status).toBe(400);
    expect((await seller.agent.patch(`/api/slabs/${slab.id}/photos/${photos[0].id}`).set('Origin', TEST_ORIGIN).send({ fileKey: 'x' })).status).toBe(400);
    expect((await seller.agent.patch(`/api/slabs/${slab.id}/photos/${other.photos[0].id}`).set('Origin', TEST_ORIGIN).send({ altText: 'x' })).status).toBe(404);
  });
});

describe('POST /api/slabs/:id/photos/order', () => {
  it('when a seller sends a new order, the positions follow it', async () => {
    const { slab, photos } = await slabWithThree();
    const order = [photos[2].id, photos[0].id, photos[1].id];
    const res = await seller.agent.post(`/api/slabs/${slab.id}/photos/order`).set('Origin', TEST_ORIGIN).send({ photoIds: order });
    expect(res.status).toBe(200);
    expect(res.body.items.map((p: Photo) => p.id)).toEqual(order);
  });

  it('when the list misses a photo or names another slab\'s photo, it answers 409 and keeps the old order', async () => {
    const { slab, photos } = await slabWithThree();
    const other = await slabWithThree();
    const missing = await seller.agent.post(`/api/slabs/${slab.id}/photos/order`).set('Origin', TEST_ORIGIN).send({ photoIds: [photos[1].id, photos[0].id] });
    expect(missing.status).toBe(409);
    const foreign = await seller.agent.post(`/api/slabs/${slab.id}/photos/order`).set('Origin', TEST_ORIGIN).send({ photoIds: [photos[1].id, photos[0].id, other.photos[0].id] });
    expect(foreign.status).toBe(409);
    expect((await list(slab.id)).map((p) => p.id)).toEqual(photos.map((p) => p.id));
  });

  it('when the body is not a list of ids, it answers 400', async () => {
    const { slab, photos } = await slabWithThree();
    const res = await seller.agent.post(`/api/slabs/${slab.id}/photos/order`).set('Origin', TEST_ORIGIN).send({ photoIds: [photos[0].id, photos[0].id, 'x'] });
    expect(res.status).toBe(400);
  });
});

describe('DELETE /api/slabs/:id/photos/:photoId', () => {
  it('when the cover is deleted, its files go, the next photo becomes the cover and the removal is audited', async () => {
    const { slab, photos } = await slabWithThree();
    const res = await seller.agent.delete(`/api/slabs/${slab.id}/photos/${photos[0].id}`).set('Origin', TEST_ORIGIN);
    expect(res.status).toBe(200);
    expect(res.body.items.map((p: Photo) => [p.id, p.isCover])).toEqual([[photos[1].id, true], [photos[2].id, false]]);
    expect(exists(photos[0].displayUrl)).toBe(false);
    expect(exists(photos[0].thumbUrl)).toBe(false);
    expect(exists(photos[1].displayUrl)).toBe(true);
    const audits = await t.db.select().from(auditLog).where(eq(auditLog.action, 'slab-photo.delete'));
    expect(audits.some((a) => a.entityId === String(slab.id) && a.actorId === seller.id)).toBe(true);
  });

  it('when the last photo is deleted, the slab has none and no cover', async () => {
    const slab = await slabRow(t.db, log, { photo: false });
    const up = await seller.agent.post(`/api/slabs/${slab.id}/photos`).set('Origin', TEST_ORIGIN).attach('photos', await solid('png', 50, 50), 'a.png');
    const res = await seller.agent.delete(`/api/slabs/${slab.id}/photos/${up.body.items[0].id}`).set('Origin', TEST_ORIGIN);
    expect(res.body.items).toEqual([]);
    expect((await seller.agent.delete(`/api/slabs/${slab.id}/photos/${up.body.items[0].id}`).set('Origin', TEST_ORIGIN)).status).toBe(404);
  });
});

describe('photo management is for staff only', () => {
  it('answers 401 to visitors and 403 to buyers on every route', async () => {
    const { slab, photos } = await slabWithThree();
    const base = `/api/slabs/${slab.id}/photos`;
    const calls = [
      (a: request.Agent | ReturnType<typeof request>) => a.get(base),
      (a: request.Agent | ReturnType<typeof request>) => a.patch(`${base}/${photos[0].id}`).send({ altText: 'x' }),
      (a: request.Agent | ReturnType<typeof request>) => a.post(`${base}/order`).send({ photoIds: photos.map((p) => p.id) }),
      (a: request.Agent | ReturnType<typeof request>) => a.delete(`${base}/${photos[0].id}`),
    ];
    for (const call of calls) {
      expect((await call(request(t.app))).status).toBe(401);
      expect((await call(buyer.agent).set('Origin', TEST_ORIGIN)).status).toBe(403);
    }
    expect(await list(slab.id)).toHaveLength(3);
  });
});
