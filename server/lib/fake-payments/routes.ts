import express, { type Request, type Response } from 'express';
import Stripe from 'stripe';
import { deliverEvent, type WebhookEndpoint } from './events';
import { createFakeStore, fakeId, nowSeconds, sessionJson, type FakeSession } from './store';
import { testPaymentPage } from './test-page';

type Opts = { baseUrl: () => string; selfPort: () => number };
type Body = Record<string, unknown>;

const apiError = (res: Response, status: number, message: string, param?: string) =>
  res.status(status).json({ error: { type: 'invalid_request_error', message, ...(param ? { param } : {}) } });

const str = (v: unknown) => (typeof v === 'string' ? v : undefined);
const int = (v: unknown) => (typeof v === 'string' && /^\d+$/.test(v) ? Number(v) : undefined);

/** Reads `line_items[i][price_data][…]` as the SDK form-encodes it; answers an error message or the lines. */
function parseLines(raw: unknown): { lines: FakeSession['line_items']; currency: string } | string {
  const list = Array.isArray(raw) ? raw : raw && typeof raw === 'object' ? Object.values(raw) : [];
  if (!list.length) return 'line_items: at least one line is required';
  const out: FakeSession['line_items'] = [];
  let currency = 'usd';
  for (const [i, item] of list.entries()) {
    const pd = (item as Body)?.price_data as Body | undefined;
    const name = str((pd?.product_data as Body | undefined)?.name);
    const amount = int(pd?.unit_amount);
    const quantity = int((item as Body)?.quantity) ?? 1;
    if (!name || amount === undefined || quantity < 1) return `line_items[${i}]: price_data.unit_amount, product_data.name and quantity are required`;
    currency = str(pd?.currency) ?? currency;
    out.push({ name, amount, quantity });
  }
  return { lines: out, currency };
}

/**
 * Checkout sessions and payment intents in the provider's API shapes, plus the local test payment
 * page at each session's URL. Mounted in front of stripe-stateful-mock, which has neither; a
 * successful test payment makes a real charge in the mock, so refunds against it work there.
 */
