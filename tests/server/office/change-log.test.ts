import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { slabRow, speciesRow } from '../../helpers/fixtures';
import { solid } from '../photos/photo-samples';
import { eq } from 'drizzle-orm';
import { logs } from '../../../server/db/schema/index';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>;
let admin: Awaited<ReturnType<TestApp['signedInAs']>>;
type Entry = { who: string; what: string; on: { label: string; link: { kind: string; id: number } | null }; whenAtMill: string; action: string };

beforeAll(async () => {
  t = await createTestApp();
  await speciesRow(t.db, 'black-walnut');
  seller = await t.signedInAs('seller', 'Ilse Marrow');
  admin = await t.signedInAs('admin', 'Oren Pask');
});
afterAll(() => t.close());

const entries = async (q = '') => (await admin.agent.get(`/api/office/audit${q}`)).body.items as Entry[];

describe('the change log reads as sentences', () => {
  it('records new logs, photos, readings and role changes, naming who, what in words, on which log or slab (linked), and when at the mill', async () => {
    const created = await seller.agent.post('/api/logs').set('Origin', TEST_ORIGIN).send({
      speciesSlug: 'black-walnut', originNote: 'Wind-thrown at the Tolley orchard, Varrow Valley', felledOn: '2025-03-02',
      milledOn: '2025-03-20', lengthIn: 108, buttDiameterIn: 28, topDiameterIn: 24, sawingMethod: 'live-edge-slabbing',
    });
    expect(created.status).toBe(201);
    expect((await seller.agent.patch(`/api/logs/${created.body.id}`).set('Origin', TEST_ORIGIN).send({ notes: 'Nail in the butt end' })).status).toBe(200);
    const [logRowStored] = await t.db.select().from(logs).where(eq(logs.id, created.body.id));
    const slab = await slabRow(t.db, logRowStored, { mc: null, photo: false });
    const photo = await seller.agent.post(`/api/slabs/${slab.id}/photos`).set('Origin', TEST_ORIGIN).attach('photos', await solid('jpeg'), { filename: 'face.jpg', contentType: 'image/jpeg' });
    expect(photo.status).toBe(201);
    const today = new Date().toISOString().slice(0, 10);
    expect((await seller.agent.post(`/api/slabs/${slab.id}/moisture-readings`).set('Origin', TEST_ORIGIN)
      .send({ measuredOn: today, mcPercent: 12, meterKind: 'pin', location: 'middle' })).status).toBe(201);
    const buyer = await t.signedInAs('buyer', 'Wren Hollis');
    expect((await admin.agent.patch(`/api/office/users/${buyer.id}`).set('Origin', TEST_ORIGIN).send({ role: 'seller' })).status).toBe(200);

    const log = await entries();
    const find = (action: string) => log.find((e) => e.action === action)!;
    expect(find('log.create')).toMatchObject({ who: 'Ilse Marrow', what: 'Recorded the log', on: { label: `log ${created.body.code}`, link: { kind: 'log', id: created.body.id } } });
    expect(find('log.update').what).toBe("Changed the log's notes");
    expect(find('slab-photo.add')).toMatchObject({ who: 'Ilse Marrow', what: 'Added 1 photo', on: { label: `slab ${slab.code}`, link: { kind: 'slab', id: slab.id } } });
    expect(find('moisture-reading.create')).toMatchObject({
      who: 'Ilse Marrow', what: `Recorded a reading of 12 % moisture content (pin meter, measured ${today})`, on: { label: `slab ${slab.code}` },
    });
    expect(find('user.role')).toMatchObject({ who: 'Oren Pask', what: 'Changed the role from buyer to seller', on: { label: "Wren Hollis's account", link: null } });
    // Mill time: the test shop runs on UTC unless MILL_TIME_ZONE says otherwise.
    expect(find('log.create').whenAtMill).toMatch(/\d{4}, \d{2}:\d{2} \(UTC\)$/);
    // No raw records or internal ids on the page.
    for (const e of log) {
      expect(e.what).not.toMatch(/[{}"]|\bid\b/);
      expect(e).not.toHaveProperty('before');
      expect(e).not.toHaveProperty('after');
    }
  });
});
