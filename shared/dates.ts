/**
 * The one way dates are written for people, on screens, in e-mails and in files: "Thu 3 Dec 2026"
 * and "Thu 3 Dec 2026, 14:05", always as the clock reads at the mill (its IANA time zone), so the
 * office, the yard and a buyer far away read the same day and hour.
 */

const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

export const DEFAULT_MILL_TIME_ZONE = 'UTC';

type WallClock = { year: number; month: number; day: number; hour: number; minute: number };

function wallClock(at: Date, timeZone: string): WallClock {
  const parts = new Intl.DateTimeFormat('en-US', {
    timeZone, hourCycle: 'h23', year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric',
  }).formatToParts(at);
  const get = (type: string) => Number(parts.find((p) => p.type === type)?.value);
  return { year: get('year'), month: get('month'), day: get('day'), hour: get('hour'), minute: get('minute') };
}

const dayWords = (year: number, month: number, day: number) =>
  `${WEEKDAYS[new Date(Date.UTC(year, month - 1, day)).getUTCDay()]} ${day} ${MONTHS[month - 1]} ${year}`;

const asDate = (value: Date | string) => (value instanceof Date ? value : new Date(value));

/** A calendar day ("2026-12-03", or an instant read at the mill) as "Thu 3 Dec 2026". */
export function formatDay(value: Date | string, timeZone = DEFAULT_MILL_TIME_ZONE): string {
  if (typeof value === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(value)) {
    const [y, m, d] = value.split('-').map(Number);
    return dayWords(y, m, d);
  }
  const at = asDate(value);
  if (Number.isNaN(at.getTime())) return 'unknown date';
  const c = wallClock(at, timeZone);
  return dayWords(c.year, c.month, c.day);
}

/** An instant as "Thu 3 Dec 2026, 14:05" on the mill's clock. */
export function formatDateTime(value: Date | string, timeZone = DEFAULT_MILL_TIME_ZONE): string {
  const at = asDate(value);
  if (Number.isNaN(at.getTime())) return 'unknown time';
  const c = wallClock(at, timeZone);
  return `${dayWords(c.year, c.month, c.day)}, ${String(c.hour).padStart(2, '0')}:${String(c.minute).padStart(2, '0')}`;
}
