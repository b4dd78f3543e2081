import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { slabPhotos } from '../../../server/db/schema/index';

let t: TestApp;
beforeAll(async () => { t = await createTestApp(); });
afterAll(() => t.close());

async function slabWithPhoto() {
  const slab = await slabRow(t.db, await logRow(t.db, 'black-cherry'));
  const [photo] = await t.db.select().from(slabPhotos).where(eq(slabPhotos.slabId, slab.id));
  return { slab, photo };
}

describe('what a photo shows (top face, end grain …)', () => {
  it('the yard labels a photo "end grain" and buyers see that label on the slab page', async () => {
    const { slab, photo } = await slabWithPhoto();
    const seller = await t.signedInAs('seller');
    const res = await seller.agent.patch(`/api/slabs/${slab.id}/photos/${photo.id}`).set('Origin', TEST_ORIGIN).send({ view: 'end-grain' });
    expect(res.status).toBe(200);
    expect(res.body.view).toBe('end-grain');
    const page = await request(t.app).get(`/api/slabs/${slab.id}`);
    expect(page.body.photos[0].view).toBe('end-grain');
    // and the label can be cleared again
    await seller.agent.patch(`/api/slabs/${slab.id}/photos/${photo.id}`).set('Origin', TEST_ORIGIN).send({ view: null });
    expect((await request(t.app).get(`/api/slabs/${slab.id}`)).body.photos[0].view).toBeNull();
  });

  it('an unknown view is refused at the field (400), and the database refuses one written around the API', async () => {
    const { slab, photo } = await slabWithPhoto();
    const seller = await t.signedInAs('seller');
    const res = await seller.agent.patch(`/api/slabs/${slab.id}/photos/${photo.id}`).set('Origin', TEST_ORIGIN).send({ view: 'underside' });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors.view).toEqual(['Choose what the photo shows from the list']);
    await expect(t.db.update(slabPhotos).set({ view: 'underside' }).where(eq(slabPhotos.id, photo.id))).rejects.toThrow();
  });

  it('a buyer cannot label photos (403)', async () => {
    const { slab, photo } = await slabWithPhoto();
    const buyer = await t.signedInAs('buyer');
    expect((await buyer.agent.patch(`/api/slabs/${slab.id}/photos/${photo.id}`).set('Origin', TEST_ORIGIN).send({ view: 'edge' })).status).toBe(403);
  });
});
