import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { sql } from 'drizzle-orm';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { createApp } from '../../../server/app';
import { createMailer } from '../../../server/lib/mail';
import { createPayments } from '../../../server/lib/payments';
import { freePort } from '../../../server/lib/free-port';

let t: TestApp;
beforeAll(async () => { t = await createTestApp(); });
afterAll(() => t.close());

describe('GET /api/health and GET /api/ready', () => {
  it('health answers at once without touching anything', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });

  it('ready answers 200 when the database, migrations, mail server and payment service all answer, well under a second', async () => {
    const started = performance.now();
    const res = await request(t.app).get('/api/ready');
    const ms = performance.now() - started;
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toEqual({ ready: true, checks: { database: 'ok', migrations: 'ok', mail: 'ok', payments: 'ok' } });
    expect(ms).toBeLessThan(1000);
  });

  it('ready answers 503 naming the mail server and payment service when they cannot be reached', async () => {
    const deadPort = await freePort();
    const app = createApp({
      db: t.db, auth: t.auth, uploadsDir: t.uploadsDir,
      mailer: createMailer({ host: '127.0.0.1', port: deadPort, from: 'yard@stickerline.test', retries: 1 }),
      payments: createPayments({ secretKey: 'sk_test_local_fake', host: '127.0.0.1', port: deadPort, protocol: 'http', webhookSecret: 'whsec_x' }),
    });
    const started = performance.now();
    const res = await request(app).get('/api/ready');
    expect(performance.now() - started).toBeLessThan(1000);
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ ready: false, checks: { database: 'ok', migrations: 'ok', mail: 'failed', payments: 'failed' } });
  });

  it('ready answers 503 when the database lacks the newest migration', async () => {
    const other = await createTestApp();
    try {
      await other.db.execute(sql`delete from drizzle.__drizzle_migrations where created_at = (select max(created_at) from drizzle.__drizzle_migrations)`);
      const res = await request(other.app).get('/api/ready');
      expect(res.status).toBe(503);
      expect(res.body.checks).toMatchObject({ database: 'ok', migrations: 'failed' });
    } finally {
      await other.close();
    }
  });

  it('ready answers 503 when the database is closed, while health still answers', async () => {
    const other = await createTestApp();
    await other.database.close();
    const res = await request(other.app).get('/api/ready');
    expect(res.status).toBe(503);
    expect(res.body.checks).toMatchObject({ database: 'failed', migrations: 'failed', mail: 'ok', payments: 'ok' });
    expect((await request(other.app).get('/api/health')).status).toBe(200);
  });
});
