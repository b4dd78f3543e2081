import type { PickupSlot } from '../../../shared/pickups';

export type WindowRow = { id: number; weekday: number; startsAt: string; endsAt: string; capacity: number; active: boolean };

const DAY_MS = 86_400_000;
export const isoDay = (d: Date) => d.toISOString().slice(0, 10);
export const addDays = (day: string, n: number) => isoDay(new Date(Date.parse(`${day}T00:00:00Z`) + n * DAY_MS));

/**
 * The mill's clock. Window times are read as UTC until the mill has a time-zone setting, so the
 * demo's dates and times agree on every machine.
 */
export const windowStart = (day: string, hhmm: string) => new Date(`${day}T${hhmm}:00Z`);

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
