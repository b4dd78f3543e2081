import type { Env } from '../env';

export type ShopOrigins = {
  /** The address people are given (e-mail links, the yard desk's QR code). */
  publicUrl: string;
  /** Every origin allowed to sign in and send changes. */
  trustedOrigins: string[];
};

/**
 * PUBLIC_URL (default http://localhost:PORT) and TRUSTED_ORIGINS, plus — outside production — both
 * loopback spellings of the local port, since a developer's browser may open either.
 */
export function shopOrigins(env: Pick<Env, 'NODE_ENV' | 'PORT' | 'PUBLIC_URL' | 'TRUSTED_ORIGINS'>): ShopOrigins {
  const publicUrl = (env.PUBLIC_URL ?? `http://localhost:${env.PORT}`).replace(/\/+$/, '');
  const local = env.NODE_ENV === 'production' ? [] : [`http://localhost:${env.PORT}`, `http://127.0.0.1:${env.PORT}`];
  const trustedOrigins = [...new Set([new URL(publicUrl).origin, ...env.TRUSTED_ORIGINS, ...local])];
  return { publicUrl, trustedOrigins };
}
