/**
 * The logs in the demo yard of Varrow Creek Slab Mill. Every place, farm and
 * person named here is invented. Dates are given as months before "today" so
 * the yard always looks lived-in, whatever day the demo is started.
 */
import type { SAWING_METHODS } from '../../shared/slabs';

export type FigureRule = {
  slug: string;
  /** Chance that a slab from this log shows the figure. */
  chance: number;
  /** Only slabs within this many places of the log's middle can show it (crotch runs through the centre). */
  nearCentre?: number;
  note: string;
};

export type DemoLogPlan = {
  speciesSlug: string;
  originNote: string;
  notes: string;
  milledMonthsAgo: number;
  /** Days the log lay in the yard between felling and the bandmill. */
  waitedDays: number;
  lengthIn: number;
  buttDiameterIn: number;
  topDiameterIn: number;
  sawingMethod: (typeof SAWING_METHODS)[number];
  slabCount: number;
  thicknessIn: number;
  figures: FigureRule[];
  stack: string;
  /** Sequences taken off sale, with the reason recorded as a defect. */
  withdrawn?: { sequence: number; kind: string; note: string }[];
};

const crotchNote = 'Feathered crotch figure runs through the top third, where the trunk forked.';
const burlNote = 'Clusters of burl eyes across the face, densest along one edge.';
const curlNote = 'Curl shows as ripples across the width when the face is turned to the light.';
const spaltNote = 'Dark zone lines and pale bleached patches from spalting; the wood is sound and hard.';
const flakeNote = 'Quartersawn face shows broad ray fleck across most of the width.';

