import fs from 'node:fs';
import { PGlite } from '@electric-sql/pglite';
import { inject } from 'vitest';
import { openDatabase, type Database } from '../../server/db/client';

/** A fresh, migrated, empty database for one test file (a copy of the run's template). */
export async function freshDatabase(): Promise<Database> {
  const bytes = fs.readFileSync(inject('templatePath'));
  const pglite = new PGlite({ loadDataDir: new Blob([bytes]) });
  return openDatabase({ pglite });
}
