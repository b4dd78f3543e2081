import { z } from 'zod';

/** How many slabs one buyer may hold at once, so a single account cannot empty the catalogue. */
export const MAX_ACTIVE_HOLDS_PER_BUYER = 8;
export const DEFAULT_HOLD_HOURS = 48;

export const HOLD_STATUSES = ['active', 'released', 'expired', 'converted'] as const;
export type HoldStatus = (typeof HOLD_STATUSES)[number];

/** Slabs of one book-matched set the yard marked (shared/matched-sets.ts), reserved together or not at all. */
export const matchedSetSchema = z.object({
  slabIds: z.array(z.number().int().positive(), { error: 'Choose the slabs to reserve' })
    .min(2, 'Choose at least two slabs of the set')
    .max(6, 'A matched set is at most 6 slabs')
    .refine((ids) => new Set(ids).size === ids.length, 'Choose each slab once'),
}).strict();
export type MatchedSetInput = z.infer<typeof matchedSetSchema>;

/** Flattening as offered for one held slab at checkout. */
export type FlatteningOffer = { feasible: boolean; priceCents: number; finishedThicknessIn: number; reason?: string };

export type HoldView = {
  id: number;
  slabId: number;
  groupId: string | null;
  status: HoldStatus;
  createdAt: string;
  expiresAt: string;
  slab: {
    code: string;
    speciesName: string;
    thicknessIn: number;
    widthIn: number;
    lengthIn: number;
    boardFeet: number;
    priceCents: number;
    weightLb: number;
    coverThumbUrl: string | null;
    flattening: FlatteningOffer;
  };
};

export type HoldsResponse = { holds: HoldView[] };
