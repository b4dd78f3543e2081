/**
 * Deterministic demo data for Varrow Creek Slab Mill (an invented mill in the
 * invented Varrow Valley): logs, slabs, moisture histories and the mill's own
 * settings. Pure: the same `today` always gives the same data.
 */
import { averageWidthIn, dryingStateFor, getSpecies, type DryingState } from '../../shared/wood/index';
import { addDays, daysBetween, isoDay, startOfUtcDay } from './dates';
import { DEMO_LOG_PLANS, type DemoLogPlan } from './demo-logs';
import { describeSlab } from './demo-descriptions';
import { moistureHistory, type DemoReading } from './demo-moisture';
import { cutSlabs, type CutSlab } from './demo-slabs';
import { DEMO_MILL_SETTINGS, demoClosedDays } from './demo-mill';
import { createRng, seedFrom } from './prng';

export {
  DEMO_ACCOUNTS, DEMO_FIGURE_KINDS, DEMO_MILL_SETTINGS, DEMO_PICKUP_WINDOWS, type DemoAccount,
} from './demo-mill';

export type DemoLog = {
  code: string; speciesSlug: string; originNote: string; notes: string; felledOn: string; milledOn: string;
  lengthIn: number; buttDiameterIn: number; topDiameterIn: number; sawingMethod: string; createdAt: Date;
};

export type DemoSlab = CutSlab & {
  code: string; logCode: string; speciesSlug: string; widthIn: number; dryingState: DryingState;
  status: 'drying' | 'ready' | 'listed' | 'withdrawn'; yardStack: string; yardPosition: string;
  description: string; createdAt: Date; listedAt: Date | null; readings: DemoReading[]; illustrationSeed: number;
  /** The slab sawn just before this one, when the demo yard marks the two as a book-matched pair. */
  bookMatchedWith: string | null;
};

export type DemoData = {
  logs: DemoLog[];
  slabs: DemoSlab[];
  closedDays: { day: string; note: string }[];
};

const SEED = 0x5eed_2417;
const ordinal = (n: number) => `${n}${n === 1 ? 'st' : n === 2 ? 'nd' : n === 3 ? 'rd' : 'th'}`;

function datedPlans(today: Date) {
  const rng = createRng(SEED);
  const dated = DEMO_LOG_PLANS.map((plan) => {
    const milled = addDays(today, -Math.round(plan.milledMonthsAgo * 30.44) + rng.int(-10, 10));
    return { plan, milled, felled: addDays(milled, -plan.waitedDays) };
  }).sort((a, b) => a.milled.getTime() - b.milled.getTime());
  const perYear = new Map<number, number>();
  return dated.map((d) => {
    const year = d.milled.getUTCFullYear();
    const n = (perYear.get(year) ?? 0) + 1;
    perYear.set(year, n);
    return { ...d, code: `L-${year}-${String(n).padStart(2, '0')}` };
  });
}

function statusFor(plan: DemoLogPlan, slab: CutSlab, state: DryingState, mc: number, movedIndoorsOn: Date | null, today: Date) {
  if (plan.withdrawn?.some((w) => w.sequence === slab.sequenceInLog)) return 'withdrawn' as const;
  if (state === 'green' || (state === 'air-drying' && mc > 24)) return 'drying' as const;
  // Moved into the shed lately: dry, but not yet photographed and put on sale.
  if (movedIndoorsOn && daysBetween(movedIndoorsOn, today) < 75) return 'ready' as const;
  return 'listed' as const;
}

export function buildDemoData(now: Date = new Date()): DemoData {
  const today = startOfUtcDay(now);
  const logs: DemoLog[] = [];
  const slabs: DemoSlab[] = [];
  datedPlans(today).forEach(({ plan, milled, felled, code }, logIndex) => {
    getSpecies(plan.speciesSlug); // fail early on a misspelt slug
    logs.push({
      code, speciesSlug: plan.speciesSlug, originNote: plan.originNote, notes: plan.notes,
      felledOn: isoDay(felled), milledOn: isoDay(milled), lengthIn: plan.lengthIn,
      buttDiameterIn: plan.buttDiameterIn, topDiameterIn: plan.topDiameterIn, sawingMethod: plan.sawingMethod,
      createdAt: new Date(milled.getTime() + 16 * 3_600_000),
    });
    const rng = createRng(seedFrom(code) ^ SEED);
    const cut = cutSlabs(plan, rng);
    cut.forEach((slab, i) => {
      const slabCode = `${code}-${String(slab.sequenceInLog).padStart(2, '0')}`;
      const movesIndoors = rng.chance(0.5);
      const { readings, movedIndoorsOn } = moistureHistory({
        rng, speciesSlug: plan.speciesSlug, thicknessIn: slab.thicknessIn, milledOn: milled, today, movesIndoors,
      });
      const latest = readings[readings.length - 1];
      const dryingState = dryingStateFor({ mcPercent: latest.mcPercent, targetMcPercent: DEMO_MILL_SETTINGS.targetMcPercent });
      const status = statusFor(plan, slab, dryingState, latest.mcPercent, movedIndoorsOn, today);
      const firstDryish = readings.find((r) => r.mcPercent <= 24) ?? latest;
      // The demo yard marks a pair when two slabs sawn in a row show the same figure, each slab in one pair at most.
      const prev = cut[i - 1];
      const prevTaken = i >= 2 && slabs[slabs.length - 1]?.bookMatchedWith !== null;
      const bookMatchedWith = prev && !prevTaken && prev.figures.length > 0 && prev.figures.join() === slab.figures.join()
        ? `${code}-${String(prev.sequenceInLog).padStart(2, '0')}` : null;
      slabs.push({
        ...slab, code: slabCode, logCode: code, speciesSlug: plan.speciesSlug,
        widthIn: averageWidthIn(slab.widthsIn), dryingState, status,
        yardStack: movedIndoorsOn ? 'Drying shed' : plan.stack,
        yardPosition: movedIndoorsOn
          ? `rack ${1 + (logIndex % 4)}, shelf ${slab.sequenceInLog}`
          : `row ${1 + (logIndex % 3)}, ${ordinal(slab.sequenceInLog)} from top`,
        description: describeSlab(slab, plan.speciesSlug),
        bookMatchedWith,
        createdAt: new Date(milled.getTime() + (17 * 60 + slab.sequenceInLog * 7) * 60_000),
        listedAt: status === 'listed'
          ? new Date(Math.min(addDays(new Date(`${firstDryish.measuredOn}T00:00:00Z`), 3).getTime(), today.getTime()) + 10 * 3_600_000)
          : null,
        readings,
        illustrationSeed: seedFrom(slabCode),
      });
    });
  });
  return { logs, slabs, closedDays: demoClosedDays(today) };
}
