import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import lockfile from 'proper-lockfile';

/**
 * One writer per PGlite data folder. PGlite has no lock of its own: two processes on one folder
 * each keep their own buffers and write over each other (indexes stop matching their tables).
 * Whoever opens the folder — the shop, a backup, a restore, a reset, a move — first takes this lock
 * and keeps it until it closes the folder.
 *
 * The lock is a directory made with mkdir (atomic) beside the data folder, kept fresh by
 * proper-lockfile (its mtime is touched every few seconds; a lock untouched for STALE_MS is stale
 * and is taken over). Beside it an owner note records pid, host and what holds it, so a second
 * opener can say who is in the way — and, when that pid is gone on this host (a process killed
 * with SIGKILL never cleans up), take the lock over at once instead of waiting for staleness.
 * See docs/decisions/004-one-writer-per-database.md.
 */

/** A lock whose directory has not been touched for this long is stale (its holder froze or died). */
export const STALE_MS = 30_000;
/** How often a holder touches its lock. */
const UPDATE_MS = 5_000;

export type LockOwner = { pid: number; host: string; purpose: string; since: string; command: string };

export class DataDirBusyError extends Error {
  readonly code = 'data_dir_busy';
  constructor(readonly dataDir: string, readonly owner: LockOwner | null) {
    super(busyMessage(dataDir, owner));
    this.name = 'DataDirBusyError';
  }
}

function busyMessage(dataDir: string, owner: LockOwner | null) {
  const who = owner
    ? `process ${owner.pid}${owner.host === os.hostname() ? '' : ` on ${owner.host}`} (${owner.purpose}, since ${owner.since})`
    : 'another process (its pid is not known yet)';
  const how = owner && owner.host === os.hostname()
    ? `Stop it first: press Ctrl+C in the terminal where it runs, or run \`kill ${owner.pid}\`, then try again.`
    : 'Stop it first (Ctrl+C in the terminal where it runs), then try again.';
  return `A Stickerline shop is already running on the database folder ${dataDir}: it is held by ${who}. `
    + `Only one process may use a database folder at a time — two would damage it. ${how}`;
}

export const lockPathOf = (dataDir: string) => `${path.resolve(dataDir)}.lock`;
const ownerPathOf = (dataDir: string) => `${path.resolve(dataDir)}.lock-owner.json`;

export function readLockOwner(dataDir: string): LockOwner | null {
  try {
    const o = JSON.parse(fs.readFileSync(ownerPathOf(dataDir), 'utf8')) as LockOwner;
    return Number.isInteger(o.pid) && typeof o.host === 'string' ? o : null;
  } catch {
    return null;
  }
}

function isAlive(pid: number) {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM'; // alive, just not ours to signal
  }
}

/** The owner note names a process on this machine that no longer exists. */
const ownerIsGone = (o: LockOwner | null) => o !== null && o.host === os.hostname() && o.pid !== process.pid && !isAlive(o.pid);

const isLocked = (err: unknown) => (err as NodeJS.ErrnoException)?.code === 'ELOCKED';

export type DataDirLock = { dataDir: string; release(): Promise<void> };

export type LockOptions = {
  /** What holds the folder, shown to whoever is refused ("the shop", "a backup" …). */
  purpose: string;
  /** Called if another process took the lock from under us (we froze past STALE_MS). Default: stop the process. */
  onCompromised?: (err: Error) => void;
};

function compromised(dataDir: string) {
  return (err: Error) => {
    console.error(`[lock] lost the lock on ${dataDir} (${err.message}); stopping so two processes never write it.`);
    process.exit(75);
  };
}

function tryLock(dataDir: string, opts: LockOptions) {
  return lockfile.lock(dataDir, {
    realpath: false, lockfilePath: lockPathOf(dataDir), stale: STALE_MS, update: UPDATE_MS, retries: 0,
    onCompromised: opts.onCompromised ?? compromised(dataDir),
  });
}

/**
 * Takes a lock left by a process that no longer exists. Takeovers are serialised by a short-lived
 * second lock, and the owner note is read again inside it, so two restarts racing after a crash
 * cannot both remove the old lock: the second finds the first one's (live) pid and is refused.
 */
