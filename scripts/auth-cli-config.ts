// A small auth instance for the auth library's CLI (`npm run auth:generate`), which wants a file
// exporting `auth`. It uses an in-memory database and a mailer that sends nothing: the CLI only
// reads the configuration to print the tables it expects. See scripts/auth-schema-check.ts.
import { drizzle } from 'drizzle-orm/pglite';
import { PGlite } from '@electric-sql/pglite';
import * as schema from '../server/db/schema/index';
import { createAuth } from '../server/lib/auth';
import type { Mailer } from '../server/lib/mail';

const db = drizzle(new PGlite(), { schema });
const mailer = { send: async () => undefined, close: () => undefined } as unknown as Mailer;

export const auth = createAuth({ db, secret: 'cli-only-secret-cli-only-secret-0000', baseURL: 'http://localhost:3000', mailer });
