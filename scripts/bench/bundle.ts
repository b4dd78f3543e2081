import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import { build } from 'vite';

const gz = (file: string) => zlib.gzipSync(fs.readFileSync(file), { level: 9 }).length;

/** Production build in a temp folder; gzip size of what the first page load fetches. */
export async function benchBundle() {
  const outDir = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-bundle-'));
  await build({ logLevel: 'error', build: { outDir, emptyOutDir: true } });
  const html = fs.readFileSync(path.join(outDir, 'index.html'), 'utf8');
  // The entry script plus everything index.html preloads is the initial JS; the rest loads on demand.
  const initial = [...html.matchAll(/(?:src|href)="\/(assets\/[^"]+)"/g)].map((m) => m[1]);
  const sum = (ext: string) => initial.filter((f) => f.endsWith(ext)).reduce((n, f) => n + gz(path.join(outDir, f)), 0);
  const chunks = fs.readdirSync(path.join(outDir, 'assets')).filter((f) => f.endsWith('.js'));
  const initialNames = new Set(initial.map((f) => path.basename(f)));
  const separate = (prefix: string) => chunks.filter((c) => c.startsWith(prefix) && !initialNames.has(c));
  const result = {
    initialJsKb: sum('.js') / 1024, initialCssKb: sum('.css') / 1024, chunkCount: chunks.length,
    yardChunks: separate('yard-'), officeChunks: separate('office-'),
  };
  fs.rmSync(outDir, { recursive: true, force: true });
  return result;
}
