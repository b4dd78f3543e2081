import type { Tx } from '../../db/client';
import { AppError, notFound, validationError, zodFieldErrors } from '../../lib/errors';
import { isSold, parseSlabListQuery, PUBLIC_STATUSES, type SlabDetail, type SlabListItem, type SlabListResponse, type SlabStatus } from '../../../shared/slabs';
import { photoUrls } from '../../../shared/photos';
import { airDryReadyDate, lifting, roundBoardFeet } from '../../../shared/wood/index';
import { quoteSlab } from '../pricing/slab-quote';
import { slabPartOf, soldLineOf } from '../pricing/sold-price';
import { setOfSlab } from '../matched-sets/matched-sets.service';
import { loadPricingRules } from '../pricing/pricing.service';
import { readMillSettings } from '../pricing/pricing.repo';
import * as repo from './catalogue.repo';
import { forecastAirDry } from './drying-forecast';

const thumb = (key: string | null) => (key ? photoUrls(key).thumbUrl : null);
const display = (key: string | null) => (key ? photoUrls(key).displayUrl : null);
const round1 = (n: number) => Math.round(n * 10) / 10;

export async function listSlabs(db: Tx, rawQuery: Record<string, unknown>): Promise<SlabListResponse> {
  const parsed = parseSlabListQuery(rawQuery);
  if (!parsed.success) throw validationError(zodFieldErrors(parsed.error), 'Some filters are not valid.');
  const query = parsed.data;
  const { rows, total } = await repo.findSlabPage(db, query);
  return { items: rows.map(toListItem), total, page: query.page, pageSize: query.pageSize };
}

/** One catalogue card, the same wherever a slab is listed (catalogue, saved slabs). */
export const toListItem = (r: repo.SlabListRow): SlabListItem => ({
  id: r.id, code: r.code, species: { slug: r.speciesSlug, name: r.speciesName },
  thicknessIn: r.thicknessIn, widthIn: round1(r.widthIn), lengthIn: r.lengthIn,
  boardFeet: roundBoardFeet(r.boardFeet), priceCents: r.priceCents,
  status: r.status as SlabStatus, dryingState: r.dryingState,
  moisturePercent: r.moisturePercent === null ? null : Number(r.moisturePercent),
  coverPhotoUrl: display(r.coverKey), coverThumbUrl: thumb(r.coverKey),
  liveEdge: r.liveEdge as SlabListItem['liveEdge'], figures: r.figures, logId: r.logId, sequenceInLog: r.sequenceInLog,
});

export function parseId(raw: string): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0 || id > 2_147_483_647) throw new AppError(404, 'not_found', 'That slab was not found.');
  return id;
}

/** The full slab as a buyer sees it; staff (`includeHidden`) also see withdrawn slabs. */
export async function getSlabDetail(db: Tx, id: number, { includeHidden = false } = {}): Promise<SlabDetail> {
  const found = await repo.findSlabWithLog(db, id);
  if (!found || (!includeHidden && !PUBLIC_STATUSES.includes(found.slab.status as SlabStatus))) throw notFound('That slab');
  const { slab, species, log } = found;
  const sold = isSold(slab.status);
  const [photos, readings, sequence, rules, settings, soldLine, matchedSet] = await Promise.all([
    repo.findPhotos(db, id), repo.findReadings(db, id), repo.findLogSequence(db, log.id),
    loadPricingRules(db), readMillSettings(db), sold ? soldLineOf(db, id) : null, setOfSlab(db, id),
  ]);
  const visible = (status: string) => includeHidden || PUBLIC_STATUSES.includes(status as SlabStatus);
  const latest = readings.at(-1) ?? null;
  const quote = quoteSlab(slab, species, latest?.mcPercent ?? null, rules);
  // A sold slab shows what it sold at (its order line), never a price worked out from today's rules.
  const price = !sold
    ? { priceCents: slab.priceCents, priceBreakdown: quote.breakdown }
    : soldLine
      ? { priceCents: soldLine.slabCents, priceBreakdown: slabPartOf(soldLine.priceBreakdown, soldLine.slabCents) }
      : { priceCents: null, priceBreakdown: null };
  return {
    id: slab.id, code: slab.code,
    species: { slug: species.slug, name: species.name, botanicalName: species.botanicalName, ratePerBoardFootCents: species.ratePerBoardFootCents },
    thicknessIn: slab.thicknessIn, widthIn: round1(slab.widthIn), widthsIn: slab.widthsIn, lengthIn: slab.lengthIn,
    boardFeet: roundBoardFeet(slab.boardFeet), priceCents: price.priceCents,
    status: slab.status as SlabStatus, dryingState: slab.dryingState,
    moisturePercent: latest?.mcPercent ?? null,
    coverPhotoUrl: display(photos[0]?.fileKey ?? null), coverThumbUrl: thumb(photos[0]?.fileKey ?? null),
    liveEdge: slab.liveEdge as SlabDetail['liveEdge'], figures: slab.figures, figureNotes: slab.figureNotes,
    defects: slab.defects, description: slab.description, yardStack: slab.yardStack, yardPosition: slab.yardPosition,
    priceOverrideReason: slab.priceOverrideReason,
    createdAt: slab.createdAt.toISOString(), listedAt: slab.listedAt?.toISOString() ?? null,
    logId: log.id, sequenceInLog: slab.sequenceInLog,
    log: { id: log.id, code: log.code, originNote: log.originNote, felledOn: log.felledOn, milledOn: log.milledOn, sawingMethod: log.sawingMethod, lengthIn: log.lengthIn },
    photos: photos.map((p) => ({ id: p.id, ...photoUrls(p.fileKey), width: p.width, height: p.height, isCover: p.isCover, isIllustration: p.isIllustration, altText: p.altText, position: p.position, view: p.view })),
    moistureReadings: readings.map((r) => ({ id: r.id, measuredOn: r.measuredOn, mcPercent: r.mcPercent, meterKind: r.meterKind, location: r.location, depthIn: r.depthIn, ambientTempF: r.ambientTempF, ambientRhPercent: r.ambientRhPercent })),
    neighbours: sequence
      .filter((n) => includeHidden || PUBLIC_STATUSES.includes(n.status as SlabStatus))
      .map((n) => ({ ...n, status: n.status as SlabStatus, coverThumbUrl: thumb(n.coverKey), isThisSlab: n.id === slab.id, coverKey: undefined })),
    priceBreakdown: price.priceBreakdown,
    matchedSet: matchedSet && { ...matchedSet, slabs: matchedSet.slabs.filter((m) => visible(m.status)) },
    weightLb: Math.round(quote.weightLb),
    weightAtMcPercent: quote.mcPercent,
    weightBasis: quote.weighing.basis,
    weightNote: quote.weighing.note,
    lifting: lifting({ weightLb: quote.weightLb }),
    dryingForecast: forecastAirDry({ readings, thicknessIn: slab.thicknessIn, milledOn: log.milledOn }),
    airDryReadyOn: log.milledOn ? airDryReadyDate({ milledOn: log.milledOn, thicknessIn: slab.thicknessIn }).toISOString().slice(0, 10) : null,
    targetMcPercent: settings?.targetMcPercent ?? 8,
    flatteningPriceCents: quote.flattening.priceCents,
  };
}
