import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { slabPhotos } from '../../../server/db/schema/index';
import { HEIC_LIKE, SVG, TEXT, exifHasGpsIfd, phoneJpegWithGps, solid } from './photo-samples';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>;
let log: Awaited<ReturnType<typeof logRow>>;

beforeAll(async () => {
  t = await createTestApp();
  log = await logRow(t.db, 'black-walnut');
  seller = await t.signedInAs('seller');
});
afterAll(() => t.close());

const files = () => fs.readdirSync(t.uploadsDir).sort();
const rowsOf = (slabId: number) => t.db.select().from(slabPhotos).where(eq(slabPhotos.slabId, slabId));
const bareSlab = () => slabRow(t.db, log, { photo: false });
const upload = (slabId: number, parts: Array<[Buffer, string, string?]>) => {
  let req = seller.agent.post(`/api/slabs/${slabId}/photos`).set('Origin', TEST_ORIGIN);
  for (const [buf, filename, contentType = 'image/jpeg'] of parts) req = req.attach('photos', buf, { filename, contentType });
  return req;
};

describe('POST /api/slabs/:id/photos', () => {
  it('when a seller uploads a phone JPEG with GPS, both stored renditions are upright WebP with no EXIF and the first photo becomes the cover', async () => {
    const slab = await bareSlab();
    const source = await phoneJpegWithGps();
    expect(exifHasGpsIfd((await sharp(source).metadata()).exif)).toBe(true);

    const res = await upload(slab.id, [[source, 'IMG_0042.jpg']]);

    expect(res.status).toBe(201);
    const [photo] = res.body.items;
    expect(photo).toMatchObject({ isCover: true, width: 400, height: 800, position: 0 });
    const key = photo.displayUrl.match(/^\/uploads\/([0-9a-f]{32})-display\.webp$/)?.[1];
    expect(key).toBeDefined();
    expect(photo.thumbUrl).toBe(`/uploads/${key}-thumb.webp`);
    for (const name of [`${key}-display.webp`, `${key}-thumb.webp`]) {
      const stored = fs.readFileSync(path.join(t.uploadsDir, name));
      const meta = await sharp(stored).metadata();
      expect(meta.format).toBe('webp');
      expect(meta.exif).toBeUndefined();
      expect(stored.toString('latin1')).not.toMatch(/EXIF|Quillfield|GPS/);
    }
    expect(files().some((f) => f.startsWith('.'))).toBe(false);
    const rows = await rowsOf(slab.id);
    expect(rows).toHaveLength(1);
    expect(rows[0].fileKey).toBe(key);
  });

  it('accepts several PNG and WebP files at once, appends them after existing photos and keeps the existing cover', async () => {
    const slab = await bareSlab();
    await upload(slab.id, [[await solid('jpeg'), 'a.jpg']]);
    const res = await upload(slab.id, [[await solid('png'), 'b.png', 'image/png'], [await solid('webp'), 'c.webp', 'image/webp']]);
    expect(res.status).toBe(201);
    expect(res.body.items.map((p: { position: number; isCover: boolean }) => [p.position, p.isCover])).toEqual([[0, true], [1, false], [2, false]]);
  });

  it('when a text file is named .jpg and sent as image/jpeg, it answers 415 and stores nothing', async () => {
    const slab = await bareSlab();
    const before = files();
    const res = await upload(slab.id, [[TEXT, 'slab.jpg']]);
    expect(res.status).toBe(415);
    expect(res.body.error).toMatchObject({ code: 'unsupported_photo', message: expect.stringMatching(/not a JPEG, PNG, WebP or HEIC/) });
    expect(files()).toEqual(before);
    expect(await rowsOf(slab.id)).toHaveLength(0);
  });

  it('when an SVG is sent as a PNG, it answers 415', async () => {
    const slab = await bareSlab();
    const res = await upload(slab.id, [[SVG, 'drawing.png', 'image/png']]);
    expect(res.status).toBe(415);
    expect(await rowsOf(slab.id)).toHaveLength(0);
  });

  it('when the second file is not a photo, the first file\'s renditions are removed and no rows are saved', async () => {
    const slab = await bareSlab();
    const before = files();
    const res = await upload(slab.id, [[await solid('jpeg', 2000, 1000), 'good.jpg'], [TEXT, 'bad.jpg']]);
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/^Photo 2 \(bad\.jpg\)/);
    expect(files()).toEqual(before);
    expect(await rowsOf(slab.id)).toHaveLength(0);
  });

  it('when a HEIC cannot be decoded here, it answers 415 asking for a JPEG export', async () => {
    const slab = await bareSlab();
    const res = await upload(slab.id, [[HEIC_LIKE, 'IMG_1.HEIC', 'image/heic']]);
    expect(res.status).toBe(415);
    expect(res.body.error).toMatchObject({ code: 'heic_unsupported', message: expect.stringMatching(/HEIC photos can't be converted here yet/) });
  });

  it('when a file is over 15 MB, it answers 413 with the limit in words', async () => {
    const slab = await bareSlab();
    const big = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff]), Buffer.alloc(15 * 1024 * 1024)]);
    const res = await upload(slab.id, [[big, 'huge.jpg']]);
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'photo_too_large', message: expect.stringMatching(/at most 15 MB/) });
  });

  it('when more than 12 files come in one request, it answers 413', async () => {
    const slab = await bareSlab();
    const jpeg = await solid('jpeg', 64, 64);
    const res = await upload(slab.id, Array.from({ length: 13 }, (_, i) => [jpeg, `p${i}.jpg`] as [Buffer, string]));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_many_photos');
  });

  it('when files come in another field, it answers 400', async () => {
    const slab = await bareSlab();
    const res = await seller.agent.post(`/api/slabs/${slab.id}/photos`).set('Origin', TEST_ORIGIN).attach('picture', await solid('jpeg'), 'a.jpg');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('unexpected_field');
  });

  it('when no file is sent, it answers 400', async () => {
    const slab = await bareSlab();
    const res = await seller.agent.post(`/api/slabs/${slab.id}/photos`).set('Origin', TEST_ORIGIN).field('note', 'x');
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors).toHaveProperty('photos');
  });

  it('when the slab already has 11 photos and 2 more arrive, it answers 409 and stores none of them', async () => {
    const slab = await bareSlab();
    await t.db.insert(slabPhotos).values(Array.from({ length: 11 }, (_, i) => ({ slabId: slab.id, fileKey: `cap${slab.id}k${i}`, width: 10, height: 10, position: i, isCover: i === 0 })));
    const before = files();
    const jpeg = await solid('jpeg', 64, 64);
    const res = await upload(slab.id, [[jpeg, 'a.jpg'], [jpeg, 'b.jpg']]);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('photo_limit');
    expect(files()).toEqual(before);
    expect(await rowsOf(slab.id)).toHaveLength(11);
    expect((await upload(slab.id, [[jpeg, 'c.jpg']])).status).toBe(201);
  });

  it('when the slab does not exist, it answers 404', async () => {
    expect((await upload(999999, [[await solid('jpeg', 64, 64), 'a.jpg']])).status).toBe(404);
  });

  it('when a visitor uploads, it answers 401; a buyer, 403 — and nothing is stored', async () => {
    const slab = await bareSlab();
    const buyer = await t.signedInAs('buyer');
    const jpeg = await solid('jpeg', 64, 64);
    expect((await request(t.app).post(`/api/slabs/${slab.id}/photos`).attach('photos', jpeg, 'a.jpg')).status).toBe(401);
    expect((await buyer.agent.post(`/api/slabs/${slab.id}/photos`).set('Origin', TEST_ORIGIN).attach('photos', jpeg, 'a.jpg')).status).toBe(403);
    expect(await rowsOf(slab.id)).toHaveLength(0);
  });
});

describe('GET /uploads/*', () => {
  it('serves a rendition as WebP with long caching, nosniff and a sandbox policy, and never serves temporary dotfiles', async () => {
    const slab = await bareSlab();
    const res = await upload(slab.id, [[await solid('jpeg'), 'a.jpg']]);
    const got = await request(t.app).get(res.body.items[0].displayUrl);
    expect(got.status).toBe(200);
    expect(got.headers['content-type']).toBe('image/webp');
    expect(got.headers['x-content-type-options']).toBe('nosniff');
    expect(got.headers['content-security-policy']).toMatch(/sandbox/);
    expect(got.headers['cache-control']).toMatch(/max-age=31536000.*immutable/);
    fs.writeFileSync(path.join(t.uploadsDir, '.partial-abc-x-display.webp'), 'partial');
    expect((await request(t.app).get('/uploads/.partial-abc-x-display.webp')).status).not.toBe(200);
    fs.rmSync(path.join(t.uploadsDir, '.partial-abc-x-display.webp'));
  });
});
