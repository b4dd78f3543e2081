import type { PickupSlot } from '../../../shared/pickups';

export type WindowRow = { id: number; weekday: number; startsAt: string; endsAt: string; capacity: number; active: boolean };

const DAY_MS = 86_400_000;
export const isoDay = (d: Date) => d.toISOString().slice(0, 10);
export const addDays = (day: string, n: number) => isoDay(new Date(Date.parse(`${day}T00:00:00Z`) + n * DAY_MS));

/** The mill's time zone (IANA name, e.g. America/Chicago) from MILL_TIME_ZONE; UTC when unset. */
export const millTimeZone = () => process.env.MILL_TIME_ZONE || 'UTC';

/** How far the wall clock in `tz` is ahead of UTC at instant `at`, in ms. */
function zoneOffsetMs(at: Date, tz: string): number {
  const parts = new Intl.DateTimeFormat('en-US', {
    timeZone: tz, hourCycle: 'h23', year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', second: '2-digit',
  }).formatToParts(at);
  const get = (type: string) => Number(parts.find((p) => p.type === type)?.value);
  return Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute'), get('second')) - at.getTime();
}

/** The instant a window opens: wall time `hhmm` on `day` at the mill (daylight saving included). */
export function windowStart(day: string, hhmm: string, tz = millTimeZone()): Date {
  const naive = Date.parse(`${day}T${hhmm}:00Z`);
  const first = naive - zoneOffsetMs(new Date(naive), tz);
  // Near a clock change the offset at the true instant can differ from the guess: use that one.
  return new Date(naive - zoneOffsetMs(new Date(first), tz));
}

/** An instant as the mill's clock shows it, for e-mails: "Fri, Dec 4, 2026, 14:30 (America/Chicago)". */
export const millDateTime = (at: Date, tz = millTimeZone()) =>
  `${new Intl.DateTimeFormat('en-US', { timeZone: tz, weekday: 'short', year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(at)} (${tz})`;

/** The calendar date at the mill for an instant (YYYY-MM-DD). */
export const millDay = (at: Date, tz = millTimeZone()) =>
  new Intl.DateTimeFormat('en-CA', { timeZone: tz, year: 'numeric', month: '2-digit', day: '2-digit' }).format(at);

/** Dates × weekly windows from `from` for `days` days: closed days and windows already begun are left out. */
export function buildSlots({ windows, closed, booked, from, days, now }: {
  windows: WindowRow[]; closed: Set<string>; booked: Map<string, number>; from: string; days: number; now: Date;
}): PickupSlot[] {
  const slots: PickupSlot[] = [];
  const sorted = [...windows].filter((w) => w.active).sort((a, b) => a.startsAt.localeCompare(b.startsAt));
  for (let i = 0; i < days; i++) {
    const date = addDays(from, i);
    if (closed.has(date)) continue;
    const weekday = new Date(`${date}T00:00:00Z`).getUTCDay();
    for (const w of sorted) {
      if (w.weekday !== weekday || windowStart(date, w.startsAt) <= now) continue;
      const taken = booked.get(`${date}|${w.id}`) ?? 0;
      const remaining = Math.max(0, w.capacity - taken);
      slots.push({ date, windowId: w.id, weekday, startsAt: w.startsAt, endsAt: w.endsAt, capacity: w.capacity, remaining, full: remaining === 0 });
    }
  }
  return slots;
}
