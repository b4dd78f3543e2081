import { z } from 'zod';

/** A book-matched set is two slabs (a pair) or a few more sawn in a row; beyond six it is a log, not a set. */
export const MATCHED_SET_SIZE = { min: 2, max: 6 } as const;

const slabIds = z.array(z.number({ error: 'Choose the slabs' }).int().positive(), { error: 'Choose the slabs' })
  .min(MATCHED_SET_SIZE.min, `A matched set is at least ${MATCHED_SET_SIZE.min} slabs`)
  .max(MATCHED_SET_SIZE.max, `A matched set is at most ${MATCHED_SET_SIZE.max} slabs`)
  .refine((ids) => new Set(ids).size === ids.length, 'Choose each slab once');

/** The yard marks slabs of one log as a book-matched set. */
export const markMatchedSetSchema = z.object({ slabIds }).strict();
export type MarkMatchedSetInput = z.infer<typeof markMatchedSetSchema>;

export type MatchedSetMember = { id: number; code: string; sequenceInLog: number; status: string };
export type MatchedSetView = { id: number; logId: number; slabs: MatchedSetMember[] };

/** The log's sets, and the neighbouring pairs not yet in a set (the yard's default suggestion). */
export type LogMatchedSets = { sets: MatchedSetView[]; suggestions: MatchedSetMember[][] };

/** "a matched pair" / "a matched set of 3": the words for a set's size. */
export const setWords = (size: number) => (size === 2 ? 'matched pair' : `matched set of ${size}`);
