import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import type { Role } from '../../../server/lib/auth';

/**
 * Who may call each protected route. Add a row whenever a protected route is added.
 * `signed-in` = any account; otherwise the roles listed. Ids point at rows that do not exist, so
 * allowed callers get 400/404 from the handler and nothing changes; what matters here is that
 * visitors get 401 and other roles 403 before any handler runs.
 */
type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';
type Row = [Method, string, 'signed-in' | Role[]];
const NONE = 999_999;
const STAFF: Role[] = ['seller', 'admin'];
const ADMIN: Role[] = ['admin'];

const MATRIX: Row[] = [
  // buyer side: holds, checkout, orders, pickups
  ['post', `/api/slabs/${NONE}/hold`, 'signed-in'],
  ['post', '/api/holds/matched-set', 'signed-in'],
  ['get', '/api/holds', 'signed-in'],
  ['delete', `/api/holds/${NONE}`, 'signed-in'],
  ['post', '/api/checkout', 'signed-in'],
  ['get', '/api/orders', 'signed-in'],
  ['get', `/api/orders/${NONE}`, 'signed-in'],
  ['post', `/api/orders/${NONE}/payment-check`, 'signed-in'],
  ['post', `/api/orders/${NONE}/payment-cancel`, 'signed-in'],
  ['get', '/api/account/resale-certificate', 'signed-in'],
  ['put', '/api/account/resale-certificate', 'signed-in'],
  ['get', '/api/office/sales-terms', ADMIN],
  ['put', '/api/office/sales-terms', ADMIN],
  ['get', '/api/office/resale-certificates', ADMIN],
  ['post', `/api/office/resale-certificates/${NONE}/review`, ADMIN],
  ['get', '/api/pickup-slots', 'signed-in'],
  // yard desk (mill staff)
  ['get', '/api/logs', STAFF],
  ['post', '/api/logs', STAFF],
  ['get', `/api/logs/${NONE}`, STAFF],
  ['patch', `/api/logs/${NONE}`, STAFF],
  ['post', '/api/slabs', STAFF],
  ['patch', `/api/slabs/${NONE}`, STAFF],
  ['get', '/api/yard/slabs', STAFF],
  ['get', '/api/yard/slabs.csv', STAFF],
  ['post', '/api/yard/slabs/bulk', STAFF],
  ['get', `/api/yard/slabs/${NONE}`, STAFF],
  ['post', '/api/figure-kinds', STAFF],
  ['get', `/api/slabs/${NONE}/moisture-readings`, STAFF],
  ['post', `/api/slabs/${NONE}/moisture-readings`, STAFF],
  ['post', '/api/moisture-readings/batch', STAFF],
  ['delete', `/api/moisture-readings/${NONE}`, STAFF],
  ['get', `/api/slabs/${NONE}/photos`, STAFF],
  ['post', `/api/slabs/${NONE}/photos`, STAFF],
  ['post', `/api/slabs/${NONE}/photos/order`, STAFF],
  ['patch', `/api/slabs/${NONE}/photos/${NONE}`, STAFF],
  ['delete', `/api/slabs/${NONE}/photos/${NONE}`, STAFF],
  // office (admins)
  ['get', '/api/office/users', ADMIN],
  ['patch', '/api/office/users/no-such-user', ADMIN],
  ['get', '/api/office/holds', ADMIN],
  ['delete', `/api/office/holds/${NONE}`, ADMIN],
  ['get', '/api/office/orders', ADMIN],
  ['get', `/api/office/orders/${NONE}`, ADMIN],
  ['post', `/api/office/orders/${NONE}/refunds`, ADMIN],
  ['post', `/api/office/orders/${NONE}/picked-up`, ADMIN],
  ['post', `/api/office/orders/${NONE}/no-show`, ADMIN],
  ['post', `/api/office/orders/${NONE}/reschedule`, ADMIN],
  ['get', '/api/office/pickups', ADMIN],
  ['get', '/api/office/numbers', ADMIN],
  ['get', '/api/office/audit', ADMIN],
  ['get', '/api/pickup-settings', ADMIN],
  ['put', '/api/pickup-settings', ADMIN],
  ['get', '/api/office/mill-rules', ADMIN],
  ['put', '/api/office/mill-rules', ADMIN],
  // the auth library's own admin endpoints
  ['get', '/api/auth/admin/list-users', ADMIN],
];

const ROLES: Role[] = ['buyer', 'seller', 'admin'];
let t: TestApp;
const agents = {} as Record<Role, Awaited<ReturnType<TestApp['signedInAs']>>['agent']>;

beforeAll(async () => {
  t = await createTestApp();
  for (const role of ROLES) agents[role] = (await t.signedInAs(role)).agent;
});
afterAll(() => t.close());

const call = (agent: ReturnType<typeof request> | (typeof agents)[Role], method: Method, path: string) => {
  const req = agent[method](path).set('Origin', TEST_ORIGIN);
  return method === 'get' || method === 'delete' ? req : req.send({});
};

describe('role matrix over the protected routes', () => {
  it.each(MATRIX)('%s %s: visitors 401, other roles 403, allowed roles get past the check', async (method, path, allowed) => {
    const visitor = await call(request(t.app), method, path);
    expect(visitor.status, `visitor ${method} ${path}`).toBe(401);
    for (const role of ROLES) {
      const res = await call(agents[role], method, path);
      const mayCall = allowed === 'signed-in' || allowed.includes(role);
      if (mayCall) expect([401, 403], `${role} ${method} ${path} → ${res.status}`).not.toContain(res.status);
      else expect(res.status, `${role} ${method} ${path}`).toBe(403);
    }
  });
});
