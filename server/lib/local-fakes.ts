import type { Server } from 'node:http';
import express from 'express';
import { MailDev } from 'maildev';
import { createExpressApp } from 'stripe-stateful-mock';
import { freePort } from './free-port';
import { fakeCheckoutRoutes } from './fake-payments/routes';
import type { WebhookEndpoint } from './fake-payments/events';

export type LocalFakes = {
  smtpPort: number;
  mailWebPort: number;
  stripePort: number;
  /** Where the payment fake posts its signed events (the shop's /api/webhooks/payments). */
  addWebhookEndpoint(endpoint: WebhookEndpoint): void;
  stop(): Promise<void>;
};

/**
 * Starts the mail catcher and the payment fake in this process, bound to loopback only. The payment
 * fake is stripe-stateful-mock with hosted checkout sessions and a local test payment page in front.
 */
export async function startLocalFakes(opts: { smtpPort?: number; mailWebPort?: number; stripePort?: number } = {}): Promise<LocalFakes> {
  const smtpPort = opts.smtpPort ?? (await freePort());
  const mailWebPort = opts.mailWebPort ?? (await freePort());
  const stripePort = opts.stripePort ?? (await freePort());
  const maildev = new MailDev({ smtp: smtpPort, web: mailWebPort, ip: '127.0.0.1', webIp: '127.0.0.1', silent: true });
  await maildev.start();
  const checkout = fakeCheckoutRoutes({ baseUrl: () => `http://127.0.0.1:${stripePort}`, selfPort: () => stripePort });
  const app = express();
  app.disable('x-powered-by');
  app.use(checkout.router);
  app.use(createExpressApp());
  const stripeServer: Server = await new Promise((resolve) => {
    const s = app.listen(stripePort, '127.0.0.1', () => resolve(s));
  });
  return {
    smtpPort,
    mailWebPort,
    stripePort,
    addWebhookEndpoint: checkout.addWebhookEndpoint,
    async stop() {
      await maildev.stop();
      stripeServer.closeAllConnections?.();
      await new Promise((r) => stripeServer.close(() => r(null)));
    },
  };
}
