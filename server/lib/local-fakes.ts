import type { Server } from 'node:http';
import { MailDev } from 'maildev';
import { createExpressApp } from 'stripe-stateful-mock';
import { freePort } from './free-port';

export type LocalFakes = {
  smtpPort: number;
  mailWebPort: number;
  stripePort: number;
  stop(): Promise<void>;
};

/** Starts the mail catcher and the payment fake in this process, bound to loopback only. */
export async function startLocalFakes(opts: { smtpPort?: number; mailWebPort?: number; stripePort?: number } = {}): Promise<LocalFakes> {
  const smtpPort = opts.smtpPort ?? (await freePort());
  const mailWebPort = opts.mailWebPort ?? (await freePort());
  const stripePort = opts.stripePort ?? (await freePort());
  const maildev = new MailDev({ smtp: smtpPort, web: mailWebPort, ip: '127.0.0.1', webIp: '127.0.0.1', silent: true });
  await maildev.start();
  const stripeServer: Server = await new Promise((resolve) => {
    const s = createExpressApp().listen(stripePort, '127.0.0.1', () => resolve(s));
  });
  return {
    smtpPort,
    mailWebPort,
    stripePort,
    async stop() {
      await maildev.stop();
      await new Promise((r) => stripeServer.close(() => r(null)));
    },
  };
}
