/**
 * `npm run bench` — measures, in one run on this machine, and prints the ratios and timings.
 * Not a test: nothing here passes or fails; the goals are printed beside the numbers.
 */
import fs from 'node:fs';
import os from 'node:os';
import { benchCatalogue, SLAB_COUNT } from './catalogue';
import { benchColdStart } from './cold-start';
import { benchBundle } from './bundle';
import { benchPhotos } from './photos';

const f = (n: number, d = 1) => n.toFixed(d);
console.log(`Stickerline benchmarks — ${new Date().toISOString()} — ${os.cpus().length} CPU, node ${process.version}\n`);

const cat = await benchCatalogue();
console.log(`Catalogue, ${SLAB_COUNT} slabs (seeded in ${f(cat.seedMs / 1000)} s), GET /api/slabs with species + thickness + live edge + price sort:`);
console.log(`  through the app (HTTP, session check, validation, JSON): median ${f(cat.appMedianMs)} ms, p95 ${f(cat.appP95Ms)} ms`);
console.log(`  raw SQL on the same database:                           median ${f(cat.sqlMedianMs)} ms, p95 ${f(cat.sqlP95Ms)} ms`);
console.log(`  ratio app / raw SQL (median): ${f(cat.ratio, 2)}×   (goal ≤ 2×)\n`);

const cold = benchColdStart(cat.dataDir);
console.log(`Cold start to ready with that database on disk (open + migrations + seed check): median ${f(cold.medianMs, 0)} ms, worst ${f(cold.worstMs, 0)} ms\n`);
fs.rmSync(cat.dir, { recursive: true, force: true });

const bundle = await benchBundle();
console.log(`Client bundle (vite build, gzip -9): initial JS ${f(bundle.initialJsKb)} KB (goal ≤ 150 KB), initial CSS ${f(bundle.initialCssKb)} KB, ${bundle.chunkCount} JS chunks`);
console.log(`  yard pages in separate chunks: ${bundle.yardChunks.length ? bundle.yardChunks.length : 'NO'}; office pages in separate chunks: ${bundle.officeChunks.length ? bundle.officeChunks.length : 'NO'}\n`);

const photos = await benchPhotos();
console.log(`Photo pipeline, 12-megapixel JPEG (${f(photos.inputMb)} MB) → display + thumbnail WebP: ${f(photos.imagesPerSecond, 2)} images/s (${f(photos.msPerImage, 0)} ms each)`);
