import { Router } from 'express';
import { millDay, millTimeZone } from '../pickups/slot-calendar';

/** The mill's clock, so every screen writes dates and times as they read at the yard. */
export function millClockRoutes() {
  const router = Router();
  router.get('/mill-clock', (_req, res) => {
    res.json({ timeZone: millTimeZone(), today: millDay(new Date()) });
  });
  return router;
}
