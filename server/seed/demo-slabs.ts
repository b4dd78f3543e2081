/**
 * Cuts the demo slabs out of a log: widths at measuring stations follow the
 * log's taper and the slab's offset from the pith, live edges wander, and a
 * few slabs carry figure and defects.
 */
import type { DemoLogPlan } from './demo-logs';
import { toEighths, type Rng } from './prng';

export type LiveEdge = 'none' | 'one' | 'both';
export type DemoDefect = { kind: 'check' | 'bark-inclusion' | 'void' | 'insect-holes'; note: string };

export type CutSlab = {
  sequenceInLog: number;
  thicknessIn: number;
  widthsIn: number[];
  lengthIn: number;
  liveEdge: LiveEdge;
  figures: string[];
  figureNotes: string;
  defects: DemoDefect[];
};

const KERF_IN = 0.125;
const BARK_IN = 0.5;

const DEFECT_NOTES: DemoDefect[] = [
  { kind: 'check', note: 'End check about 3 in long at the butt end, stopped by the end sealer.' },
  { kind: 'check', note: 'Short surface checks near the pith that close up once flattened.' },
  { kind: 'bark-inclusion', note: 'Bark inclusion along one edge, about 5 in long.' },
  { kind: 'void', note: 'Small void about 1 in across; fill it with epoxy or let in a butterfly key.' },
  { kind: 'insect-holes', note: 'A few pinholes in the sapwood from ambrosia beetles; nothing active.' },
];

function stationCount(lengthIn: number) {
  if (lengthIn < 90) return 3;
  if (lengthIn < 120) return 4;
  return 5;
}

/** Width of a through-sawn face at distance `x` from the pith in a log of radius `r` (bark removed). */
const chord = (r: number, x: number) => 2 * Math.sqrt(Math.max(r * r - x * x, 0));

export function cutSlabs(plan: DemoLogPlan, rng: Rng): CutSlab[] {
  const n = plan.slabCount;
  const stations = stationCount(plan.lengthIn);
  const quartered = plan.sawingMethod === 'quartersawn';
  const pitch = plan.thicknessIn + KERF_IN;
  const slabs: CutSlab[] = [];
  for (let seq = 1; seq <= n; seq++) {
    const thicknessIn = plan.thicknessIn + (rng.chance(0.2) ? 0.125 : 0);
    const offset = (seq - (n + 1) / 2) * pitch;
    const near = Math.abs(offset) - (Math.abs(offset) > 0.01 ? plan.thicknessIn / 2 : 0);
    const far = Math.abs(offset) + plan.thicknessIn / 2;
    let liveEdge: LiveEdge = quartered ? (rng.chance(0.55) ? 'one' : 'none') : rng.chance(0.12) ? 'one' : 'both';
    if (plan.sawingMethod === 'through-and-through' && rng.chance(0.1)) liveEdge = 'none';
    const widthsIn: number[] = [];
    for (let s = 0; s < stations; s++) {
      const along = s / (stations - 1);
      const r = (plan.buttDiameterIn + (plan.topDiameterIn - plan.buttDiameterIn) * along) / 2 - BARK_IN;
      let w: number;
      if (quartered) w = r * 0.92 - Math.abs(offset) * 0.25 + rng.wobble(0.3);
      else w = (chord(r, near) + chord(r, far)) / 2 + (liveEdge === 'none' ? 0 : rng.wobble(0.9));
      if (liveEdge === 'one') w -= rng.between(0.6, 1.4);
      widthsIn.push(w);
    }
    if (liveEdge === 'none') {
      // Edged both sides: ripped parallel just inside the narrowest station.
      const ripped = Math.min(...widthsIn) - rng.between(0.75, 1.5);
      widthsIn.splice(0, widthsIn.length, ...widthsIn.map(() => ripped + rng.wobble(0.06)));
    }
    const figures: string[] = [];
    const notes: string[] = [];
    for (const rule of plan.figures) {
      const centreDistance = Math.abs(seq - (n + 1) / 2);
      if (rule.nearCentre !== undefined && centreDistance > rule.nearCentre) continue;
      if (rng.chance(rule.chance)) {
        figures.push(rule.slug);
        notes.push(rule.note);
      }
    }
    const defects: DemoDefect[] = [];
    const defectCount = rng.chance(0.55) ? 0 : rng.chance(0.75) ? 1 : 2;
    while (defects.length < defectCount) {
      const d = rng.pick(DEFECT_NOTES);
      if (!defects.some((x) => x.kind === d.kind)) defects.push({ ...d });
    }
    const withdrawn = plan.withdrawn?.find((w) => w.sequence === seq);
    if (withdrawn) defects.push({ kind: withdrawn.kind as DemoDefect['kind'], note: withdrawn.note });
    slabs.push({
      sequenceInLog: seq,
      thicknessIn,
      widthsIn: widthsIn.map((w) => toEighths(Math.max(w, 6))),
      lengthIn: toEighths(plan.lengthIn - rng.between(0.5, 3)),
      liveEdge,
      figures,
      figureNotes: notes.join(' '),
      defects,
    });
  }
  return slabs;
}
