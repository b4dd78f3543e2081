import os from 'node:os';
import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { inject } from 'vitest';
import { createApp } from '../../server/app';
import { createAuth, type Role } from '../../server/lib/auth';
import { createMailer } from '../../server/lib/mail';
import { createPayments } from '../../server/lib/payments';
import type { TrustProxy } from '../../server/lib/trust-proxy';
import type { Logger } from '../../server/lib/logger';
import { user } from '../../server/db/schema/index';
import { freshDatabase } from './test-db';

export const TEST_ORIGIN = 'http://localhost:3000';
/** Signs provider events in webhook tests. */
export const TEST_WEBHOOK_SECRET = 'whsec_test_only_secret';
let counter = 0;

/** The real app on a fresh database, with the run's mail catcher; close() in afterAll. */
export type TestAppOptions = {
  signInLimitPerMinute?: number;
  holdHours?: number;
  writeLimitPerMinute?: number;
  /** The shop's address (default TEST_ORIGIN) and every origin it trusts (default just that one). */
  publicUrl?: string;
  trustedOrigins?: string[];
  /** Default 'loopback': supertest connects over loopback, so tests can pose as clients behind a proxy. */
  trustProxy?: TrustProxy;
  /** Where request lines go (tests that read the log); default the process logger. */
  logger?: Logger;
};

export async function createTestApp(opts: TestAppOptions = {}) {
  const publicUrl = opts.publicUrl ?? TEST_ORIGIN;
  const trustedOrigins = opts.trustedOrigins ?? [publicUrl];
  const database = await freshDatabase();
  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-uploads-'));
  const mailer = createMailer({ host: '127.0.0.1', port: inject('smtpPort'), from: 'Stickerline <yard@stickerline.test>' });
  const auth = createAuth({
    db: database.db, secret: 'test-secret-test-secret-test-secret!', baseURL: publicUrl, trustedOrigins, mailer,
    signInLimitPerMinute: opts.signInLimitPerMinute ?? 1000,
  });
  const payments = createPayments({ secretKey: 'sk_test_local_fake', host: '127.0.0.1', port: inject('stripePort'), protocol: 'http', webhookSecret: TEST_WEBHOOK_SECRET });
  const app = createApp({ db: database.db, auth, mailer, payments, uploadsDir, trustedOrigins, holdHours: opts.holdHours,
    writeLimitPerMinute: opts.writeLimitPerMinute ?? 0, trustProxy: opts.trustProxy ?? ['loopback'], logger: opts.logger });

  /** Signs up a new account with `role` and returns a cookie-keeping agent for it. */
  async function signedInAs(role: Role, name = `${role} ${++counter}`) {
    const email = `${role}-${Date.now()}-${++counter}@example.test`;
    const password = 'correct horse battery';
    const agent = request.agent(app);
    const res = await agent.post('/api/auth/sign-up/email').set('Origin', publicUrl).send({ email, password, name });
    if (res.status !== 200) throw new Error(`sign-up failed: ${res.status} ${res.text}`);
    const [row] = await database.db.update(user).set({ role }).where(eq(user.email, email)).returning();
    return { agent, email, password, id: row.id, name };
  }

  return {
    app, db: database.db, database, auth, mailer, payments, uploadsDir, signedInAs,
    async close() {
      mailer.close();
      await database.close();
      fs.rmSync(uploadsDir, { recursive: true, force: true });
    },
  };
}

export type TestApp = Awaited<ReturnType<typeof createTestApp>>;

/** Reads the mail catcher's messages to one address (through maildev's REST API). */
export async function mailTo(address: string): Promise<Array<{ subject: string; html: string; text: string; to: { address: string }[] }>> {
  const res = await fetch(`http://127.0.0.1:${inject('mailWebPort')}/api/email`);
  const all = (await res.json()) as Array<{ subject: string; html: string; text: string; to: { address: string }[] }>;
  return all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
}

/** Polls the mail catcher until a message to `address` matches, or fails after `timeoutMs`. */
export async function waitForMail(address: string, match: (m: { subject: string }) => boolean = () => true, timeoutMs = 5000) {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const found = (await mailTo(address)).find(match);
    if (found) return found;
    if (Date.now() > until) throw new Error(`no matching e-mail to ${address} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}
