import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { spawn } from 'node:child_process';
import { afterAll, describe, expect, it } from 'vitest';
import { freePort } from '../../server/lib/free-port';
import { readLockOwner } from '../../server/db/data-dir-lock';
import { client, exited, startChildServer, type ChildServer } from './child-server';
import { runScript } from './run-script';

// Real processes on one PGlite folder: the shop, a second shop, and each database script.

const work = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-one-writer-'));
const env = { DATA_DIR: path.join(work, 'data'), UPLOADS_DIR: path.join(work, 'uploads'), START_LOCAL_FAKES: 'true', SEED_DEMO: 'true' };
const dataDir = path.join(env.DATA_DIR, 'pglite');
const running: ChildServer[] = [];

afterAll(async () => {
  for (const r of running) if (r.proc.exitCode === null && r.proc.signalCode === null) { r.proc.kill('SIGKILL'); await exited(r.proc); }
  fs.rmSync(work, { recursive: true, force: true });
});

/**
 * The scripts run with spawnSync, which stops this process's event loop: a kept-alive socket the
 * server closed meanwhile looks open until the next request fails on it. One retry on a new socket.
 */
async function get(url: string) {
  try {
    return await fetch(url);
  } catch (err) {
    if ((err as { cause?: { code?: string } }).cause?.code !== 'UND_ERR_SOCKET') throw err;
    return fetch(url);
  }
}
const slabsOf = async (base: string) => (await (await get(`${base}/api/slabs?pageSize=48&availability=all`)).json()) as { items: { id: number; code: string }[]; total: number };

describe('one writer per PGlite data folder', () => {
  it('refuses a second shop on the same folder with a clear message, and the first keeps serving the same data', async () => {
    const first = await startChildServer(env, await freePort());
    running.push(first);
    const before = await slabsOf(first.base);
    expect(before.total).toBeGreaterThan(10);
    expect(readLockOwner(dataDir)).toMatchObject({ pid: first.proc.pid, purpose: 'the shop' });

    // The second shop runs until it stops by itself (its health check may answer while it starts up).
    const clean = { ...process.env };
    delete clean.DATABASE_URL;
    const second = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      cwd: path.resolve(import.meta.dirname, '../..'),
      env: { ...clean, NODE_ENV: 'development', PORT: String(await freePort()), HOST: '127.0.0.1', ...env },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let refused = '';
    second.stdout!.on('data', (d) => { refused += d; });
    second.stderr!.on('data', (d) => { refused += d; });
    const timer = setTimeout(() => second.kill('SIGKILL'), 120_000);
    expect(await exited(second)).toBe(1);
    clearTimeout(timer);
    expect(refused).toMatch(/A Stickerline shop is already running on the database folder/);
    expect(refused).toContain(`process ${first.proc.pid}`);
    expect(refused).toContain(`kill ${first.proc.pid}`);
    expect(refused).not.toMatch(/Stickerline is up/);

    // The first shop is unharmed: it answers, every slab is still found by its id (an index lookup), and it still takes a hold.
    const after = await slabsOf(first.base);
    expect(after.items.map((s) => s.code)).toEqual(before.items.map((s) => s.code));
    for (const s of after.items.slice(0, 5)) expect((await fetch(`${first.base}/api/slabs/${s.id}`)).status).toBe(200);
    const buyer = client(first.base);
    expect((await buyer('POST', '/api/auth/sign-up/email', { email: 'second-shop@example.test', password: 'correct horse battery', name: 'Ilse Marrow' })).status).toBe(200);
    const forSale = (await buyer('GET', '/api/slabs?pageSize=1')).body.items[0];
    expect((await buyer('POST', `/api/slabs/${forSale.id}/hold`, {})).status).toBe(201);
  }, 600_000);

  it('refuses every database script at once while the shop holds the folder, naming the shop', async () => {
    const shop = running[0];
    const why = new RegExp(`already running on the database folder.*process ${shop.proc.pid}`, 's');
    const backupFile = path.join(work, 'while-running.tar.gz');
    const oldBackup = path.join(work, 'some-backup.tar.gz');
    fs.writeFileSync(oldBackup, 'not read: the restore must stop before it');
    const attempts = [
      ['scripts/backup.ts', [backupFile]],
      ['scripts/restore.ts', [oldBackup, '--force']],
      ['scripts/reset-demo.ts', []],
      ['scripts/db-check.ts', []],
      ['scripts/move-to-server.ts', ['postgres://nobody@127.0.0.1:9/none']],
      ['scripts/shop-not-running.ts', []],
    ] as const;
    for (const [file, args] of attempts) {
      const res = runScript(file, [...args], env);
      expect(res.code, `${file}: ${res.stdout}${res.stderr}`).toBe(1);
      expect(res.stderr, file).toMatch(why);
    }
    expect(fs.existsSync(backupFile)).toBe(false);
    expect(fs.existsSync(path.join(dataDir, 'PG_VERSION'))).toBe(true);
    expect((await get(`${shop.base}/api/slabs`)).status).toBe(200);
  }, 300_000);

  it('takes the folder over after the shop holding it was killed with SIGKILL, and starts with the data intact', async () => {
    const killed = running[0];
    expect(killed.proc.exitCode, killed.output()).toBeNull();
    const codes = (await slabsOf(killed.base)).items.map((s) => s.code);
    killed.proc.kill('SIGKILL');
    await exited(killed.proc);
    expect(killed.proc.signalCode).toBe('SIGKILL');
    // The killed process could not clean up: its lock and its note are still there.
    expect(fs.existsSync(`${dataDir}.lock`)).toBe(true);
    expect(readLockOwner(dataDir)?.pid).toBe(killed.proc.pid);

    const again = await startChildServer(env, await freePort());
    running.push(again);
    expect(readLockOwner(dataDir)?.pid).toBe(again.proc.pid);
    expect((await slabsOf(again.base)).items.map((s) => s.code)).toEqual(codes);

    // A clean stop lets the folder go: a script can use it straight after.
    again.proc.kill('SIGTERM');
    expect(await exited(again.proc)).toBe(0);
    expect(fs.existsSync(`${dataDir}.lock`)).toBe(false);
    const check = runScript('scripts/db-check.ts', [], env);
    expect(check.code, check.stderr).toBe(0);
    expect(check.stdout).toMatch(/no damage found/);
  }, 600_000);
});
