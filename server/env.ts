import { z } from 'zod';
import { parseTrustProxy } from './lib/trust-proxy';

const port = z.coerce.number().int().min(0).max(65535);

/** Comma-separated web origins (scheme://host[:port]); each must be an http(s) URL. */
const originList = z.string().transform((raw, ctx) => {
  const out: string[] = [];
  for (const item of raw.split(',').map((s) => s.trim()).filter(Boolean)) {
    let url: URL | null = null;
    try { url = new URL(item); } catch { /* reported below */ }
    if (!url || (url.protocol !== 'http:' && url.protocol !== 'https:')) {
      ctx.addIssue({ code: 'custom', message: `"${item}" is not an http(s) address such as https://shop.example` });
      return z.NEVER;
    }
    out.push(url.origin);
  }
  return out;
});

/** Every setting the server reads from the environment; see .env.example. Bad config refuses to start. */
export const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: port.default(3000),
  HOST: z.string().default('127.0.0.1'),
  PUBLIC_URL: z.url().optional(),
  /** More origins allowed to sign in and send changes, beside PUBLIC_URL (e.g. the yard's LAN address). */
  TRUSTED_ORIGINS: originList.default([]),
  /** Unset: X-Forwarded-* headers are ignored. Set it only behind a reverse proxy; see lib/trust-proxy.ts. */
  TRUST_PROXY: z.string().optional().transform((raw, ctx) => {
    const parsed = parseTrustProxy(raw);
    if (parsed instanceof Error) { ctx.addIssue({ code: 'custom', message: parsed.message }); return z.NEVER; }
    return parsed;
  }),
  DATA_DIR: z.string().default('data'),
  DATABASE_URL: z.string().optional(),
  UPLOADS_DIR: z.string().default('uploads'),
  BETTER_AUTH_SECRET: z.string().min(32).optional(),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: port.optional(),
  MAIL_FROM: z.string().default('Stickerline <yard@stickerline.test>'),
  MAILDEV_WEB_PORT: port.optional(),
  START_LOCAL_FAKES: z.enum(['true', 'false']).optional(),
  STRIPE_SECRET_KEY: z.string().default('sk_test_local_fake'),
  STRIPE_HOST: z.string().optional(),
  STRIPE_PORT: port.optional(),
  STRIPE_PROTOCOL: z.enum(['http', 'https']).optional(),
  STRIPE_WEBHOOK_SECRET: z.string().default('whsec_local_development_only'),
  /** Write the demo yard into an empty database. Unset means yes outside production; production requires an explicit false. */
  SEED_DEMO: z.enum(['true', 'false']).optional(),
  /** Production only: true accepts a test-mode payment key on purpose (a rehearsal shop). */
  PAYMENTS_TEST_MODE: z.enum(['true', 'false']).optional(),
  /** Production only: true when a real mail relay listens on this machine (SMTP_HOST on loopback). */
  SMTP_LOCAL_RELAY: z.enum(['true', 'false']).optional(),
  /** Log lines: json (one object a line) or pretty (readable); default pretty in development, else json. */
  LOG_FORMAT: z.enum(['json', 'pretty']).optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
  /** On SIGTERM, how long requests in flight may take to finish before their connections are closed. */
  SHUTDOWN_GRACE_MS: z.coerce.number().int().min(0).max(120_000).default(10_000),
  /** IANA time zone of the yard; pickup windows are wall-clock times there. */
  MILL_TIME_ZONE: z.string().default('UTC').refine((tz) => {
    try { new Intl.DateTimeFormat('en-US', { timeZone: tz }); return true; } catch { return false; }
  }, 'MILL_TIME_ZONE must be an IANA time zone such as America/Chicago'),
});

export type Env = z.infer<typeof envSchema>;

/** Whether the demo data is written into an empty database. */
export const wantsDemoData = (env: Env) => (env.SEED_DEMO ?? 'true') === 'true';

export function readEnv(source: NodeJS.ProcessEnv = process.env): Env {
  // An empty line copied from .env.example (`PUBLIC_URL=`) means "not set", not "set to nothing".
  const given = Object.fromEntries(Object.entries(source).filter(([, v]) => v !== undefined && v !== ''));
  const parsed = envSchema.safeParse(given);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Stickerline refuses to start: bad configuration\n${lines.join('\n')}`);
  }
  return parsed.data;
}
