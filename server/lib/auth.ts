import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { admin } from 'better-auth/plugins/admin';
import { adminAc, userAc } from 'better-auth/plugins/admin/access';
import type { Db } from '../db/client';
import * as schema from '../db/schema/index';
import type { Mailer } from './mail';
import { getLogger } from './logger';
import { emailChangeEmail, passwordResetEmail } from './email-templates';

export const ROLES = ['buyer', 'seller', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/**
 * The header through which the app hands the client's address (as Express resolved it, with its
 * 'trust proxy' setting) to the auth library's rate limiter; see modules/accounts/auth-gate.ts.
 * Whatever a client sends under this name is overwritten before the library sees it.
 */
export const CLIENT_IP_HEADER = 'x-stickerline-client-ip';

export type AuthOptions = {
  db: Db;
  secret: string;
  baseURL: string;
  /** Origins allowed to sign in (and to be sent back to after a password reset); default: baseURL's. */
  trustedOrigins?: string[];
  mailer: Mailer;
  /** Sign-in/sign-up attempts per minute per address; tests lower or raise it. */
  signInLimitPerMinute?: number;
};

export function createAuth({ db, secret, baseURL, trustedOrigins, mailer, signInLimitPerMinute = 10 }: AuthOptions) {
  return betterAuth({
    appName: 'Stickerline',
    secret,
    baseURL,
    basePath: '/api/auth',
    trustedOrigins: trustedOrigins ?? [baseURL],
    database: drizzleAdapter(db, { provider: 'pg', schema }),
    emailAndPassword: {
      enabled: true,
      minPasswordLength: 10,
      maxPasswordLength: 128,
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user, url }) => {
        await mailer.send({ to: user.email, ...passwordResetEmail({ name: user.name, url }) });
      },
    },
    // A new e-mail counts only once its owner clicks the link sent to it; until then the old one stays.
    user: { changeEmail: { enabled: true } },
    emailVerification: {
      sendOnSignUp: false,
      expiresIn: 24 * 3600,
      sendVerificationEmail: async ({ user, url }) => {
        await mailer.send({ to: user.email, ...emailChangeEmail({ name: user.name, newEmail: user.email, url }) });
      },
    },
    plugins: [
      admin({
        roles: { buyer: userAc, seller: userAc, admin: adminAc },
        defaultRole: 'buyer',
        adminRoles: ['admin'],
      }),
    ],
    advanced: {
      // httpOnly + SameSite=Lax always; the Secure flag (and __Secure- prefix) when the public address
      // is https (behind a TLS proxy), not on plain-http yard or local runs where the browser would drop it.
      useSecureCookies: baseURL.startsWith('https://'),
      ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] },
      // The library turns its origin and redirect-URL checks off when NODE_ENV is 'test'; keep them
      // on so tests run the same checks as production (a reset link may only lead back to us).
      disableOriginCheck: false,
      defaultCookieAttributes: { httpOnly: true, sameSite: 'lax' },
    },
    rateLimit: {
      enabled: true,
      window: 60,
      max: 100,
      storage: 'memory',
      customRules: {
        '/sign-in/email': { window: 60, max: signInLimitPerMinute },
        '/sign-up/email': { window: 60, max: signInLimitPerMinute },
        '/request-password-reset': { window: 60, max: 5 },
      },
    },
    telemetry: { enabled: false },
    // The library's own warnings go to the process log, scrubbed like every other line.
    logger: { log: (level, message) => getLogger()[level]({ part: 'auth' }, message) },
  });
}

export type Auth = ReturnType<typeof createAuth>;
