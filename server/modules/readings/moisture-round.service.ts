import type { Db } from '../../db/client';
import { validationError } from '../../lib/errors';
import { byYardPosition, isRoundDue, ROUND_STATUSES, type MoistureRound, type YardStack } from '../../../shared/readings';
import { millDay } from '../pickups/slot-calendar';
import * as repo from './readings.repo';

/** Every stack with slabs still drying or for sale, and whether its monthly round is due. */
export async function listStacks(db: Db, now = new Date()): Promise<YardStack[]> {
  const rows = await repo.slabsInStacks(db, ROUND_STATUSES);
  const today = millDay(now);
  const byStack = new Map<string, typeof rows>();
  for (const r of rows) byStack.set(r.yardStack, [...(byStack.get(r.yardStack) ?? []), r]);
  return [...byStack.entries()].map(([stack, slabs]) => {
    const dates = slabs.map((s) => s.lastReadingOn).filter((d): d is string => d !== null).sort();
    const oldestReadingOn = dates[0] ?? null;
    return { stack, slabCount: slabs.length, oldestReadingOn, due: isRoundDue(oldestReadingOn, dates.length < slabs.length, today) };
  }).sort((a, b) => a.stack.localeCompare(b.stack, 'en', { numeric: true }));
}

/** The slabs of one stack in the order the crew walks it, to pre-fill the batch readings form. */
export async function roundForStack(db: Db, rawStack: unknown): Promise<MoistureRound> {
  const stack = typeof rawStack === 'string' ? rawStack.trim() : '';
  if (!stack || stack.length > 40) throw validationError({ stack: ['Choose a stack'] }, 'Choose a stack.');
  const rows = await repo.slabsInStacks(db, ROUND_STATUSES, stack);
  return {
    stack,
    items: rows.sort(byYardPosition).map((r) => ({
      id: r.id, code: r.code, speciesName: r.speciesName, yardPosition: r.yardPosition,
      lastMcPercent: r.lastMcPercent === null ? null : Number(r.lastMcPercent), lastReadingOn: r.lastReadingOn,
    })),
  };
}
