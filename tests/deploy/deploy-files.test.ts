import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { envSchema, readEnv } from '../../server/env';
import { SERVER_ARGS } from '../durability/child-server';

const ROOT = path.resolve(import.meta.dirname, '../..');
const UNIT = path.join(ROOT, 'deploy/stickerline.service');
const CADDYFILE = path.join(ROOT, 'deploy/Caddyfile');
const unitText = fs.readFileSync(UNIT, 'utf8');
const unitLines = unitText.split('\n').map((l) => l.trim()).filter((l) => l && !l.startsWith('#'));
const environment = Object.fromEntries(unitLines.filter((l) => l.startsWith('Environment=')).map((l) => {
  const [key, ...value] = l.slice('Environment='.length).split('=');
  return [key, value.join('=')];
}));
const execStart = unitLines.find((l) => l.startsWith('ExecStart='))!.slice('ExecStart='.length);

const onPath = (bin: string) => spawnSync('sh', ['-c', `command -v ${bin}`]).status === 0;

/** The README's "Running it at the mill" section. */
function millSection() {
  const readme = fs.readFileSync(path.join(ROOT, 'README.md'), 'utf8');
  const start = readme.indexOf('## Running it at the mill');
  expect(start, 'README has a "Running it at the mill" section').toBeGreaterThanOrEqual(0);
  const end = readme.indexOf('\n## ', start + 1);
  return readme.slice(start, end < 0 ? undefined : end);
}

describe('the systemd unit', () => {
  it('starts the shop with the same command line the process tests run', () => {
    expect(execStart).toBe(`/usr/bin/node ${SERVER_ARGS.join(' ')}`);
  });

  it('sets only settings the shop knows, and they pass its configuration check with the secrets file\'s values', () => {
    const known = Object.keys(envSchema.shape);
    expect(Object.keys(environment).filter((k) => !known.includes(k))).toEqual([]);
    const env = readEnv({ ...environment, BETTER_AUTH_SECRET: 'x'.repeat(40), SMTP_PORT: '587' });
    expect(env).toMatchObject({ NODE_ENV: 'production', HOST: '127.0.0.1', TRUST_PROXY: ['loopback'] });
    expect(env.PUBLIC_URL).toMatch(/^https:\/\//);
  });

  it('has exactly the command line and environment the README gives', () => {
    const section = millSection();
    const block = /```ini\n([\s\S]*?)```/.exec(section)?.[1] ?? '';
    const readmeLines = block.split('\n').map((l) => l.trim()).filter((l) => /^(ExecStart|Environment|EnvironmentFile|WorkingDirectory|User)=/.test(l));
    const unitRunLines = unitLines.filter((l) => /^(ExecStart|Environment|EnvironmentFile|WorkingDirectory|User)=/.test(l));
    expect(readmeLines).toEqual(unitRunLines);
  });

  it('passes systemd\'s own check (systemd-analyze verify)', (ctx) => {
    ctx.skip(!onPath('systemd-analyze'), 'systemd-analyze is not installed on this machine');
    const out = spawnSync('systemd-analyze', ['verify', UNIT], { encoding: 'utf8' });
    expect(out.status, out.stderr).toBe(0);
    expect(out.stderr).not.toMatch(/Unknown key|bad unit file setting/);
  });
});

describe('the TLS proxy config (Caddy)', () => {
  const caddyfile = fs.readFileSync(CADDYFILE, 'utf8');

  it('serves the unit\'s PUBLIC_URL and forwards to the address and port the unit listens on', () => {
    const site = /^([^\s#{][^\s{]*)\s*\{/m.exec(caddyfile)?.[1];
    expect(site).toBe(new URL(environment.PUBLIC_URL).host);
    expect(caddyfile).toMatch(new RegExp(`reverse_proxy ${environment.HOST.replace(/\./g, '\\.')}:${environment.PORT}\\b`));
  });

  it('passes Caddy\'s own config check (caddy validate)', (ctx) => {
    ctx.skip(!onPath('caddy'), 'the caddy package is not installed (apt-get install -y caddy)');
    const home = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-caddy-'));
    try {
      const out = spawnSync('caddy', ['validate', '--config', CADDYFILE, '--adapter', 'caddyfile'], {
        encoding: 'utf8', env: { ...process.env, HOME: home, XDG_DATA_HOME: home, XDG_CONFIG_HOME: home },
      });
      expect(out.status, out.stderr).toBe(0);
      expect(out.stdout + out.stderr).toMatch(/Valid configuration/);
    } finally {
      fs.rmSync(home, { recursive: true, force: true });
    }
  });
});
