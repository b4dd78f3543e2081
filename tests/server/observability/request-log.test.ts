import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createLogger, maskEmails } from '../../../server/lib/logger';
import { formatLine } from '../../../server/lib/log-format';
import { loggablePath } from '../../../server/lib/request-log';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';

const lines: string[] = [];
const logged = () => lines.map((l) => JSON.parse(l) as Record<string, unknown>);
const logger = createLogger({ level: 'info', destination: { write: (line: string) => { lines.push(line); } } });

let t: TestApp;
beforeAll(async () => { t = await createTestApp({ logger }); });
afterAll(() => t.close());

describe('the request log', () => {
  it('writes one JSON line per request with the id it returns in X-Request-Id, method, route, status and duration', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'white-oak'));
    lines.length = 0;
    const res = await request(t.app).get(`/api/slabs/${slab.id}?sort=price-asc`);
    expect(res.status).toBe(200);
    const id = res.headers['x-request-id'];
    expect(id).toMatch(/^[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}$/);
    const mine = logged().filter((l) => l.reqId === id);
    expect(mine).toHaveLength(1);
    expect(mine[0]).toMatchObject({ level: 'info', method: 'GET', route: '/api/slabs/:id', path: `/api/slabs/${slab.id}`, status: 200 });
    expect(typeof mine[0].ms).toBe('number');
    expect(typeof mine[0].time).toBe('string');
  });

  it('gives every request its own id, error answers included', async () => {
    const a = await request(t.app).get('/api/no-such-thing');
    const b = await request(t.app).get('/api/no-such-thing');
    expect(a.status).toBe(404);
    expect(a.headers['x-request-id']).toBeTruthy();
    expect(a.headers['x-request-id']).not.toBe(b.headers['x-request-id']);
    expect(logged().find((l) => l.reqId === a.headers['x-request-id'])).toMatchObject({ status: 404, path: '/api/no-such-thing' });
  });

  it('never writes passwords, cookies, card tokens or whole e-mail addresses', async () => {
    lines.length = 0;
    const email = 'marguerite.holloway@example.test';
    const password = 'walnut crotch 2417';
    const agent = request.agent(t.app);
    expect((await agent.post('/api/auth/sign-up/email').set('Origin', TEST_ORIGIN).send({ email, password, name: 'Marguerite Holloway' })).status).toBe(200);
    await agent.post('/api/auth/sign-in/email').set('Origin', TEST_ORIGIN).send({ email, password: 'a wrong password' });
    await agent.post('/api/checkout').set('Origin', TEST_ORIGIN).send({ cardToken: 'tok_visa', holdIds: [1], email });
    await agent.get(`/api/slabs?q=${encodeURIComponent(email)}`);
    const text = lines.join('');
    expect(lines.length).toBeGreaterThanOrEqual(4);
    expect(text).not.toContain(email);
    expect(text).not.toContain(password);
    expect(text).not.toContain('tok_visa');
    expect(text).not.toMatch(/session_token|cookie/i);
  });

  it('logs an unexpected failure once, as an error carrying the request id', async () => {
    const broken = await createTestApp({ logger });
    await broken.database.close();
    lines.length = 0;
    const res = await request(broken.app).get('/api/slabs');
    expect(res.status).toBe(500);
    const line = logged().find((l) => l.reqId === res.headers['x-request-id']);
    expect(line).toMatchObject({ level: 'error', status: 500, route: '/api/slabs' });
    expect(line?.err).toBeTruthy();
    expect(logged().filter((l) => l.reqId === res.headers['x-request-id'])).toHaveLength(1);
  });
});

describe('log hygiene helpers', () => {
  it('masks e-mail addresses down to their first letter and domain', () => {
    expect(maskEmails('to priya@example.test and ilse@stickerline.test')).toBe('to p…@example.test and i…@stickerline.test');
  });

  it('drops the query string and masks opaque tokens in logged paths', () => {
    expect(loggablePath('/api/auth/reset-password/Zx81kQ0pLm2n3b4v5c6X7?callbackURL=/reset')).toBe('/api/auth/reset-password/:token');
    expect(loggablePath('/api/slabs/42?species=white-oak')).toBe('/api/slabs/42');
  });

  it('turns a request line into one readable line for development', () => {
    const line = formatLine(JSON.stringify({ level: 'info', time: '2026-04-02T14:02:07.120Z', reqId: '7K3D-Q9XA-2MBF', method: 'GET', route: '/api/slabs/:id', path: '/api/slabs/9', status: 200, ms: 12, msg: 'request' }));
    expect(line).toBe('14:02:07 INFO  GET /api/slabs/:id 200 12 ms [7K3D-Q9XA-2MBF]\n');
  });
});
