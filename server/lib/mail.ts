import nodemailer from 'nodemailer';
import { getLogger } from './logger';

export type MailMessage = { to: string; subject: string; html: string; text: string };
export type Mailer = {
  send(message: MailMessage): Promise<void>;
  /** Connects to the mail server and says hello, without sending (readiness check). */
  verify(): Promise<void>;
  close(): void;
};

export type MailerOptions = { host: string; port: number; from: string; retries?: number; retryDelayMs?: number };

/** SMTP mailer (maildev on localhost in development and tests); retries transient failures. */
export function createMailer({ host, port, from, retries = 3, retryDelayMs = 200 }: MailerOptions): Mailer {
  const transport = nodemailer.createTransport({ host, port, secure: false, ignoreTLS: true });
  return {
    async send(message) {
      let lastError: unknown;
      for (let attempt = 1; attempt <= retries; attempt++) {
        try {
          await transport.sendMail({ from, ...message });
          return;
        } catch (err) {
          lastError = err;
          getLogger().warn({ part: 'mail', to: message.to, attempt, of: retries, reason: (err as Error).message }, 'sending an e-mail failed');
          await new Promise((r) => setTimeout(r, retryDelayMs * attempt));
        }
      }
      throw lastError;
    },
    async verify() {
      await transport.verify();
    },
    close: () => transport.close(),
  };
}
