import fs from 'node:fs';
import path from 'node:path';
import { sql } from 'drizzle-orm';
import type { Db } from './db/client';
import { envSchema, type Env } from './env';
import { DEMO_ACCOUNTS } from './seed/demo-data';

/**
 * What production must not run with: the demo's data and accounts, secrets anyone can read in this
 * repository, test-mode payment keys nobody chose on purpose, and mail or payments aimed at the
 * local fakes. Every problem is collected first, so the operator fixes them in one round.
 */

/** Values published with the code: the schema's own defaults and everything in .env.example. */
export function publishedValues(envExampleText = readEnvExample()): Set<string> {
  const out = new Set<string>();
  const defaults = envSchema.safeParse({});
  if (defaults.success) {
    for (const v of Object.values(defaults.data)) if (typeof v === 'string' && v) out.add(v);
  }
  for (const line of envExampleText.split(/\r?\n/)) {
    const m = /^\s*[A-Z0-9_]+\s*=\s*(.*?)\s*$/.exec(line);
    if (m && m[1]) out.add(m[1].replace(/^(['"])(.*)\1$/, '$2'));
  }
  return out;
}

function readEnvExample(): string {
  try {
    return fs.readFileSync(path.resolve(import.meta.dirname, '..', '.env.example'), 'utf8');
  } catch {
    return '';
  }
}

// Words people put in placeholder secrets; a provider's real secrets are random and have no "_word_" parts.
const PLACEHOLDER = /(^|[_\-.\s])(local|fake|mock|test|tests|testing|demo|example|sample|dev|development|changeme|change-me|placeholder|dummy|secret|only|todo|xxx+)([_\-.\s]|$)/i;
const isLoopbackHost = (host: string) => {
  const h = host.trim().toLowerCase().replace(/^\[|\]$/g, '');
  return h === 'localhost' || h.endsWith('.localhost') || /^127\./.test(h) || h === '::1' || h === '0.0.0.0' || h === '::' || h === '0:0:0:0:0:0:0:1';
};
// RFC 2606 / RFC 6761 names that can never receive real mail.
const RESERVED_MAIL_DOMAIN = /@(?:[^@]*\.)?(test|example|invalid|localhost|example\.(com|net|org))>?\s*$/i;

export function configProblems(env: Env, published: Set<string> = publishedValues()): string[] {
  const problems: string[] = [];
  const published_ = (v: string | undefined) => !!v && published.has(v);

  if (env.SEED_DEMO !== 'false') {
    problems.push('SEED_DEMO is not set to false: the demo yard and its published demo accounts would be written. Set SEED_DEMO=false.');
  }
  if (!env.PUBLIC_URL) {
    problems.push('PUBLIC_URL is not set: e-mail links and the trusted origin would point at localhost. Set it to the address buyers use, e.g. https://shop.your-mill.example.');
  }
  if (!env.BETTER_AUTH_SECRET) {
    problems.push('BETTER_AUTH_SECRET is not set: give it a random value of at least 32 characters (e.g. `openssl rand -base64 32`).');
  } else if (published_(env.BETTER_AUTH_SECRET) || PLACEHOLDER.test(env.BETTER_AUTH_SECRET)) {
    problems.push('BETTER_AUTH_SECRET looks like a placeholder: use a random value of at least 32 characters.');
  }

  // Payments
  const key = env.STRIPE_SECRET_KEY;
  if (published_(key)) {
    problems.push('STRIPE_SECRET_KEY is the published development default: set the secret key from your payment account.');
  } else if (/^(sk|rk)_test_/.test(key) && env.PAYMENTS_TEST_MODE !== 'true') {
    problems.push('STRIPE_SECRET_KEY is a test-mode key: use a live key, or set PAYMENTS_TEST_MODE=true if a test-mode shop is what you want.');
  } else if (PLACEHOLDER.test(key.replace(/^(sk|rk)_(test|live)_/, '_'))) {
    problems.push('STRIPE_SECRET_KEY looks like a placeholder: set the secret key from your payment account.');
  }
  const hook = env.STRIPE_WEBHOOK_SECRET;
  if (published_(hook)) {
    problems.push('STRIPE_WEBHOOK_SECRET is the published development default: anyone could forge payment events. Set the signing secret of your webhook endpoint.');
  } else if (hook.length < 24 || PLACEHOLDER.test(hook.replace(/^whsec_/, '_'))) {
    problems.push('STRIPE_WEBHOOK_SECRET looks like a placeholder or is too short: set the signing secret of your webhook endpoint.');
  }
  if ((env.STRIPE_HOST && isLoopbackHost(env.STRIPE_HOST)) || env.STRIPE_PORT || env.STRIPE_PROTOCOL === 'http') {
    problems.push('STRIPE_HOST/STRIPE_PORT/STRIPE_PROTOCOL point payments at a local fake: leave them unset in production.');
  }

  // Mail
  if (env.START_LOCAL_FAKES === 'true') {
    problems.push('START_LOCAL_FAKES=true would start the local mail catcher and payment fake: remove it.');
  }
  if (!env.SMTP_PORT) {
    problems.push('SMTP_PORT is not set: mail would go to the local catcher or nowhere. Set SMTP_HOST and SMTP_PORT to your mail relay.');
  } else if (isLoopbackHost(env.SMTP_HOST) && env.SMTP_LOCAL_RELAY !== 'true') {
    problems.push(`SMTP_HOST ${env.SMTP_HOST} is this machine, where the development mail catcher runs: set your mail relay, or SMTP_LOCAL_RELAY=true if a real relay listens here.`);
  }
  if (env.MAILDEV_WEB_PORT) {
    problems.push('MAILDEV_WEB_PORT is set: the development mail catcher has no place in production. Remove it.');
  }
  if (published_(env.MAIL_FROM) || RESERVED_MAIL_DOMAIN.test(env.MAIL_FROM)) {
    problems.push(`MAIL_FROM (${env.MAIL_FROM}) is the demo sender or a reserved test domain: set the mill's own sender address.`);
  }
  return problems;
}

/** Demo accounts (or accounts on reserved test domains) already in the database. Reads only: nothing is migrated or written. */
export async function databaseProblems(db: Db): Promise<string[]> {
  const exists = (await db.execute(sql`select to_regclass('public."user"') is not null as present`)) as unknown as { rows: { present: boolean }[] };
  if (!exists.rows[0]?.present) return [];
  const demo = DEMO_ACCOUNTS.map((a) => a.email.toLowerCase());
  const res = (await db.execute(sql`select email from "user"
    where lower(email) in (${sql.join(demo.map((e) => sql`${e}`), sql`, `)})
       or lower(email) ~ '@([^@]*\\.)?(test|example|invalid|localhost|example\\.(com|net|org))$'
    order by email limit 20`)) as unknown as { rows: { email: string }[] };
  if (!res.rows.length) return [];
  return [`Demo or test accounts exist in the database (${res.rows.map((r) => r.email).join(', ')}): their passwords are published. Delete them, or start from an empty database.`];
}

export class ProductionRefused extends Error {
  constructor(public problems: string[]) {
    super(`Stickerline refuses to start in production (NODE_ENV=production):\n${problems.map((p) => `  - ${p}`).join('\n')}\nSee "Running in production" in README.md.`);
    this.name = 'ProductionRefused';
  }
}

/** Throws one error listing every problem, or returns when there is none. */
export function refuseIfAny(problems: string[]) {
  if (problems.length) throw new ProductionRefused(problems);
}
