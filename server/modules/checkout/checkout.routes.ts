import { Router } from 'express';
import type { Db } from '../../db/client';
import { AppError } from '../../lib/errors';
import type { Payments } from '../../lib/payments';
import { requireUser } from '../../lib/session';
import { checkoutSchema, IDEMPOTENCY_KEY_PATTERN } from '../../../shared/checkout';
import { checkout } from './checkout.service';
import { orderForViewer, ordersOfBuyer } from './order-view';

export function checkoutRoutes({ db, payments, publicUrl, trustedOrigins }: { db: Db; payments: Payments; publicUrl?: string; trustedOrigins?: string[] }) {
  const router = Router();
  const base = publicUrl ?? trustedOrigins?.[0] ?? '';

  /** One checkout attempt per Idempotency-Key: a retry or double click gets the first answer, and one charge. */
  router.post('/checkout', requireUser, async (req, res) => {
    const key = req.get('Idempotency-Key');
    if (!key || !IDEMPOTENCY_KEY_PATTERN.test(key)) {
      throw new AppError(400, 'missing_idempotency_key', 'Each checkout needs an Idempotency-Key header (8–100 letters, digits, - or _).');
    }
    const input = checkoutSchema.parse(req.body);
    const { order, replayed } = await checkout({ db, payments, publicUrl: base }, req.user!, input, key);
    const { buyer: _buyer, ...view } = order;
    res.status(replayed ? 200 : 201).json({ order: view });
  });

  router.get('/orders', requireUser, async (req, res) => {
    res.json({ orders: await ordersOfBuyer(db, req.user!.id) });
  });

  router.get('/orders/:id', requireUser, async (req, res) => {
    const id = Number(req.params.id);
    if (!Number.isInteger(id) || id <= 0 || id > 2_147_483_647) throw new AppError(404, 'not_found', 'That order was not found.');
    res.json({ order: await orderForViewer(db, req.user!, id) });
  });
  return router;
}
