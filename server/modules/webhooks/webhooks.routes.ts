import { Router } from 'express';
import type { Db } from '../../db/client';
import type { Payments } from '../../lib/payments';
import { applyPaymentEvent } from './webhooks.service';

/** Mounted at /api/webhooks/payments with a raw body parser: the signature covers the exact bytes. */
export function webhookRoutes({ db, payments, publicUrl, trustedOrigins }: { db: Db; payments: Payments; publicUrl?: string; trustedOrigins?: string[] }) {
  const router = Router();
  const deps = { db, payments, publicUrl: publicUrl ?? trustedOrigins?.[0] ?? '' };
  router.post('/', async (req, res) => {
    const raw = Buffer.isBuffer(req.body) ? req.body : Buffer.from('');
    const event = payments.parseWebhook(raw, req.get('stripe-signature'));
    const result = await applyPaymentEvent(deps, event);
    res.json({ received: true, handled: result.handled });
  });
  return router;
}
