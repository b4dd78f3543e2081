import { formatCents } from '../../../shared/wood/index';
import type { YardSlabRow } from '../../../shared/slab-input';

/**
 * One CSV field (RFC 4180): quoted when it holds a comma, quote or line break, quotes doubled.
 * Text starting with = + - @ is prefixed with ' so a spreadsheet does not run it as a formula.
 */
export function csvField(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return String(value);
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

const COLUMNS: [string, (r: YardSlabRow) => string | number | null][] = [
  ['Code', (r) => r.code], ['Species', (r) => r.species.name], ['Log', (r) => r.logCode], ['Sequence', (r) => r.sequenceInLog],
  ['Status', (r) => r.status], ['Drying state', (r) => r.dryingState], ['Thickness (in)', (r) => r.thicknessIn],
  ['Average width (in)', (r) => r.widthIn], ['Widths (in)', (r) => r.widthsIn.join(' ')], ['Length (in)', (r) => r.lengthIn],
  ['Board feet', (r) => r.boardFeet], ['Price', (r) => formatCents(r.priceCents)], ['Price set by hand', (r) => (r.priceOverrideCents === null ? '' : 'yes')],
  ['Stack', (r) => r.yardStack], ['Position', (r) => r.yardPosition], ['Live edge', (r) => r.liveEdge], ['Figures', (r) => r.figures.join(' ')],
  ['Moisture %', (r) => r.moisturePercent], ['Last reading', (r) => r.lastReadingOn], ['Photos', (r) => r.photoCount], ['Listed at', (r) => r.listedAt],
  ['Air-dry expected', (r) => r.airDry?.expectedOn ?? ''], ['Air-dry earliest', (r) => r.airDry?.earliestOn ?? ''],
  ['Air-dry latest', (r) => r.airDry?.latestOn ?? ''], ['Air-dry forecast basis', (r) => r.airDry?.basis ?? ''],
];

export function yardSlabsCsv(rows: YardSlabRow[]): string {
  const lines = [COLUMNS.map(([h]) => csvField(h)).join(',')];
  for (const r of rows) lines.push(COLUMNS.map(([, get]) => csvField(get(r))).join(','));
  return `${lines.join('\r\n')}\r\n`;
}
