import { z } from 'zod';

export const WEEKDAY_NAMES = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'] as const;
export const MAX_SLOT_DAYS = 60;

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2026-05-14')
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s), 'Not a real date');
const clock = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use 24-hour time like 15:00');

export const isoDateSchema = isoDate;

export const pickupWindowSchema = z.object({
  id: z.number().int().positive().optional(),
  weekday: z.number().int().min(0, 'Pick a weekday').max(6, 'Pick a weekday'),
  startsAt: clock,
  endsAt: clock,
  capacity: z.number({ error: 'Places must be a number' }).int('Places must be a whole number').min(1, 'At least 1 place').max(50, 'At most 50 places'),
  active: z.boolean().default(true),
}).refine((w) => w.startsAt < w.endsAt, { path: ['endsAt'], message: 'The window must end after it starts' });

export const closedDaySchema = z.object({
  day: isoDate,
  note: z.string().trim().max(200, 'Keep the note under 200 characters').default(''),
});

export const pickupSettingsSchema = z.object({
  yardAddress: z.string().trim().min(5, 'Enter the yard address').max(300, 'The address is too long'),
  windows: z.array(pickupWindowSchema).max(40, 'At most 40 windows'),
  closedDays: z.array(closedDaySchema).max(366, 'Too many closed days')
    .refine((days) => new Set(days.map((d) => d.day)).size === days.length, 'Each closed day once only'),
}).strict();
export type PickupSettingsInput = z.input<typeof pickupSettingsSchema>;
export type PickupSettings = z.infer<typeof pickupSettingsSchema>;
export type PickupWindowView = Required<z.infer<typeof pickupWindowSchema>>;

export const pickupSlotsQuerySchema = z.object({
  from: isoDate.optional(),
  days: z.coerce.number().int().min(1).max(MAX_SLOT_DAYS).default(14),
});

/** One bookable (date × weekly window) with the places left. */
export type PickupSlot = {
  date: string;
  windowId: number;
  weekday: number;
  startsAt: string;
  endsAt: string;
  capacity: number;
  remaining: number;
  full: boolean;
};
export type PickupSlotsResponse = { slots: PickupSlot[]; yardAddress: string | null; closedDays: { day: string; note: string }[] };

export const formatWindow = (w: { startsAt: string; endsAt: string }) => `${w.startsAt}–${w.endsAt}`;
export const weekdayOf = (isoDay: string) => new Date(`${isoDay}T00:00:00Z`).getUTCDay();
