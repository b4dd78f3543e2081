import { dryingStateLabel } from '../../../../shared/slabs';
import { formatPercent } from '../../../../shared/wood/index';

export const dryingLabel = dryingStateLabel;

/** "Air-dry (19.5 %), target 8 %": what a saved reading means for the slab. */
export const dryingSummary = (state: string, mcPercent: number, targetMcPercent: number) =>
  `${dryingStateLabel(state)} (${formatPercent(mcPercent)}), target ${formatPercent(targetMcPercent)}`;

/** Today's date as the person at the yard sees it (not UTC), for the default reading date. */
export function localToday(now = new Date()) {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
