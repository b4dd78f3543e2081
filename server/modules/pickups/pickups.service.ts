import type { Db, Tx } from '../../db/client';
import { AppError } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import { formatWindow, WEEKDAY_NAMES, type PickupSettings, type PickupSlotsResponse, type PickupWindowView } from '../../../shared/pickups';
import * as repo from './pickups.repo';
import { addDays, buildSlots, millDay, windowStart } from './slot-calendar';

export async function listPickupSlots(db: Db, { from, days, now = new Date() }: { from?: string; days: number; now?: Date }): Promise<PickupSlotsResponse> {
  const today = millDay(now);
  const start = from && from > today ? from : today;
  const end = addDays(start, days - 1);
  const [windows, closed, booked, yardAddress] = await Promise.all([
    repo.allWindows(db), repo.closedDaysBetween(db, start, end), repo.bookedCounts(db, start, end), repo.readYardAddress(db),
  ]);
  const slots = buildSlots({ windows, closed: new Set(closed.map((c) => c.day)), booked, from: start, days, now });
  return { slots, yardAddress, closedDays: closed };
}

/**
 * Takes one place in a pickup window for `day`, inside the checkout transaction. The window row
 * is locked first, so the count of booked orders cannot change under us.
 */
export async function claimPickupPlace(tx: Tx, { windowId, day, now = new Date() }: { windowId: number; day: string; now?: Date }) {
  const window = await repo.lockWindow(tx, windowId);
  const field = (msg: string) => new AppError(400, 'validation', msg, { pickupWindowId: [msg] });
  if (!window || !window.active) throw field('That pickup window is not offered. Please choose another.');
  if (new Date(`${day}T00:00:00Z`).getUTCDay() !== window.weekday) {
    throw field(`That window is on ${WEEKDAY_NAMES[window.weekday]}s, not on ${day}.`);
  }
  if (windowStart(day, window.startsAt) <= now) throw field('That pickup time has already passed. Please choose a later one.');
  const closed = await repo.isClosed(tx, day);
  if (closed) throw field(`The yard is closed on ${day}${closed.note ? ` (${closed.note})` : ''}. Please choose another day.`);
  const booked = await repo.countBooked(tx, windowId, day);
  if (booked >= window.capacity) {
    throw new AppError(409, 'window_full', `The ${formatWindow(window)} window on ${day} is full. Please choose another time.`);
  }
  return window;
}

export async function getPickupSettings(db: Tx) {
  const [yardAddress, windows, closedDays] = await Promise.all([repo.readYardAddress(db), repo.allWindows(db), repo.allClosedDays(db)]);
  return { yardAddress: yardAddress ?? '', windows: windows as PickupWindowView[], closedDays };
}

/** Saves the yard address, weekly windows and closed days as one change, with an audit record. */
export async function savePickupSettings(db: Db, actor: SessionUser, input: PickupSettings) {
  return db.transaction(async (tx) => {
    const before = await getPickupSettings(tx);
    const [updated] = await repo.updateYardAddress(tx, input.yardAddress);
    if (!updated) throw new AppError(409, 'no_mill_settings', 'The mill settings have not been set up yet.');
    const existing = new Set(before.windows.map((w) => w.id));
    const kept = new Set<number>();
    for (const { id, ...w } of input.windows) {
      if (id !== undefined) {
        if (!existing.has(id)) throw new AppError(400, 'validation', 'A window in the list no longer exists. Reload and try again.');
        await repo.updateWindow(tx, id, w);
        kept.add(id);
      } else {
        await repo.insertWindow(tx, w);
      }
    }
    // Windows taken off the list are deleted, unless an order already points at them: those are switched off.
    const dropped = [...existing].filter((id) => !kept.has(id));
    const deletable = await repo.unusedWindowIds(tx, dropped);
    await repo.deleteWindows(tx, deletable);
    await repo.deactivateWindows(tx, dropped.filter((id) => !deletable.includes(id)));
    await repo.replaceClosedDays(tx, input.closedDays);
    const after = await getPickupSettings(tx);
    await recordAudit(tx, { actor, action: 'pickup-settings.update', entityType: 'mill_settings', entityId: 1, before, after });
    return after;
  });
}
