/**
 * The demo mill: Varrow Creek Slab Mill, a two-person yard outside the
 * (invented) town of Quennadale in the Varrow Valley. Its rules, figure
 * premiums, pickup hours, closed days and demo accounts.
 */
import { addDays, isoDay, nextWeekday } from './dates';

export const DEMO_MILL_SETTINGS = {
  id: 1,
  millName: 'Varrow Creek Slab Mill',
  yardAddress: '41 Kettlebank Road, Quennadale, Varrow Valley',
  contactEmail: 'yard@varrowcreek.test',
  holdHours: 48,
  targetMcPercent: 8,
  minimumChargeCents: 4000,
  thickPremiumMinIn: 3,
  thickPremiumMultiplier: 1.15,
  flatteningCentsPerSqFt: 900,
  noShowRule: 'keep',
  maxReadingAgeDays: 60,
} as const;

export type DemoFigureKind = { slug: string; label: string; premiumMultiplier: number };

export const DEMO_FIGURE_KINDS: DemoFigureKind[] = [
  { slug: 'crotch', label: 'Crotch', premiumMultiplier: 1.5 },
  { slug: 'burl', label: 'Burl', premiumMultiplier: 1.75 },
  { slug: 'curl', label: 'Curl', premiumMultiplier: 1.25 },
  { slug: 'quilted', label: 'Quilted', premiumMultiplier: 1.4 },
  { slug: 'spalted', label: 'Spalted', premiumMultiplier: 1.2 },
  { slug: 'ray-fleck', label: 'Ray fleck', premiumMultiplier: 1.15 },
];

export type DemoPickupWindow = { weekday: number; startsAt: string; endsAt: string; capacity: number };

export const DEMO_PICKUP_WINDOWS: DemoPickupWindow[] = [
  { weekday: 2, startsAt: '15:00', endsAt: '18:00', capacity: 3 },
  { weekday: 4, startsAt: '15:00', endsAt: '18:00', capacity: 3 },
  { weekday: 6, startsAt: '09:00', endsAt: '12:00', capacity: 4 },
  { weekday: 6, startsAt: '13:00', endsAt: '16:00', capacity: 4 },
];

/** Two of the mill's own days off, placed on pickup days in the coming weeks so the calendar shows them. */
export function demoClosedDays(today: Date): { day: string; note: string }[] {
  const stocktake = nextWeekday(addDays(today, 8), 6);
  const bladeDay = nextWeekday(addDays(today, 19), 4);
  return [
    { day: isoDay(stocktake), note: 'Yard stocktake: every stack re-measured and re-stickered' },
    { day: isoDay(bladeDay), note: 'Blade day: the bandmill is away for resharpening and setting' },
  ];
}

export type DemoAccount = { email: string; password: string; name: string; role: 'admin' | 'seller' | 'buyer' };

/** Demo-only credentials, printed by `npm start`; never use them outside a local demo. */
export const DEMO_ACCOUNTS: DemoAccount[] = [
  { email: 'ilse@stickerline.test', password: 'demo-admin-2417', name: 'Ilse Farrant', role: 'admin' },
  { email: 'tobin@stickerline.test', password: 'demo-seller-5830', name: 'Tobin Ashgrove', role: 'seller' },
  { email: 'priya@example.test', password: 'demo-buyer-7152', name: 'Priya Venhollow', role: 'buyer' },
  { email: 'dario@example.test', password: 'demo-buyer-9364', name: 'Dario Quist', role: 'buyer' },
];
