import type { FakeSession } from './store';

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
const money = (cents: number) => `$${(cents / 100).toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;

// Plain and deliberately unlike any real payment page: a developer's switchboard, not a card form.
const STYLE = `
body{font-family:system-ui,sans-serif;background:#f4f1ea;color:#2a241d;margin:0;padding:1rem}
main{max-width:36rem;margin:auto}
.banner{border:3px dashed #8a5a00;background:#fff6dc;padding:.75rem 1rem;margin-bottom:1rem}
table{width:100%;border-collapse:collapse;margin:.5rem 0 1rem}
td{padding:.3rem 0;border-bottom:1px solid #d8d0c2}td.n{text-align:right}
fieldset{border:1px solid #b9ae9c;margin:0 0 1rem;padding:.5rem 1rem}
label{display:block;min-height:2.75rem;line-height:2.75rem}
button{display:block;width:100%;min-height:2.75rem;margin:.5rem 0;font:inherit;border:2px solid #2a241d;background:#fff;cursor:pointer}
button:focus-visible{outline:3px solid #8a5a00;outline-offset:2px}
.msg{border-left:6px solid #a4271a;background:#fff;padding:.5rem 1rem}
`;

export type PageNote = { tone: 'error' | 'info'; text: string };

/** The local stand-in for the provider's hosted page: the developer picks what the payment does. */
export function testPaymentPage(s: FakeSession, note?: PageNote) {
  const lines = s.line_items.map((l) => `<tr><td>${esc(l.name)}</td><td class="n">${money(l.amount * l.quantity)}</td></tr>`).join('');
  const msg = note ? `<p class="msg" role="${note.tone === 'error' ? 'alert' : 'status'}">${esc(note.text)}</p>` : '';
  let body: string;
  if (s.status === 'open') {
    body = `<form method="post">
<fieldset><legend>When the shop hears about a successful payment</legend>
<label><input type="radio" name="event" value="now" checked> Send the signed event now, before returning to the shop</label>
<label><input type="radio" name="event" value="hold"> Hold the event back (release it later from this page)</label>
</fieldset>
<button name="outcome" value="succeed">Test payment succeeds</button>
<button name="outcome" value="decline">Test card is declined</button>
<button name="outcome" value="abandon">Abandon the payment and go back to the shop</button>
</form>`;
  } else if (s.status === 'complete') {
    body = `<p>This test payment succeeded.</p><form method="post">
${s.heldEvent ? '<button name="outcome" value="release">Release the held event to the shop</button>' : ''}
<button name="outcome" value="return">Back to the shop</button></form>`;
  } else {
    body = '<p>This test payment page has expired. Go back to the shop and start again.</p>';
  }
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>Local test payment — Stickerline development</title><style>${STYLE}</style></head><body><main>
<div class="banner"><strong>Local test payment page.</strong> This page is part of Stickerline's development fake. No card is asked for and no real money moves. With a live payment key, buyers see the payment provider's own page instead.</div>
<h1>Test payment for ${esc(s.metadata.orderCode ?? 'an order')}</h1>
<table><tbody>${lines}<tr><td><strong>Total</strong></td><td class="n"><strong>${money(s.amount_total)}</strong></td></tr></tbody></table>
${msg}${body}</main></body></html>`;
}