async function takeOver(dataDir: string, dead: LockOwner, opts: LockOptions) {
  const mutex = `${lockPathOf(dataDir)}-takeover`;
  // proper-lockfile keeps its locks by the locked path: the mutex gets a path of its own, or releasing
  // it would end the folder lock taken inside it.
  const releaseMutex = await lockfile.lock(mutex, {
    realpath: false, lockfilePath: mutex, stale: 5_000, retries: { retries: 20, minTimeout: 100, maxTimeout: 500 },
    onCompromised: () => { /* a takeover lasts milliseconds; nothing to stop if it was cut short */ },
  });
  try {
    const now = readLockOwner(dataDir);
    if (!now || now.pid !== dead.pid || now.host !== dead.host || !ownerIsGone(now)) return null;
    // The dead holder's note goes with its lock, so no later opener can mistake a fresh lock for the dead one's.
    fs.rmSync(ownerPathOf(dataDir), { force: true });
    fs.rmSync(lockPathOf(dataDir), { recursive: true, force: true });
    const release = await tryLock(dataDir, opts);
    writeOwner(dataDir, opts.purpose);
    return release;
  } finally {
    await releaseMutex();
  }
}

function writeOwner(dataDir: string, purpose: string) {
  const owner: LockOwner = {
    pid: process.pid, host: os.hostname(), purpose, since: new Date().toISOString(), command: process.argv.slice(1).join(' '),
  };
  const file = ownerPathOf(dataDir);
  fs.writeFileSync(`${file}.${process.pid}`, JSON.stringify(owner, null, 2));
  fs.renameSync(`${file}.${process.pid}`, file);
}

/**
 * Takes the folder's lock or throws DataDirBusyError at once (never waits for a live holder).
 * A lock left behind by a dead process on this machine is taken over straight away.
 */
export async function lockDataDir(dataDir: string, opts: LockOptions): Promise<DataDirLock> {
  fs.mkdirSync(path.dirname(path.resolve(dataDir)), { recursive: true });
  const held = await acquire(dataDir, opts);
  let released = false;
  return {
    dataDir: path.resolve(dataDir),
    async release() {
      if (released) return;
      released = true;
      // The note goes first, so a note lying about never names a holder that has let go.
      const owner = readLockOwner(dataDir);
      if (owner?.pid === process.pid && owner.host === os.hostname()) fs.rmSync(ownerPathOf(dataDir), { force: true });
      await held().catch((e: NodeJS.ErrnoException) => {
        if (e.code !== 'ERELEASED' && e.code !== 'ENOTACQUIRED') throw e;
      });
    },
  };
}

async function acquire(dataDir: string, opts: LockOptions, attempt = 1): Promise<() => Promise<void>> {
  try {
    const release = await tryLock(dataDir, opts);
    writeOwner(dataDir, opts.purpose);
    return release;
  } catch (err) {
    if (!isLocked(err)) throw err;
  }
  let owner = readLockOwner(dataDir);
  if (!owner) {
    // The holder is between making the lock and writing its note, or just letting go: a moment, then look again.
    await new Promise((r) => setTimeout(r, 300));
    owner = readLockOwner(dataDir);
    if (!owner && attempt < 3) return acquire(dataDir, opts, attempt + 1);
  }
  if (!ownerIsGone(owner)) throw new DataDirBusyError(path.resolve(dataDir), owner);
  let release: (() => Promise<void>) | null = null;
  try {
    release = await takeOver(dataDir, owner!, opts);
  } catch (e) {
    if (!isLocked(e)) throw e;
  }
  if (!release) throw new DataDirBusyError(path.resolve(dataDir), readLockOwner(dataDir));
  return release;
}

/** Who holds the folder now, or null when it is free (or its holder is gone). For a quick check before a slow step. */
export async function dataDirHolder(dataDir: string): Promise<LockOwner | 'unknown' | null> {
  const locked = await lockfile.check(dataDir, { realpath: false, lockfilePath: lockPathOf(dataDir), stale: STALE_MS });
  if (!locked) return null;
  const owner = readLockOwner(dataDir);
  if (ownerIsGone(owner)) return null;
  return owner ?? 'unknown';
}
