/**
 * Moisture histories for the demo slabs. Air drying is modelled as an
 * exponential approach to the yard's equilibrium moisture content (EMC),
 * slower for thicker stock (about one year per inch to reach ~20 %), with a
 * seasonal EMC swing; some slabs are moved into the heated shed afterwards
 * and fall towards an indoor EMC below the mill's 8 % target.
 */
import { addDays, daysBetween, isoDay } from './dates';
import { toSixteenths } from '../../shared/wood/index';
import { round1, toEighths, type Rng } from './prng';

export type DemoReading = {
  measuredOn: string;
  mcPercent: number;
  meterKind: 'pin' | 'pinless';
  location: string;
  depthIn: number;
  ambientTempF: number;
  ambientRhPercent: number;
};

export type MoistureHistory = { readings: DemoReading[]; movedIndoorsOn: Date | null };

const OUTDOOR_EMC = 12;
const INDOOR_EMC = 6.5;
const TWO_PI = 2 * Math.PI;

const dayOfYear = (d: Date) => daysBetween(new Date(Date.UTC(d.getUTCFullYear(), 0, 1)), d);
/** Wetter, cooler air in winter raises the yard EMC; dry summer air lowers it. */
const outdoorEmc = (d: Date) => OUTDOOR_EMC + 2.5 * Math.cos((TWO_PI * (dayOfYear(d) - 15)) / 365);
const outdoorTempF = (d: Date) => 52 + 22 * Math.sin((TWO_PI * (dayOfYear(d) - 110)) / 365);

/** Species that dry slowly in the yard (oaks) get a longer time constant, softwoods a shorter one. */
const SPECIES_DRYING_FACTOR: Record<string, number> = {
  'white-oak': 1.15, 'northern-red-oak': 1.1, 'black-walnut': 1, 'black-cherry': 0.95, 'sugar-maple': 1,
  'red-maple': 0.95, sweetgum: 1.05, 'american-sycamore': 1, 'douglas-fir': 0.85, 'eastern-white-pine': 0.8,
};

export type MoistureInput = {
  rng: Rng;
  speciesSlug: string;
  thicknessIn: number;
  milledOn: Date;
  today: Date;
  /** Whether the yard would move this slab into the shed once it is air-dry. */
  movesIndoors: boolean;
};

export function moistureHistory({ rng, speciesSlug, thicknessIn, milledOn, today, movesIndoors }: MoistureInput): MoistureHistory {
  const factor = SPECIES_DRYING_FACTOR[speciesSlug] ?? 1;
  const tauOutdoor = 175 * thicknessIn * factor; // days
  const tauIndoor = 40 * thicknessIn * factor;
  const pinOnly = thicknessIn > 2.5;
  const pinDepth = toEighths(Math.min(1, thicknessIn / 4));

  let mc = rng.between(48, 78);
  let day = milledOn;
  let indoorsFrom: Date | null = null;
  const readings: DemoReading[] = [];
  const record = (on: Date) => {
    const indoors = indoorsFrom !== null && on >= indoorsFrom;
    const pin = pinOnly || mc > 25;
    const measured = Math.max(4, round1(mc + rng.wobble(pin ? 1.2 : 0.7)));
    readings.push({
      measuredOn: isoDay(on),
      mcPercent: measured,
      meterKind: pin ? 'pin' : 'pinless',
      location: pin ? `middle of face, ${toSixteenths(pinDepth)} in deep` : 'centre of face, pad reading',
      depthIn: pin ? pinDepth : 0.75,
      ambientTempF: round1(indoors ? 66 + rng.wobble(2) : outdoorTempF(on) + rng.wobble(5)),
      ambientRhPercent: round1(indoors ? 42 + rng.wobble(4) : 72 - (outdoorTempF(on) - 52) * 0.4 + rng.wobble(6)),
    });
  };
  const advance = (to: Date) => {
    // Step a week at a time so the seasonal EMC and the move indoors are followed.
    while (day < to) {
      const step = Math.min(7, daysBetween(day, to));
      const indoors = indoorsFrom !== null && day >= indoorsFrom;
      const emc = indoors ? INDOOR_EMC : outdoorEmc(day);
      const winterSlowdown = indoors ? 1 : 1 + 0.25 * Math.max(0, Math.cos((TWO_PI * (dayOfYear(day) - 15)) / 365));
      mc = emc + (mc - emc) * Math.exp(-step / ((indoors ? tauIndoor : tauOutdoor) * winterSlowdown));
      day = addDays(day, step);
      if (movesIndoors && !indoorsFrom && mc <= 19) indoorsFrom = addDays(day, rng.int(10, 40));
    }
  };

  record(milledOn);
  const lastReading = addDays(today, -rng.int(2, 18));
  let next = addDays(milledOn, rng.int(12, 16));
  while (next < addDays(lastReading, -14)) {
    advance(next);
    record(next);
    const age = daysBetween(milledOn, next);
    next = addDays(next, age < 540 ? rng.int(26, 35) : rng.int(45, 62));
  }
  advance(lastReading);
  record(lastReading);
  const moved = indoorsFrom as Date | null; // assigned inside advance(), which TypeScript does not follow
  return { readings, movedIndoorsOn: moved !== null && moved <= lastReading ? moved : null };
}
