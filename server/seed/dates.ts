/** Calendar helpers for the demo data; all dates are whole UTC days. */
const DAY_MS = 86_400_000;

export const startOfUtcDay = (d: Date) => new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()));
export const addDays = (d: Date, days: number) => new Date(d.getTime() + Math.round(days) * DAY_MS);
export const isoDay = (d: Date) => d.toISOString().slice(0, 10);
export const daysBetween = (from: Date, to: Date) => Math.round((to.getTime() - from.getTime()) / DAY_MS);

/** The first date on or after `from` that falls on `weekday` (0 = Sunday). */
export function nextWeekday(from: Date, weekday: number): Date {
  return addDays(from, (weekday - from.getUTCDay() + 7) % 7);
}
