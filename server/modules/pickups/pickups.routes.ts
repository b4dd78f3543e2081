import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole, requireUser } from '../../lib/session';
import { pickupSettingsSchema, pickupSlotsQuerySchema } from '../../../shared/pickups';
import { getPickupSettings, listPickupSlots, savePickupSettings } from './pickups.service';

export function pickupRoutes({ db }: { db: Db }) {
  const router = Router();
  /** Bookable pickup times with places left; signed-in buyers see them at checkout. */
  router.get('/pickup-slots', requireUser, async (req, res) => {
    const { from, days } = pickupSlotsQuerySchema.parse(req.query);
    res.json(await listPickupSlots(db, { from, days }));
  });
  router.get('/pickup-settings', requireRole('admin'), async (_req, res) => {
    res.json(await getPickupSettings(db));
  });
  router.put('/pickup-settings', requireRole('admin'), async (req, res) => {
    res.json(await savePickupSettings(db, req.user!, pickupSettingsSchema.parse(req.body)));
  });
  return router;
}
