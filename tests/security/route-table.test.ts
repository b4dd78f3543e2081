import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../helpers/test-app';
import { logRow, slabRow } from '../helpers/fixtures';
import { orders } from '../../server/db/schema/index';
import { listRoutes } from './route-list';
import { ACCESS, type Access } from './access-table';

type Who = 'visitor' | 'buyer' | 'otherBuyer' | 'seller' | 'admin';
const WHO: Who[] = ['visitor', 'buyer', 'otherBuyer', 'seller', 'admin'];
/** 'ok' = let through: any answer but 401/403, and never a 5xx. */
const EXPECT: Record<Exclude<Access, 'auth-lib'>, Record<Who, 401 | 403 | 'ok' | '4xx'>> = {
  public: { visitor: 'ok', buyer: 'ok', otherBuyer: 'ok', seller: 'ok', admin: 'ok' },
  'signed-in': { visitor: 401, buyer: 'ok', otherBuyer: 'ok', seller: 'ok', admin: 'ok' },
  staff: { visitor: 401, buyer: 403, otherBuyer: 403, seller: 'ok', admin: 'ok' },
  admin: { visitor: 401, buyer: 403, otherBuyer: 403, seller: 403, admin: 'ok' },
  signature: { visitor: '4xx', buyer: '4xx', otherBuyer: '4xx', seller: '4xx', admin: '4xx' },
};

let t: TestApp;
const agents = {} as Record<Who, ReturnType<typeof request.agent>>;
const ids = {} as Record<Who, string>;
beforeAll(async () => {
  t = await createTestApp();
  agents.visitor = request.agent(t.app);
  for (const who of ['buyer', 'otherBuyer', 'seller', 'admin'] as const) {
    const s = await t.signedInAs(who === 'otherBuyer' ? 'buyer' : who);
    agents[who] = s.agent;
    ids[who] = s.id;
  }
});
afterAll(() => t.close());

const routes = () => listRoutes(t.app).filter((r) => r.path.startsWith('/api/'));
// Ids that exist nowhere: the role check must answer before any lookup could.
const concrete = (path: string) => path.replace(/:[A-Za-z]+/g, '999999');

function send(who: Who, method: string, path: string) {
  const agent = agents[who];
  const m = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  const req = agent[m](path);
  return m === 'get' ? req : req.set('Origin', TEST_ORIGIN).send({});
}

describe('the API route table', () => {
  it('lists every route the app answers, and names no route that is gone', () => {
    const found = routes().map((r) => `${r.method} ${r.path}`);
    const unlisted = found.filter((k) => !(k in ACCESS));
    expect(unlisted, 'new routes: add each to ACCESS in tests/security/route-table.test.ts').toEqual([]);
    const gone = Object.keys(ACCESS).filter((k) => !found.includes(k));
    expect(gone, 'routes in ACCESS that the app no longer has').toEqual([]);
  });

  it('answers each route for visitor, buyer, other buyer, seller and admin as the table says', async () => {
    const wrong: string[] = [];
    for (const r of routes()) {
      const access = ACCESS[`${r.method} ${r.path}`];
      if (!access || access === 'auth-lib') continue;
      await Promise.all(WHO.map(async (who) => {
        const res = await send(who, r.method, concrete(r.path));
        const want = EXPECT[access][who];
        const ok = want === 'ok' ? res.status !== 401 && res.status !== 403 && res.status < 500
          : want === '4xx' ? res.status >= 400 && res.status < 500
            : res.status === want;
        if (!ok) wrong.push(`${r.method} ${r.path} as ${who}: ${res.status}, expected ${want}`);
      }));
    }
    expect(wrong).toEqual([]);
  }, 300_000); // some 300 requests, one route at a time
});

describe("a buyer's own holds and orders", () => {
  it("when another buyer asks for or releases someone else's hold, it is not found and the hold stays", async () => {
    const log = await logRow(t.db, 'black-cherry');
    const slab = await slabRow(t.db, log);
    const placed = await agents.buyer.post(`/api/slabs/${slab.id}/hold`).set('Origin', TEST_ORIGIN).send({});
    expect(placed.status).toBe(201);
    const holdId = placed.body.hold.id;

    const theirs = await agents.otherBuyer.get('/api/holds');
    expect(theirs.body.holds.map((h: { id: number }) => h.id)).not.toContain(holdId);
    const release = await agents.otherBuyer.delete(`/api/holds/${holdId}`).set('Origin', TEST_ORIGIN);
    expect([403, 404]).toContain(release.status);
    const mine = await agents.buyer.get('/api/holds');
    expect(mine.body.holds.find((h: { id: number }) => h.id === holdId)).toMatchObject({ status: 'active' });
  });

  it("when another buyer asks for someone else's order, it is not found", async () => {
    const [order] = await t.db.insert(orders).values({
      code: 'SEC-1', buyerId: ids.buyer, status: 'paid', slabsCents: 10_000, totalCents: 10_000,
      totalWeightLb: 40, longestSlabIn: 96, idempotencyKey: 'route-table-order-1',
    }).returning();
    const own = await agents.buyer.get(`/api/orders/${order.id}`);
    expect(own.status).toBe(200);
    const other = await agents.otherBuyer.get(`/api/orders/${order.id}`);
    expect([403, 404]).toContain(other.status);
    const list = await agents.otherBuyer.get('/api/orders');
    expect(JSON.stringify(list.body)).not.toContain('SEC-1');
  });
});
