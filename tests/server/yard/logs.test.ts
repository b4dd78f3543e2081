import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow, speciesRow } from '../../helpers/fixtures';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>['agent'];

const goodLog = {
  speciesSlug: 'black-walnut', originNote: 'Storm-felled yard tree, Alder Lane, Fernhollow', felledOn: '2026-03-02',
  milledOn: '2026-03-20', lengthIn: 108, buttDiameterIn: 28, topDiameterIn: 24, sawingMethod: 'live-edge-slabbing',
};

beforeAll(async () => {
  t = await createTestApp();
  await speciesRow(t.db, 'black-walnut');
  seller = (await t.signedInAs('seller')).agent;
});
afterAll(() => t.close());

describe('who may use the log book', () => {
  it('answers 401 to a visitor and 403 to a buyer on every log route', async () => {
    const buyer = (await t.signedInAs('buyer')).agent;
    const calls = [
      (a: request.Agent | ReturnType<typeof request>) => a.get('/api/logs'),
      (a: request.Agent | ReturnType<typeof request>) => a.get('/api/logs/1'),
      (a: request.Agent | ReturnType<typeof request>) => a.post('/api/logs').set('Origin', TEST_ORIGIN).send(goodLog),
      (a: request.Agent | ReturnType<typeof request>) => a.patch('/api/logs/1').set('Origin', TEST_ORIGIN).send({ notes: 'x' }),
    ];
    for (const call of calls) {
      expect((await call(request(t.app))).status).toBe(401);
      expect((await call(buyer)).status).toBe(403);
    }
  });
});

describe('POST /api/logs', () => {
  it('records a log with a generated code in the felling year series', async () => {
    const first = await seller.post('/api/logs').set('Origin', TEST_ORIGIN).send(goodLog);
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ code: 'L-2026-01', species: { slug: 'black-walnut' }, lengthIn: 108, slabCount: 0, slabs: [] });
    const second = await seller.post('/api/logs').set('Origin', TEST_ORIGIN).send(goodLog);
    expect(second.body.code).toBe('L-2026-02');
  });

  it('keeps a code the mill chose, upper-cased, and answers 409 when it is taken', async () => {
    const mine = await seller.post('/api/logs').set('Origin', TEST_ORIGIN).send({ ...goodLog, code: 'ash-north-3' });
    expect(mine.status).toBe(201);
    expect(mine.body.code).toBe('ASH-NORTH-3');
    const again = await seller.post('/api/logs').set('Origin', TEST_ORIGIN).send({ ...goodLog, code: 'ASH-NORTH-3' });
    expect(again.status).toBe(409);
    expect(again.body.error.fieldErrors.code[0]).toMatch(/already used/);
  });

  it('allows a log without a milled date yet', async () => {
    const res = await seller.post('/api/logs').set('Origin', TEST_ORIGIN).send({ ...goodLog, milledOn: null });
    expect(res.status).toBe(201);
    expect(res.body.milledOn).toBeNull();
  });

  it.each([
    [{ lengthIn: -5 }, 'lengthIn'],
    [{ speciesSlug: 'unobtainium' }, 'speciesSlug'],
    [{ sawingMethod: 'chopped' }, 'sawingMethod'],
    [{ topDiameterIn: 30 }, 'topDiameterIn'],
    [{ milledOn: '2026-01-01' }, 'milledOn'],
    [{ felledOn: '2026-02-31' }, 'felledOn'],
  ])('answers 400 with a field error for %o', async (over, field) => {
    const res = await seller.post('/api/logs').set('Origin', TEST_ORIGIN).send({ ...goodLog, ...over });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors[field]).toBeDefined();
  });
});

describe('GET /api/logs and /api/logs/:id', () => {
  it('lists logs with slab counts and shows one log with its slabs in sequence', async () => {
    const log = await logRow(t.db, 'black-walnut');
    await slabRow(t.db, log);
    await slabRow(t.db, log);
    const list = await seller.get('/api/logs');
    expect(list.status).toBe(200);
    expect(list.body.items.find((l: { id: number }) => l.id === log.id).slabCount).toBe(2);
    const one = await seller.get(`/api/logs/${log.id}`);
    expect(one.status).toBe(200);
    expect(one.body.slabs.map((s: { sequenceInLog: number }) => s.sequenceInLog)).toEqual([1, 2]);
    expect((await seller.get('/api/logs/999999')).status).toBe(404);
  });
});

describe('PATCH /api/logs/:id', () => {
  it('records the milled date later and refuses a top wider than the stored butt', async () => {
    const created = (await seller.post('/api/logs').set('Origin', TEST_ORIGIN).send({ ...goodLog, milledOn: null })).body;
    const milled = await seller.patch(`/api/logs/${created.id}`).set('Origin', TEST_ORIGIN).send({ milledOn: '2026-04-10' });
    expect(milled.status).toBe(200);
    expect(milled.body.milledOn).toBe('2026-04-10');
    const bad = await seller.patch(`/api/logs/${created.id}`).set('Origin', TEST_ORIGIN).send({ topDiameterIn: 40 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fieldErrors.topDiameterIn).toBeDefined();
  });
});

describe('changing a log’s species', () => {
  it('answers 409 once the log has slabs, so slabs never disagree with their log', async () => {
    await speciesRow(t.db, 'white-oak');
    const log = await logRow(t.db, 'black-walnut');
    await slabRow(t.db, log);
    const res = await seller.patch(`/api/logs/${log.id}`).set('Origin', TEST_ORIGIN).send({ speciesSlug: 'white-oak' });
    expect(res.status).toBe(409);
    expect(res.body.error.fieldErrors.speciesSlug).toBeDefined();
    const empty = await logRow(t.db, 'black-walnut');
    expect((await seller.patch(`/api/logs/${empty.id}`).set('Origin', TEST_ORIGIN).send({ speciesSlug: 'white-oak' })).body.species.slug).toBe('white-oak');
  });
});
