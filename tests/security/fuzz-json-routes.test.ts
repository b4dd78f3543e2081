import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { sql } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../helpers/test-app';
import { logRow, slabRow } from '../helpers/fixtures';
import { moistureReadings, slabPhotos } from '../../server/db/schema/index';
import { eq } from 'drizzle-orm';
import { listRoutes } from './route-list';
import { ACCESS, ALLOWED_ROLE } from './access-table';
import { badBody, sharedFieldNames } from './bad-input';

// Tables whose rows the auth library itself may touch on any request (session refresh).
const VOLATILE = new Set(['session', 'verification', 'rate_limit']);

let t: TestApp;
let fields: string[];
const agents: Record<string, ReturnType<typeof request.agent>> = {};
const params: Record<string, string> = {};

beforeAll(async () => {
  t = await createTestApp();
  fields = await sharedFieldNames();
  agents.visitor = request.agent(t.app);
  for (const role of ['buyer', 'seller', 'admin'] as const) agents[role] = (await t.signedInAs(role)).agent;
  // Real ids, so bad bodies are judged by the route itself rather than stopped at "not found".
  const log = await logRow(t.db, 'black-walnut');
  const slab = await slabRow(t.db, log);
  const [photo] = await t.db.select().from(slabPhotos).where(eq(slabPhotos.slabId, slab.id));
  const [reading] = await t.db.select().from(moistureReadings).where(eq(moistureReadings.slabId, slab.id));
  Object.assign(params, { id: String(slab.id), photoId: String(photo.id) });
  params.readingId = String(reading.id);
});
afterAll(() => t.close());

/** One digest of every row of every table (bar the auth library's volatile ones). */
async function databaseDigest(): Promise<string> {
  const tables = (await t.db.execute(sql`select table_name as name from information_schema.tables where table_schema = 'public' order by 1`)) as unknown as { rows: { name: string }[] };
  const parts: string[] = [];
  for (const { name } of tables.rows) {
    if (VOLATILE.has(name)) continue;
    const res = (await t.db.execute(sql.raw(`select md5(coalesce(string_agg(x::text, '|' order by x::text), '')) as d, count(*)::int as n from "${name}" x`))) as unknown as { rows: { d: string; n: number }[] };
    parts.push(`${name}:${res.rows[0].n}:${res.rows[0].d}`);
  }
  return parts.join('\n');
}

const jsonWriteRoutes = () => listRoutes(t.app).filter((r) => {
  const access = ACCESS[`${r.method} ${r.path}`];
  return ['POST', 'PUT', 'PATCH', 'DELETE'].includes(r.method) && access && access !== 'auth-lib' && access !== 'signature';
});

describe('every JSON route given bad input', () => {
  it('answers 4xx with a JSON error, never a 5xx, and changes no row — as a visitor and as the allowed role', async () => {
    const routes = jsonWriteRoutes();
    expect(routes.length).toBeGreaterThan(15);
    const before = await databaseDigest();
    const wrong: string[] = [];
    for (const r of routes) {
      const access = ACCESS[`${r.method} ${r.path}`] as keyof typeof ALLOWED_ROLE;
      const callers = ['visitor', ALLOWED_ROLE[access]].filter((c): c is string => !!c);
      const path = r.path.replace(/:([A-Za-z]+)/g, (_, name: string) => (r.path.includes('moisture-readings/:id') ? params.readingId : params[name] ?? '1'));
      await fc.assert(fc.asyncProperty(fc.constantFrom(...callers), badBody(fields), async (who, body) => {
        const m = r.method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
        const res = await agents[who][m](path).set('Origin', TEST_ORIGIN).set('Content-Type', 'application/json').send(body);
        // Requests the sign-in gate passes on are answered by the auth library, in its own error shape.
        const explained = typeof res.body?.error?.code === 'string' || (r.path.startsWith('/api/auth/') && typeof res.body?.message === 'string');
        const fine = res.status >= 400 && res.status < 500 && /json/.test(res.headers['content-type'] ?? '') && explained;
        if (!fine) wrong.push(`${r.method} ${path} as ${who} → ${res.status} ${res.text.slice(0, 120)} for ${body.slice(0, 80)}`);
        return true;
      }), { numRuns: 12, seed: 20240601 });
    }
    expect(wrong).toEqual([]);
    expect(await databaseDigest()).toBe(before);
  }, 600_000);

  it('answers bad query strings on the public catalogue with 4xx JSON or a normal page, never a 5xx', async () => {
    const junk = fc.oneof(fc.string({ maxLength: 40 }), fc.constantFrom('-1', 'NaN', '1e309', '[]', '0x10', '9'.repeat(400)));
    const keys = fc.constantFrom('page', 'pageSize', 'sort', 'species', 'minThicknessIn', 'maxPriceCents', 'liveEdge', 'availability', 'q', 'logId', 'species[]', 'page[$gt]');
    await fc.assert(fc.asyncProperty(fc.dictionary(keys, junk, { minKeys: 1, maxKeys: 4 }), async (query) => {
      const res = await request(t.app).get('/api/slabs').query(query);
      expect(res.status, JSON.stringify(query)).toBeLessThan(500);
      expect(res.headers['content-type']).toMatch(/json/);
    }), { numRuns: 60, seed: 20240602 });
  }, 300_000);
});
