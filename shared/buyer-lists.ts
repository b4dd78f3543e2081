import type { SlabListItem } from './slabs';

/** Side by side, a phone screen still reads four slabs; a fifth is refused with this text. */
export const MAX_COMPARE = 4;
export const COMPARE_FULL_MESSAGE = `You can compare up to ${MAX_COMPARE} slabs at once. Take one off the list first.`;

/** Saved slabs per account: plenty for a project, and a bound on what one account can store. */
export const MAX_SAVED_SLABS = 200;

export type SavedSlab = SlabListItem & { savedAt: string };
export type SavedSlabsResponse = { items: SavedSlab[] };

/** What the signed-in buyer has marked on slabs: saved, held slabs they asked to hear about, and their own holds. */
export type MySlabMarks = { savedSlabIds: number[]; watchedSlabIds: number[]; heldSlabIds: number[] };

/** Parses "?ids=3,7,12" for the compare page and API: whole positive ids, no repeats, at most four. */
export function parseCompareIds(raw: unknown): { ok: true; ids: number[] } | { ok: false; message: string } {
  const text = typeof raw === 'string' ? raw : '';
  const parts = text.split(',').map((p) => p.trim()).filter(Boolean);
  if (!parts.length) return { ok: false, message: 'Choose at least one slab to compare.' };
  const ids = parts.map(Number);
  if (ids.some((n) => !Number.isInteger(n) || n <= 0 || n > 2_147_483_647)) return { ok: false, message: 'Slab ids must be whole numbers.' };
  const unique = [...new Set(ids)];
  if (unique.length > MAX_COMPARE) return { ok: false, message: COMPARE_FULL_MESSAGE };
  return { ok: true, ids: unique };
}
