import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => { t = await createTestApp({ writeLimitPerMinute: 5 }); });
afterAll(() => t.close());

describe('the ceiling on state-changing calls', () => {
  it('answers 429 with a plain message once an address passes its writes per minute, and never limits reads', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 7; i++) {
      statuses.push((await request(t.app).post('/api/slabs/999999/hold').set('Origin', TEST_ORIGIN).send({})).status);
    }
    expect(statuses.slice(0, 5).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(5)).toEqual([429, 429]);
    const limited = await request(t.app).post('/api/slabs/999999/hold').set('Origin', TEST_ORIGIN).send({});
    expect(limited.body.error.code).toBe('too_many_requests');
    for (let i = 0; i < 10; i++) expect((await request(t.app).get('/api/health')).status).toBe(200);
  });
});
