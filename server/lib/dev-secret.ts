import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';

/**
 * The auth secret comes from BETTER_AUTH_SECRET. For local use without one, a random secret is
 * generated once and kept in the (git-ignored) data folder, so sessions survive restarts.
 */
export function authSecret(fromEnv: string | undefined, dataDir: string, production: boolean): string {
  if (fromEnv) return fromEnv;
  if (production) throw new Error('BETTER_AUTH_SECRET must be set in production.');
  const file = path.join(dataDir, 'auth-secret');
  if (fs.existsSync(file)) return fs.readFileSync(file, 'utf8').trim();
  fs.mkdirSync(dataDir, { recursive: true });
  const secret = crypto.randomBytes(32).toString('base64url');
  fs.writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
