import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { PGlite } from '@electric-sql/pglite';
import { freePort } from '../../server/lib/free-port';
import { DEMO_ACCOUNTS } from '../../server/seed/demo-data';
import { client, exited, startChildServer, type ChildServer } from './child-server';

const work = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-kill-'));
const env = { DATA_DIR: path.join(work, 'data'), UPLOADS_DIR: path.join(work, 'uploads'), START_LOCAL_FAKES: 'true', SEED_DEMO: 'true' };
let running: ChildServer | null = null;
afterAll(async () => {
  if (running && running.proc.exitCode === null) { running.proc.kill('SIGKILL'); await exited(running.proc); }
  fs.rmSync(work, { recursive: true, force: true });
});

type Ack = { orderId: number; code: string; slabId: number };

/** Buyers hold and pay for slabs as fast as they can; returns the orders the server acknowledged. */
async function burst(server: ChildServer, buyers: ReturnType<typeof client>[], slabIds: number[], stopAfterAcks: number, onStop: () => void) {
  const acks: Ack[] = [];
  const slots = (await buyers[0]('GET', '/api/pickup-slots?days=60')).body.slots.filter((s: { full: boolean }) => !s.full);
  expect(slots.length).toBeGreaterThan(0);
  let next = 0;
  let stopped = false;
  const worker = async (buyer: ReturnType<typeof client>, w: number) => {
    while (!stopped) {
      // Two workers chase each slab, so hold conflicts happen during the burst as well.
      const slabId = slabIds[Math.floor(next++ / 2) % slabIds.length];
      try {
        const held = await buyer('POST', `/api/slabs/${slabId}/hold`, {});
        if (held.status !== 201) continue;
        const slot = slots[(w + next) % slots.length];
        const started = await buyer('POST', '/api/checkout',
          { holdIds: [held.body.hold.id], pickupWindowId: slot.windowId, pickupOn: slot.date, paymentMethod: 'card' },
          { 'Idempotency-Key': `kill-test-${w}-${next}-${Date.now()}` });
        if (started.status !== 201) continue;
        // The buyer pays on the fake's page (its signed event reaches the server), then comes back.
        await fetch(started.body.paymentUrl, { method: 'POST', redirect: 'manual', body: new URLSearchParams({ outcome: 'succeed', event: 'now' }) });
        const paid = await buyer('POST', `/api/orders/${started.body.orderId}/payment-check`, {});
        if (paid.status === 200 && paid.body.order.status === 'paid') {
          acks.push({ orderId: paid.body.order.id, code: paid.body.order.code, slabId });
          if (acks.length >= stopAfterAcks && !stopped) { stopped = true; onStop(); }
        }
      } catch {
        return; // the server is gone: this request was never acknowledged
      }
    }
  };
  await Promise.all(buyers.map((b, i) => worker(b, i)));
  return acks;
}

describe('the server killed in the middle of a burst of holds and payments', () => {
  it('comes back on the same data dir with every acknowledged order, no slab sold twice and no payment doubled', async () => {
    const port = await freePort();
    running = await startChildServer(env, port);
    const base = running.base;

    const buyers: ReturnType<typeof client>[] = [];
    for (const a of DEMO_ACCOUNTS.filter((d) => d.role === 'buyer')) {
      const c = client(base);
      expect((await c('POST', '/api/auth/sign-in/email', { email: a.email, password: a.password })).status).toBe(200);
      buyers.push(c);
    }
    for (let i = 0; i < 4; i++) {
      const c = client(base);
      const res = await c('POST', '/api/auth/sign-up/email', { email: `kill-${i}@example.test`, password: 'correct horse battery', name: `Burst Buyer ${i}` });
      expect(res.status).toBe(200);
      buyers.push(c);
    }
    const list = await buyers[0]('GET', '/api/slabs?pageSize=48&sort=price-asc');
    const slabIds: number[] = list.body.items.map((s: { id: number }) => s.id);
    expect(slabIds.length).toBeGreaterThan(10);

    const server = running;
    // SIGKILL with requests in flight: no shutdown hook, no flush — like pulling the plug.
    const acks = await burst(server, buyers, slabIds, 4, () => setTimeout(() => server.proc.kill('SIGKILL'), 30));
    await exited(server.proc);
    expect(server.proc.signalCode).toBe('SIGKILL');
    expect(acks.length).toBeGreaterThanOrEqual(4);

    running = await startChildServer(env, port);
    expect((await fetch(`${running.base}/api/slabs`)).status).toBe(200);
    running.proc.kill('SIGTERM');
    await exited(running.proc);

    const db = new PGlite(path.join(env.DATA_DIR, 'pglite'));
    try {
      const orders = (await db.query<{ id: number; code: string; status: string }>('select id, code, status from orders')).rows;
      for (const ack of acks) {
        expect(orders.find((o) => o.id === ack.orderId), `acknowledged order ${ack.code}`).toMatchObject({ code: ack.code, status: 'paid' });
      }
      const twice = await db.query('select slab_id from order_lines where status = \'sold\' group by slab_id having count(*) > 1');
      expect(twice.rows).toEqual([]);
      const doubled = await db.query(`select order_id from payments where kind = 'charge' and status = 'succeeded' group by order_id having count(*) > 1`);
      expect(doubled.rows).toEqual([]);
      const unpaid = await db.query(`select o.code from orders o where o.status = 'paid'
        and not exists (select 1 from payments p where p.order_id = o.id and p.kind = 'charge' and p.status = 'succeeded')`);
      expect(unpaid.rows).toEqual([]);
      const heldTwice = await db.query(`select slab_id from holds where status = 'active' group by slab_id having count(*) > 1`);
      expect(heldTwice.rows).toEqual([]);
    } finally {
      await db.close();
    }
  }, 600_000);
});
