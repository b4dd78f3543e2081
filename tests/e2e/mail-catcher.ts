/** Reads the product's mail catcher (maildev's REST API) the way a person would check an inbox. */
export type CaughtMail = { subject: string; html: string; text: string; to: { address: string }[]; date: string };

export async function inbox(mailWebPort: number, address: string): Promise<CaughtMail[]> {
  const res = await fetch(`http://127.0.0.1:${mailWebPort}/api/email`);
  if (!res.ok) throw new Error(`mail catcher answered ${res.status}`);
  const all = (await res.json()) as CaughtMail[];
  return all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
}

/** Polls until a message to `address` matches; the error lists what did arrive, to ease debugging. */
export async function waitForMail(
  mailWebPort: number, address: string, match: (m: CaughtMail) => boolean, timeoutMs = 20_000,
): Promise<CaughtMail> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const mails = await inbox(mailWebPort, address);
    const found = mails.find(match);
    if (found) return found;
    if (Date.now() > until) {
      const subjects = mails.map((m) => `  - ${m.subject}`).join('\n') || '  (none)';
      throw new Error(`no matching e-mail to ${address} within ${timeoutMs} ms; it has:\n${subjects}`);
    }
    await new Promise((r) => setTimeout(r, 250));
  }
}

/** The message as plain words, whichever part the template filled. */
export const mailText = (m: CaughtMail) => (m.text || m.html.replace(/<[^>]+>/g, ' ')).replace(/\s+/g, ' ');
