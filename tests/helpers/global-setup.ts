import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { openDatabase, migrateDatabase } from '../../server/db/client';
import { startLocalFakes } from '../../server/lib/local-fakes';

/**
 * Once per test run: migrate one PGlite database and dump it as a template file (each test file
 * loads a copy, far cheaper than migrating again), and start the mail catcher and payment fake.
 */
export default async function setup(project: TestProject) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-test-'));
  const database = await openDatabase({});
  await migrateDatabase(database);
  const dump = await database.pglite!.dumpDataDir('gzip');
  const templatePath = path.join(dir, 'template.tar.gz');
  fs.writeFileSync(templatePath, Buffer.from(await dump.arrayBuffer()));
  await database.close();

  const fakes = await startLocalFakes();
  project.provide('templatePath', templatePath);
  project.provide('smtpPort', fakes.smtpPort);
  project.provide('mailWebPort', fakes.mailWebPort);
  project.provide('stripePort', fakes.stripePort);
  return async () => {
    await fakes.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  };
}

declare module 'vitest' {
  export interface ProvidedContext {
    templatePath: string;
    smtpPort: number;
    mailWebPort: number;
    stripePort: number;
  }
}
