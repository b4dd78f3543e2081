import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { clientSourceHash, needsBuild, STAMP } from '../../scripts/build-client.mjs';

let root: string;
const write = (rel: string, text: string) => {
  fs.mkdirSync(path.dirname(path.join(root, rel)), { recursive: true });
  fs.writeFileSync(path.join(root, rel), text);
};
/** Pretends a build just ran: dist/index.html plus the stamp of the current sources. */
const built = () => {
  write('dist/index.html', '<!doctype html>');
  write(`dist/${STAMP}`, `${clientSourceHash(root)}\n`);
};

beforeEach(() => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-build-'));
  write('index.html', '<div id="root"></div>');
  write('src/main.tsx', 'export const yard = "Varrow Creek";');
  write('shared/slabs.ts', 'export const MAX_WIDTH_IN = 60;');
  write('server/app.ts', 'export {};');
});
afterEach(() => fs.rmSync(root, { recursive: true, force: true }));

describe('npm start skips the client build when nothing it is built from changed', () => {
  it('builds when there is no dist/ yet, or no stamp in it', () => {
    expect(needsBuild(root)).toBe(true);
    write('dist/index.html', '<!doctype html>');
    expect(needsBuild(root)).toBe(true);
  });

  it('skips right after a build', () => {
    built();
    expect(needsBuild(root)).toBe(false);
  });

  it('builds again after a change under src/, shared/ or public/, or to index.html', () => {
    for (const [rel, text] of [['src/main.tsx', 'export const yard = "Varrow Creek Slab Mill";'], ['shared/slabs.ts', 'export const MAX_WIDTH_IN = 72;'],
      ['public/robots.txt', 'User-agent: *'], ['index.html', '<div id="app"></div>']]) {
      built();
      write(rel, text);
      expect(needsBuild(root), rel).toBe(true);
    }
  });

  it('builds again when a file is renamed, even with the same content', () => {
    built();
    fs.renameSync(path.join(root, 'src/main.tsx'), path.join(root, 'src/entry.tsx'));
    expect(needsBuild(root)).toBe(true);
  });

  it('does not rebuild for server-only changes', () => {
    built();
    write('server/app.ts', 'export const changed = true;');
    expect(needsBuild(root)).toBe(false);
  });
});
