import type { Db } from '../../db/client';
import { queueEmail } from '../../lib/outbox';
import { pickupReminderEmail } from '../../lib/email-templates';
import { addDays, millDay } from '../pickups/slot-calendar';
import { orderEmailInput } from './order-view';
import * as repo from './checkout.repo';

/** Queues the day-before reminder for every paid order collected tomorrow, once per order. */
export async function queuePickupReminders(db: Db, { now = new Date(), publicUrl = '' } = {}) {
  const tomorrow = addDays(millDay(now), 1);
  return db.transaction(async (tx) => {
    const due = await repo.ordersToRemind(tx, tomorrow);
    for (const { id } of due) {
      const mail = await orderEmailInput(tx, id, publicUrl);
      await queueEmail(tx, { to: mail.to, kind: 'pickup-reminder', content: pickupReminderEmail(mail.input) });
      await repo.updateOrder(tx, id, { reminderSentAt: now });
    }
    return { queued: due.length };
  });
}
