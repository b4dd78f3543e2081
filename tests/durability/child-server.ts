import path from 'node:path';
import { spawn, type ChildProcess } from 'node:child_process';

const ROOT = path.resolve(import.meta.dirname, '../..');

/** How the shop is started as one process: the same command line as deploy/stickerline.service. */
export const SERVER_ARGS = ['--import', 'tsx', 'server/index.ts'];

export type ChildServer = { proc: ChildProcess; base: string; output: () => string };

/**
 * Starts the real product (`server/index.ts`) as one node process — no tsx wrapper process, so
 * a SIGKILL hits the server itself — and waits until it answers /api/health.
 */
export async function startChildServer(env: Record<string, string>, port: number, timeoutMs = 240_000): Promise<ChildServer> {
  const base = `http://127.0.0.1:${port}`;
  const clean = { ...process.env };
  delete clean.DATABASE_URL;
  const proc = spawn(process.execPath, SERVER_ARGS, {
    cwd: ROOT, env: { ...clean, NODE_ENV: 'development', PORT: String(port), HOST: '127.0.0.1', PUBLIC_URL: base, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  proc.stdout!.on('data', (d) => { log += d; });
  proc.stderr!.on('data', (d) => { log += d; });
  const until = Date.now() + timeoutMs;
  for (;;) {
    if (proc.exitCode !== null) throw new Error(`server exited with ${proc.exitCode}:\n${log}`);
    try {
      const res = await fetch(`${base}/api/health`);
      if (res.ok) return { proc, base, output: () => log };
    } catch { /* not listening yet */ }
    if (Date.now() > until) { proc.kill('SIGKILL'); throw new Error(`server not ready in ${timeoutMs} ms:\n${log}`); }
    await new Promise((r) => setTimeout(r, 250));
  }
}

export function exited(proc: ChildProcess): Promise<number | null> {
  return proc.exitCode !== null || proc.signalCode !== null
    ? Promise.resolve(proc.exitCode)
    : new Promise((r) => proc.once('exit', (code) => r(code)));
}

/** A tiny cookie-keeping client for one account, sending the shop's own Origin. */
export function client(base: string) {
  let cookie = '';
  return async function call(method: string, url: string, body?: unknown, headers: Record<string, string> = {}) {
    const res = await fetch(base + url, {
      method,
      headers: { Origin: base, ...(cookie ? { Cookie: cookie } : {}), ...(body !== undefined ? { 'Content-Type': 'application/json' } : {}), ...headers },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const set = res.headers.getSetCookie();
    if (set.length) cookie = set.map((c) => c.split(';')[0]).join('; ');
    const text = await res.text();
    let json: any = null; // eslint-disable-line @typescript-eslint/no-explicit-any
    try { json = JSON.parse(text); } catch { /* not JSON */ }
    return { status: res.status, body: json };
  };
}
