// Run as its own process by cold-start.ts: open the on-disk database, migrate, check for seed data.
import { count } from 'drizzle-orm';
import { openDatabase, migrateDatabase } from '../../server/db/client';
import { species } from '../../server/db/schema/index';

const database = await openDatabase({ dataDir: process.argv[2] });
await migrateDatabase(database);
const [{ n }] = await database.db.select({ n: count() }).from(species);
const readyMs = performance.now(); // since this process started
await database.close();
console.log(JSON.stringify({ readyMs, seeded: n > 0 }));
