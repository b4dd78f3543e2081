// Every e-mail Stickerline sends is built here, as HTML with a plain-text twin.
import { formatDay } from '../../shared/dates';
import { formatWeight } from '../../shared/wood/index';

export type EmailContent = { subject: string; html: string; text: string };

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** Wraps paragraphs in a plain, readable layout; `paragraphs` are plain text, escaped here. */
export function layout(title: string, paragraphs: string[], action?: { label: string; url: string }): EmailContent {
  const htmlBody = paragraphs.map((p) => `<p style="margin:0 0 12px">${escapeHtml(p).replace(/\n/g, '<br>')}</p>`).join('');
  const button = action
    ? `<p><a href="${escapeHtml(action.url)}" style="background:#5b3a1e;color:#fff;padding:10px 16px;border-radius:4px;text-decoration:none">${escapeHtml(action.label)}</a></p>`
    : '';
  const html = `<!doctype html><html><body style="font-family:Georgia,serif;color:#2b2118;max-width:560px;margin:auto">
<h1 style="font-size:20px">${escapeHtml(title)}</h1>${htmlBody}${button}
<p style="font-size:12px;color:#6b5a4a">Stickerline yard mail</p></body></html>`;
  const text = [title, '', ...paragraphs, ...(action ? ['', `${action.label}: ${action.url}`] : [])].join('\n\n');
  return { subject: title, html, text };
}

export function passwordResetEmail({ name, url }: { name: string; url: string }): EmailContent {
  return layout(
    'Reset your Stickerline password',
    [`Hello ${name},`, 'Someone asked to reset the password for this account. If it was you, use the link below within one hour. If not, you can ignore this message.'],
    { label: 'Choose a new password', url },
  );
}

// --- Holds, orders and pickup ---

const money = (cents: number) => `$${(cents / 100).toFixed(2)}`;

export type PickupDetails = { yardAddress: string; on: string; startsAt: string; endsAt: string };
export type OrderEmailInput = {
  name: string;
  code: string;
  totalCents: number;
  /** Sales tax, its own line (0 when none is due). */
  taxCents: number;
  taxExemptCertificate: string | null;
  totalWeightLb: number;
  slabs: { code: string; speciesName: string; totalCents: number; withFlattening: boolean }[];
  pickup: PickupDetails;
  bring: string[];
  vehicle: string;
  loadingHelp: boolean;
  caution: string;
  url: string;
};

const slabLines = (slabs: OrderEmailInput['slabs']) =>
  slabs.map((s) => `• ${s.code} — ${s.speciesName}${s.withFlattening ? ', flattened' : ''}: ${money(s.totalCents)}`).join('\n');
const pickupLine = (p: PickupDetails) => `${formatDay(p.on)}, ${p.startsAt}–${p.endsAt}, at ${p.yardAddress}`;

export function orderConfirmationEmail(o: OrderEmailInput): EmailContent {
  return layout(
    `Order ${o.code} is paid — see you at the yard`,
    [
      `Hello ${o.name},`,
      `Thank you. Your payment of ${money(o.totalCents)} went through and these slabs are now yours:\n${slabLines(o.slabs)}`,
      o.taxCents > 0 ? `Sales tax: ${money(o.taxCents)}` : o.taxExemptCertificate ? `No sales tax: resale certificate ${o.taxExemptCertificate}.` : 'Sales tax: $0.00',
      `Pickup: ${pickupLine(o.pickup)}.`,
      `Total weight about ${formatWeight(o.totalWeightLb)}. ${o.vehicle}`,
      `What to bring:\n${o.bring.map((b) => `• ${b}`).join('\n')}`,
      o.loadingHelp ? 'You asked for loading help: the yard crew will be ready for you.' : 'You did not ask for loading help; tell us before the day if you need it.',
      o.caution,
    ],
    { label: 'See your order', url: o.url },
  );
}

