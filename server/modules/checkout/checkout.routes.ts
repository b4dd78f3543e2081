import { Router } from 'express';
import type { Db } from '../../db/client';
import { AppError, notFound } from '../../lib/errors';
import type { Payments } from '../../lib/payments';
import { requireUser, type SessionUser } from '../../lib/session';
import { checkoutSchema, IDEMPOTENCY_KEY_PATTERN, type CheckoutStarted } from '../../../shared/checkout';
import { checkout } from './checkout.service';
import { orderForViewer, ordersOfBuyer } from './order-view';
import { checkAttempt, closeAttempt } from './payment-settlement';
import * as repo from './checkout.repo';

const orderId = (raw: unknown) => {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0 || id > 2_147_483_647) throw notFound('That order');
  return id;
};

export function checkoutRoutes({ db, payments, publicUrl, trustedOrigins }: { db: Db; payments: Payments; publicUrl?: string; trustedOrigins?: string[] }) {
  const router = Router();
  const deps = { db, payments, publicUrl: publicUrl ?? trustedOrigins?.[0] ?? '' };

  /** One checkout attempt per Idempotency-Key: a retry or double click gets the first answer and one payment page. */
  router.post('/checkout', requireUser, async (req, res) => {
    const key = req.get('Idempotency-Key');
    if (!key || !IDEMPOTENCY_KEY_PATTERN.test(key)) {
      throw new AppError(400, 'missing_idempotency_key', 'Each checkout needs an Idempotency-Key header (8–100 letters, digits, - or _).');
    }
    const input = checkoutSchema.parse(req.body);
    const { order, paymentUrl, replayed } = await checkout(deps, req.user!, input, key);
    const body: CheckoutStarted = { orderId: order.id, paymentUrl, order };
    res.status(replayed ? 200 : 201).json(body);
  });

  router.get('/orders', requireUser, async (req, res) => {
    res.json({ orders: await ordersOfBuyer(db, req.user!.id) });
  });

  router.get('/orders/:id', requireUser, async (req, res) => {
    res.json({ order: await orderForViewer(db, req.user!, orderId(req.params.id)) });
  });

  /** The buyer's own attempt, with its payment page id; others get a 404. */
  async function ownAttempt(user: SessionUser, id: number) {
    const order = await repo.findOrder(db, id);
    if (!order || (order.buyerId !== user.id && user.role !== 'admin')) throw notFound('That order');
    return order;
  }

  /** The buyer came back from the payment page: the server asks the provider itself, never trusts the URL. */
  router.post('/orders/:id/payment-check', requireUser, async (req, res) => {
    const order = await ownAttempt(req.user!, orderId(req.params.id));
    if (order.status === 'pending-payment' && order.checkoutSessionId) await checkAttempt(deps, order.checkoutSessionId);
    res.json({ order: await orderForViewer(db, req.user!, order.id) });
  });

  /** The buyer turned back from the payment page: it is closed at the provider so it cannot be paid later. */
  router.post('/orders/:id/payment-cancel', requireUser, async (req, res) => {
    const order = await ownAttempt(req.user!, orderId(req.params.id));
    if (order.status === 'pending-payment' && order.checkoutSessionId) await closeAttempt(deps, order.checkoutSessionId);
    res.json({ order: await orderForViewer(db, req.user!, order.id) });
  });
  return router;
}
