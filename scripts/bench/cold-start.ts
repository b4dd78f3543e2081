import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { percentile } from './stats';

/** Process start → database open, migrated and seed-checked, in a fresh node process each time. */
export function benchColdStart(dataDir: string, runs = 5) {
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const out = spawnSync(process.execPath, ['--import', 'tsx', path.join(import.meta.dirname, 'cold-start-child.ts'), dataDir], { encoding: 'utf8' });
    if (out.status !== 0) throw new Error(out.stderr);
    const { readyMs, seeded } = JSON.parse(out.stdout.trim().split('\n').pop()!);
    if (!seeded) throw new Error('cold start found no data');
    times.push(readyMs);
  }
  return { medianMs: percentile(times, 50), worstMs: Math.max(...times) };
}
