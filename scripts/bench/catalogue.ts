import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import { openDatabase, migrateDatabase } from '../../server/db/client';
import { createApp } from '../../server/app';
import { createAuth } from '../../server/lib/auth';
import { createMailer } from '../../server/lib/mail';
import { createPayments } from '../../server/lib/payments';
import { seedSlabs } from './seed-slabs';
import { percentile } from './stats';

export const SLAB_COUNT = 10_000;

// The catalogue query with the buyer's common filters, written by hand: what the page costs
// with no framework at all. Same joins, subqueries, order and page size as the repo's query.
const RAW = `
  select s.id, s.code, sp.slug, sp.name, s.thickness_in, s.width_in, s.length_in, s.board_feet, s.price_cents,
    s.status, s.drying_state, s.live_edge, s.figures, s.log_id, s.sequence_in_log,
    (select mc_percent from moisture_readings m where m.slab_id = s.id order by measured_on desc, id desc limit 1) as mc,
    (select file_key from slab_photos p where p.slab_id = s.id order by is_cover desc, position asc, id asc limit 1) as cover,
    (count(*) over ())::int as total
  from slabs s join species sp on sp.id = s.species_id
  where s.status in ('listed') and sp.slug = $1 and s.thickness_in >= $2 and s.live_edge <> 'none'
  order by s.price_cents asc, s.id asc limit 24`;
const FILTERS = [
  ['black-walnut', 2], ['white-oak', 2.5], ['sugar-maple', 1.75], ['black-cherry', 3],
] as const;

/** Builds a 10,000-slab PGlite database on disk (kept for the cold-start bench) and times the catalogue. */
export async function benchCatalogue(rounds = 200) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-bench-'));
  const dataDir = path.join(dir, 'pglite');
  const database = await openDatabase({ dataDir });
  await migrateDatabase(database);
  const seedStart = performance.now();
  await seedSlabs(database.db, SLAB_COUNT);
  const seedMs = performance.now() - seedStart;

  const mailer = createMailer({ host: '127.0.0.1', port: 1, from: 'Stickerline <yard@stickerline.test>' });
  const auth = createAuth({ db: database.db, secret: 'bench-secret-bench-secret-bench-secret', baseURL: 'http://127.0.0.1', mailer });
  const payments = createPayments({ secretKey: 'sk_test_local_fake', host: '127.0.0.1', port: 1, protocol: 'http', webhookSecret: 'whsec_bench' });
  const app = createApp({ db: database.db, auth, mailer, payments, uploadsDir: dir });
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

  const viaApp: number[] = [];
  const viaSql: number[] = [];
  const pg = database.pglite!;
  for (let i = 0; i < rounds + 20; i++) {
    const [slug, thick] = FILTERS[i % FILTERS.length];
    let t0 = performance.now();
    const res = await fetch(`${base}/api/slabs?species=${slug}&minThicknessIn=${thick}&liveEdge=yes&sort=price-asc`);
    const body = (await res.json()) as { total: number };
    const appMs = performance.now() - t0;
    t0 = performance.now();
    const rows = await pg.query<{ total: number }>(RAW, [slug, thick]);
    const sqlMs = performance.now() - t0;
    if ((rows.rows[0]?.total ?? 0) !== body.total || rows.rows.length > 24) throw new Error('raw SQL and the API disagree');
    if (i >= 20) { viaApp.push(appMs); viaSql.push(sqlMs); } // the first 20 warm caches and the JIT
  }
  server.close();
  mailer.close();
  await database.close();
  const median = (xs: number[]) => percentile(xs, 50);
  return {
    dir, dataDir, seedMs,
    appMedianMs: median(viaApp), appP95Ms: percentile(viaApp, 95),
    sqlMedianMs: median(viaSql), sqlP95Ms: percentile(viaSql, 95),
    ratio: median(viaApp) / median(viaSql),
  };
}