export function pickupReminderEmail(o: Pick<OrderEmailInput, 'name' | 'code' | 'slabs' | 'pickup' | 'bring' | 'caution' | 'url' | 'totalWeightLb'>): EmailContent {
  return layout(
    `Tomorrow: pickup for order ${o.code}`,
    [
      `Hello ${o.name},`,
      `A reminder that your slabs are waiting for you tomorrow: ${pickupLine(o.pickup)}.`,
      slabLines(o.slabs),
      `Total weight about ${formatWeight(o.totalWeightLb)}. Bring:\n${o.bring.map((b) => `• ${b}`).join('\n')}`,
      o.caution,
    ],
    { label: 'See your order', url: o.url },
  );
}

export function holdExpiredEmail({ name, slabs, url }: { name: string; slabs: { code: string; speciesName: string }[]; url: string }): EmailContent {
  const many = slabs.length > 1;
  return layout(
    many ? 'Your holds on slabs have ended' : `Your hold on slab ${slabs[0]?.code ?? ''} has ended`,
    [
      `Hello ${name},`,
      `The hold time ran out before checkout, so ${many ? 'these slabs are' : 'this slab is'} back on sale for everyone:\n${slabs.map((s) => `• ${s.code} — ${s.speciesName}`).join('\n')}`,
      'If you still want it, you can reserve it again while it is listed.',
    ],
    { label: 'Browse the yard', url },
  );
}

// --- office (admin) messages -------------------------------------------------------------------

export function refundIssuedEmail(r: { name: string; code: string; amountCents: number; reason: string; slabCodes: string[]; fullyRefunded: boolean }): EmailContent {
  return layout(
    `Refund of ${money(r.amountCents)} on order ${r.code}`,
    [
      `Hello ${r.name},`,
      `We have refunded ${money(r.amountCents)} to the card you paid with. Depending on your bank it can take 5–10 working days to show.`,
      `Reason: ${r.reason}`,
      ...(r.slabCodes.length ? [`Slabs no longer part of the order: ${r.slabCodes.join(', ')}.`] : []),
      r.fullyRefunded ? 'The order is now refunded in full.' : 'The rest of the order stays as it was.',
      'Questions? Just reply to this message.',
    ],
  );
}

export function pickupRescheduledEmail(r: { name: string; code: string; pickup: PickupDetails; previous: string | null }): EmailContent {
  return layout(
    `New pickup time for order ${r.code}`,
    [
      `Hello ${r.name},`,
      `The yard office has moved your pickup${r.previous ? ` (it was ${r.previous})` : ''}.`,
      `New pickup: ${pickupLine(r.pickup)}.`,
      'If this time does not suit you, reply to this message and we will find another.',
    ],
  );
}

// --- buyers' own requests ---------------------------------------------------------------------

export function holdPlacedEmail({ name, slabs, until, url }: { name: string; slabs: { code: string; speciesName: string }[]; until: string; url: string }): EmailContent {
  const many = slabs.length > 1;
  return layout(
    many ? `${slabs.length} slabs are held for you` : `Slab ${slabs[0]?.code ?? ''} is held for you`,
    [
      `Hello ${name},`,
      `${many ? 'These slabs are' : 'This slab is'} set aside for you until ${until}:\n${slabs.map((s) => `• ${s.code} — ${s.speciesName}`).join('\n')}`,
      'Pay and choose a pickup time before then. If you change your mind, release the hold so another woodworker can have it.',
    ],
    { label: 'See your holds', url },
  );
}

export function slabFreeAgainEmail({ name, code, speciesName, url }: { name: string; code: string; speciesName: string; url: string }): EmailContent {
  return layout(
    `Slab ${code} is for sale again`,
    [
      `Hello ${name},`,
      `You asked us to tell you when slab ${code} (${speciesName}) came free. The hold on it has ended and it is for sale again.`,
      'Slabs are one of a kind and go to whoever reserves first, so do not wait too long.',
    ],
    { label: `See slab ${code}`, url },
  );
}

export function emailChangeEmail({ name, newEmail, url }: { name: string; newEmail: string; url: string }): EmailContent {
  return layout(
    'Confirm your new e-mail for Stickerline',
    [
      `Hello ${name},`,
      `Someone asked to use ${newEmail} for a Stickerline account. If it was you, confirm with the link below; until then the account keeps its old address. If not, you can ignore this message.`,
    ],
    { label: 'Confirm this e-mail', url },
  );
}
