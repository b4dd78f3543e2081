import nodemailer from 'nodemailer';

export type MailMessage = { to: string; subject: string; html: string; text: string };
export type Mailer = { send(message: MailMessage): Promise<void>; close(): void };

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
          console.warn(`[mail] attempt ${attempt}/${retries} to ${message.to} failed: ${(err as Error).message}`);
          await new Promise((r) => setTimeout(r, retryDelayMs * attempt));
        }
      }
      throw lastError;
    },
    close: () => transport.close(),
  };
}
