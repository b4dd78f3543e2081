import { Router } from 'express';
import type { Db } from '../../db/client';
import type { Payments } from '../../lib/payments';
import { applyPaymentEvent } from './webhooks.service';

/** Mounted at /api/webhooks/payments with a raw body parser: the signature covers the exact bytes. */
export function webhookRoutes({ db, payments }: { db: Db; payments: Payments }) {
  const router = Router();
  router.post('/', async (req, res) => {
    const raw = Buffer.isBuffer(req.body) ? req.body : Buffer.from('');
    const event = payments.parseWebhook(raw, req.get('stripe-signature'));
    const result = await applyPaymentEvent(db, event);
    res.json({ received: true, handled: result.handled });
  });
  return router;
}