export const DEMO_LOG_PLANS: DemoLogPlan[] = [
  { speciesSlug: 'black-walnut', originNote: 'Storm-felled in the orchard at the Ambrell farm on Quarry Lane.',
    notes: 'Forked about seven feet up; sawn through the fork for crotch slabs.', milledMonthsAgo: 44, waitedDays: 40,
    lengthIn: 108, buttDiameterIn: 30, topDiameterIn: 25, sawingMethod: 'live-edge-slabbing', slabCount: 6, thicknessIn: 2.25,
    figures: [{ slug: 'crotch', chance: 0.9, nearCentre: 1, note: crotchNote }], stack: 'Stack A' },
  { speciesSlug: 'black-walnut', originNote: 'Yard tree at the old Quennadale schoolhouse, taken down before the roof was redone.',
    notes: 'Metal detector found one fence staple near the butt; cut out before sawing.', milledMonthsAgo: 8, waitedDays: 120,
    lengthIn: 96, buttDiameterIn: 26, topDiameterIn: 22, sawingMethod: 'through-and-through', slabCount: 5, thicknessIn: 2.5,
    figures: [{ slug: 'curl', chance: 0.25, note: curlNote }], stack: 'Stack K' },
  { speciesSlug: 'black-cherry', originNote: "Fencerow tree along Tamsett's hayfield, leaning over the lane after an ice storm.",
    notes: '', milledMonthsAgo: 30, waitedDays: 25,
    lengthIn: 102, buttDiameterIn: 22, topDiameterIn: 18, sawingMethod: 'live-edge-slabbing', slabCount: 5, thicknessIn: 2,
    figures: [{ slug: 'curl', chance: 0.35, note: curlNote }], stack: 'Stack C',
    withdrawn: [{ sequence: 5, kind: 'check', note: 'Through check along the pith line; held back to be cut into shorter shelf pieces.' }] },
  { speciesSlug: 'white-oak', originNote: 'Windthrow on Corrow Hill, found across the logging track after the autumn gales.',
    notes: 'Quartered on the mill and sawn radially for ray fleck.', milledMonthsAgo: 38, waitedDays: 60,
    lengthIn: 120, buttDiameterIn: 32, topDiameterIn: 27, sawingMethod: 'quartersawn', slabCount: 6, thicknessIn: 2,
    figures: [{ slug: 'ray-fleck', chance: 0.9, note: flakeNote }], stack: 'Stack B' },
  { speciesSlug: 'white-oak', originNote: 'Boundary oak at the Ketterlin woodlot, dead at the crown and taken down for safety.',
    notes: 'Sawn thick for table tops and benches.', milledMonthsAgo: 47, waitedDays: 30,
    lengthIn: 132, buttDiameterIn: 36, topDiameterIn: 30, sawingMethod: 'live-edge-slabbing', slabCount: 4, thicknessIn: 3.25,
    figures: [], stack: 'Stack A' },
  { speciesSlug: 'northern-red-oak', originNote: 'Removed when the Varrow Valley road crew widened the bend at Gorse Corner.',
    notes: '', milledMonthsAgo: 20, waitedDays: 90,
    lengthIn: 114, buttDiameterIn: 28, topDiameterIn: 23, sawingMethod: 'through-and-through', slabCount: 6, thicknessIn: 1.75,
    figures: [], stack: 'Stack F' },
  { speciesSlug: 'sugar-maple', originNote: 'Thinned from the Halloran sugarbush on the north ridge; the tree had stopped giving sap.',
    notes: 'Taphole stains were cut away in the first slab.', milledMonthsAgo: 26, waitedDays: 45,
    lengthIn: 96, buttDiameterIn: 24, topDiameterIn: 20, sawingMethod: 'live-edge-slabbing', slabCount: 5, thicknessIn: 2,
    figures: [{ slug: 'curl', chance: 0.5, note: curlNote }], stack: 'Stack D' },
  { speciesSlug: 'sugar-maple', originNote: 'Lightning-struck maple at the Venn crossroads, left standing a year before it was felled.',
    notes: 'A large burl on the butt; some spalting where the lightning scar let water in.', milledMonthsAgo: 34, waitedDays: 200,
    lengthIn: 84, buttDiameterIn: 30, topDiameterIn: 26, sawingMethod: 'live-edge-slabbing', slabCount: 5, thicknessIn: 2.5,
    figures: [{ slug: 'burl', chance: 0.6, note: burlNote }, { slug: 'spalted', chance: 0.3, note: spaltNote }], stack: 'Stack D' },
  { speciesSlug: 'red-maple', originNote: 'Storm-felled on the Pellow creek bank and left lying for two summers.',
    notes: 'Spalted through; sawn once the rot stopped at the zone lines.', milledMonthsAgo: 28, waitedDays: 420,
    lengthIn: 90, buttDiameterIn: 22, topDiameterIn: 19, sawingMethod: 'live-edge-slabbing', slabCount: 5, thicknessIn: 2,
    figures: [{ slug: 'spalted', chance: 0.75, note: spaltNote }], stack: 'Stack E' },
  { speciesSlug: 'sweetgum', originNote: 'Cleared from behind the Quennadale grange hall to make room for the new parking area.',
    notes: 'Interlocked grain; stickered close and weighted to keep it flat.', milledMonthsAgo: 15, waitedDays: 20,
    lengthIn: 100, buttDiameterIn: 24, topDiameterIn: 20, sawingMethod: 'through-and-through', slabCount: 5, thicknessIn: 2,
    figures: [{ slug: 'curl', chance: 0.2, note: curlNote }], stack: 'Stack G',
    withdrawn: [{ sequence: 1, kind: 'void', note: 'Soft void at the butt end where the heart had begun to rot; held back to be cut down into shorter pieces.' }] },
  { speciesSlug: 'american-sycamore', originNote: 'Leaning creek-side tree at Millrace Bend, taken down before it fell into the water.',
    notes: 'Quartersawn for the lacy ray figure sycamore is known for.', milledMonthsAgo: 23, waitedDays: 35,
    lengthIn: 120, buttDiameterIn: 34, topDiameterIn: 28, sawingMethod: 'quartersawn', slabCount: 5, thicknessIn: 1.75,
    figures: [{ slug: 'ray-fleck', chance: 0.85, note: 'Quartersawn face shows fine, lacy ray fleck.' }], stack: 'Stack H' },
  { speciesSlug: 'douglas-fir', originNote: 'Blowdown in the Ketterlin woodlot, one of three that went over in the same squall.',
    notes: 'Sawn thick for benches and mantels.', milledMonthsAgo: 40, waitedDays: 50,
    lengthIn: 144, buttDiameterIn: 30, topDiameterIn: 26, sawingMethod: 'live-edge-slabbing', slabCount: 5, thicknessIn: 3,
    figures: [], stack: 'Stack J' },
  { speciesSlug: 'eastern-white-pine', originNote: 'Shade pine at the Brennock homestead, cracked at the top by heavy snow.',
    notes: 'Sawn in late winter and stickered at once to keep the sapwood bright.', milledMonthsAgo: 12, waitedDays: 15,
    lengthIn: 120, buttDiameterIn: 28, topDiameterIn: 24, sawingMethod: 'through-and-through', slabCount: 6, thicknessIn: 2,
    figures: [], stack: 'Stack L' },
  { speciesSlug: 'black-cherry', originNote: 'Taken from the hedge between the two Orlow pastures when the fence was rebuilt.',
    notes: '', milledMonthsAgo: 3, waitedDays: 30,
    lengthIn: 90, buttDiameterIn: 20, topDiameterIn: 17, sawingMethod: 'live-edge-slabbing', slabCount: 4, thicknessIn: 2,
    figures: [{ slug: 'curl', chance: 0.3, note: curlNote }], stack: 'Stack M' },
];