export function fakeCheckoutRoutes({ baseUrl, selfPort }: Opts) {
  const store = createFakeStore();
  const endpoints = new Map<string, WebhookEndpoint>();
  const mock = () => new Stripe('sk_test_local_fake', { host: '127.0.0.1', port: selfPort(), protocol: 'http', maxNetworkRetries: 0 });
  const router = express.Router();
  const form = express.urlencoded({ extended: true });

  const send = (type: string, s: FakeSession) => deliverEvent(endpoints.values(), type, sessionJson(store, s));
  function expire(s: FakeSession) {
    s.status = 'expired';
    return send('checkout.session.expired', s);
  }
  /** Sessions past their expiry close the moment anyone looks at them. */
  function find(id: string) {
    const s = store.sessions.get(id);
    if (s && s.status === 'open' && s.expires_at <= nowSeconds()) void expire(s);
    return s;
  }
  const requireKey = (req: Request, res: Response, next: () => void) => {
    const auth = req.get('authorization') ?? '';
    if (!/^Bearer sk_test_/.test(auth)) { apiError(res, 401, 'A test secret key (sk_test_…) is required.'); return; }
    next();
  };

  router.post('/v1/checkout/sessions', requireKey, form, (req, res) => {
    const key = req.get('idempotency-key');
    const seen = key ? store.byKey.get(key) : undefined;
    if (seen) { res.json(sessionJson(store, find(seen)!)); return; }
    const b = (req.body ?? {}) as Body;
    if (b.mode !== 'payment') { apiError(res, 400, 'Only mode=payment is supported by the local fake.', 'mode'); return; }
    const parsed = parseLines(b.line_items);
    if (typeof parsed === 'string') { apiError(res, 400, parsed, 'line_items'); return; }
    const { lines, currency } = parsed;
    const successUrl = str(b.success_url);
    const cancelUrl = str(b.cancel_url);
    if (!successUrl || !cancelUrl) { apiError(res, 400, 'success_url and cancel_url are required.', successUrl ? 'cancel_url' : 'success_url'); return; }
    const now = nowSeconds();
    const expiresAt = int(b.expires_at) ?? now + 24 * 3600;
    // The provider's own limits: from 30 minutes to 24 hours after creation.
    if (expiresAt < now + 30 * 60 - 5 || expiresAt > now + 24 * 3600 + 5) { apiError(res, 400, 'expires_at must be 30 minutes to 24 hours from now.', 'expires_at'); return; }
    const id = fakeId('cs');
    const total = lines.reduce((n, l) => n + l.amount * l.quantity, 0);
    const s: FakeSession = {
      id, object: 'checkout.session', mode: 'payment', status: 'open', payment_status: 'unpaid', amount_subtotal: total, amount_total: total,
      currency, created: now, expires_at: expiresAt, success_url: successUrl, cancel_url: cancelUrl, customer_email: str(b.customer_email) ?? null,
      client_reference_id: str(b.client_reference_id) ?? null, metadata: (b.metadata ?? {}) as Record<string, string>, payment_intent: null,
      url: `${baseUrl()}/pay/${id}`, livemode: false, line_items: lines, heldEvent: false,
    };
    store.sessions.set(id, s);
    if (key) store.byKey.set(key, id);
    res.json(sessionJson(store, s));
  });

  router.get('/v1/checkout/sessions/:id', requireKey, (req, res) => {
    const s = find(String(req.params.id));
    if (!s) { apiError(res, 404, `No such checkout.session: '${req.params.id}'`, 'session'); return; }
    // The SDK sends expand[0]=…; Express 5's plain query parser keeps such keys as they are.
    const expand = Object.entries(req.query).filter(([k]) => k === 'expand' || k.startsWith('expand[')).flatMap(([, v]) => ([] as unknown[]).concat(v)).map(String);
    res.json(sessionJson(store, s, expand));
  });

  router.post('/v1/checkout/sessions/:id/expire', requireKey, form, async (req, res) => {
    const s = find(String(req.params.id));
    if (!s) { apiError(res, 404, `No such checkout.session: '${req.params.id}'`, 'session'); return; }
    if (s.status !== 'open') { apiError(res, 400, `Only Checkout Sessions with a status in ["open"] can be expired. This session has status "${s.status}".`); return; }
    await expire(s);
    res.json(sessionJson(store, s));
  });

  router.get('/v1/payment_intents/:id', requireKey, (req, res) => {
    const pi = store.intents.get(String(req.params.id));
    if (!pi) { apiError(res, 404, `No such payment_intent: '${req.params.id}'`, 'intent'); return; }
    res.json(pi);
  });

  // --- The local test payment page (what a buyer's browser is sent to in development) ---
  const backTo = (url: string, s: FakeSession) => url.replace('{CHECKOUT_SESSION_ID}', s.id);

  router.get('/pay/:id', (req, res) => {
    const s = find(String(req.params.id));
    if (!s) { res.status(404).type('text/plain').send('No such test payment page.'); return; }
    res.type('html').send(testPaymentPage(s));
  });

  router.post('/pay/:id', form, async (req, res) => {
    const s = find(String(req.params.id));
    if (!s) { res.status(404).type('text/plain').send('No such test payment page.'); return; }
    const outcome = str((req.body as Body)?.outcome);
    if (s.status === 'complete') {
      if (outcome === 'release' && s.heldEvent) { s.heldEvent = false; await send('checkout.session.completed', s); }
      res.redirect(303, backTo(s.success_url, s));
      return;
    }
    if (s.status !== 'open') { res.status(410).type('html').send(testPaymentPage(s)); return; }
    if (outcome === 'abandon') {
      await expire(s);
      res.redirect(303, backTo(s.cancel_url, s));
      return;
    }
    if (outcome === 'decline') {
      // The mock records a declined charge; the page stays open, as a real one does after a decline.
      await mock().charges.create({ amount: s.amount_total, currency: s.currency, source: 'tok_chargeDeclined', metadata: s.metadata }).catch(() => null);
      res.status(402).type('html').send(testPaymentPage(s, { tone: 'error', text: 'The test card was declined. Pick another outcome.' }));
      return;
    }
    if (outcome !== 'succeed') { res.status(400).type('html').send(testPaymentPage(s, { tone: 'error', text: 'Pick one of the outcomes below.' })); return; }
    const charge = await mock().charges.create(
      { amount: s.amount_total, currency: s.currency, source: 'tok_visa', metadata: { ...s.metadata, checkoutSession: s.id } },
      { idempotencyKey: `fake-page-${s.id}` },
    );
    const intent = { id: fakeId('pi'), object: 'payment_intent' as const, amount: s.amount_total, currency: s.currency, status: 'succeeded' as const, latest_charge: charge.id, metadata: s.metadata, created: nowSeconds() };
    store.intents.set(intent.id, intent);
    Object.assign(s, { status: 'complete', payment_status: 'paid', payment_intent: intent.id });
    if (str((req.body as Body)?.event) === 'hold') s.heldEvent = true;
    else await send('checkout.session.completed', s);
    res.redirect(303, backTo(s.success_url, s));
  });

  // --- Fake-only: where to send events (a real account registers endpoints in its dashboard) ---
  router.post('/_local/webhook-endpoints', express.json(), (req, res) => {
    const { url, secret } = (req.body ?? {}) as { url?: string; secret?: string };
    if (!url || !secret) { apiError(res, 400, 'url and secret are required'); return; }
    endpoints.set(url, { url, secret });
    res.status(201).json({ url });
  });
  router.delete('/_local/webhook-endpoints', express.json(), (req, res) => {
    endpoints.delete(String((req.body ?? {}).url ?? ''));
    res.status(204).end();
  });

  return { router, addWebhookEndpoint: (e: WebhookEndpoint) => endpoints.set(e.url, e), store };
}
