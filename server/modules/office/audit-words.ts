import { formatCents } from '../../../shared/wood/index';
import { STATUS_LABELS, type SlabStatus } from '../../../shared/slabs';
import { DRYING_STATES } from '../../../shared/wood/index';
import { METER_KIND_LABELS, type MeterKind } from '../../../shared/readings';

type Obj = Record<string, unknown>;
const o = (v: unknown): Obj => (v && typeof v === 'object' ? (v as Obj) : {});
const money = (v: unknown) => (typeof v === 'number' ? formatCents(v) : '—');
const status = (v: unknown) => STATUS_LABELS[v as SlabStatus] ?? String(v ?? '—');
const drying = (v: unknown) => DRYING_STATES.find((d) => d.state === v)?.label ?? String(v ?? '—');
const list = (v: unknown) => (Array.isArray(v) ? v.join(', ') : '');
const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
const FIELD_WORDS: Record<string, string> = {
  code: 'code', speciesSlug: 'species', felledOn: 'felling date', milledOn: 'milling date', lengthIn: 'length',
  buttDiameterIn: 'butt diameter', topDiameterIn: 'top diameter', sawingMethod: 'sawing method', originNote: 'origin', notes: 'notes',
};
const WHY_LEFT: Record<string, string> = {
  'released-by-buyer': 'the buyer released it', 'released-by-office': 'the office let it go', expired: 'its hold ran out', refunded: 'it was refunded',
};

function reading(r: Obj) {
  const kind = METER_KIND_LABELS[r.meterKind as MeterKind]?.toLowerCase() ?? 'meter';
  return `${r.mcPercent} % moisture content (${kind}, measured ${r.measuredOn})`;
}

/** The change in plain words, from what the service recorded. No ids, no raw data. */
export function describeChange(action: string, beforeRaw: unknown, afterRaw: unknown, millTime: (iso: string) => string): string {
  const before = o(beforeRaw);
  const after = o(afterRaw);
  switch (action) {
    case 'log.create': return 'Recorded the log';
    case 'log.update': return `Changed the log's ${list((Array.isArray(after.fields) ? after.fields : []).map((f) => FIELD_WORDS[f as string] ?? f)) || 'details'}`;
    case 'slab.create': return `Recorded the slab (${status(after.status)}, ${money(after.priceCents)})`;
    case 'slab.status': return `Moved the slab from “${status(before.status)}” to “${status(after.status)}”`;
    case 'slab.price': return `Changed the price from ${money(before.priceCents)} to ${money(after.priceCents)}${after.priceOverrideReason ? ` (set by hand: ${after.priceOverrideReason})` : ''}`;
    case 'slab.drying-state': return `Drying state went from ${drying(before.dryingState)} to ${drying(after.dryingState)} after a reading of ${after.mcPercent} %`;
    case 'moisture-reading.create': return `Recorded a reading of ${reading(after)}${after.review === 'confirmed' ? ', confirmed after a jump from the previous reading' : ''}`;
    case 'moisture-reading.delete': return `Deleted the reading of ${reading(before)}`;
    case 'slab-photo.add': return `Added ${plural(Number(after.count ?? 1), 'photo')}`;
    case 'slab-photo.delete': return 'Removed a photo';
    case 'matched-set.mark': return `Marked ${list(after.slabCodes)} as book-matched`;
    case 'matched-set.unmark': return `Unmarked the book-matched set ${list(before.slabCodes)}`;
    case 'matched-set.rest-still-held':
      return `Left its held book-matched set (${WHY_LEFT[after.why as string] ?? 'released'}); the rest — ${list(after.restSlabCodes)} — stays held until ${typeof after.heldUntil === 'string' ? millTime(after.heldUntil) : 'its own expiry'}. The buyer was e-mailed.`;
    case 'hold.release': return 'Let go of the hold; the slab is back on sale';
    case 'order.paid': return `Order paid${after.totalCents !== undefined ? ` (${money(after.totalCents)})` : ''}`;
    case 'order.picked-up': return 'Marked the order as picked up';
    case 'order.no-show': return 'Marked the order as a no-show';
    case 'order.reschedule': return `Moved the pickup to ${after.pickupOn ?? 'a new day'}`;
    case 'order.refund': return `Refunded ${money(after.amountCents)}${after.reason ? ` — ${after.reason}` : ''}${list(after.slabCodes) ? `; slabs ${list(after.slabCodes)} ${after.slabsReturnedTo ? `back to “${status(after.slabsReturnedTo)}”` : 'refunded'}` : ''}`;
    case 'user.role': return `Changed the role from ${before.role ?? '—'} to ${after.role ?? '—'}`;
    case 'user.disable': return 'Disabled the account';
    case 'user.enable': return 'Enabled the account again';
    case 'mill-rules.update': return `Saved the mill's prices and rules${typeof after.repricedSlabs === 'number' ? ` (${plural(after.repricedSlabs, 'unsold slab')} repriced)` : ''}`;
    case 'pickup-settings.update': return 'Changed the pickup hours and closed days';
    case 'figure-kind.create': return `Added the figure “${after.label ?? ''}”`;
    default:
      if (action.startsWith('payment-event.')) return `The payment provider reported: ${action.slice('payment-event.'.length).replace(/[._]/g, ' ')}`;
      return action.replace(/[.-]/g, ' ');
  }
}
