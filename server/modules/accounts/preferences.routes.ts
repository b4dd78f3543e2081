import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireUser } from '../../lib/session';
import { AppError } from '../../lib/errors';
import { preferencesSchema, type Preferences } from '../../../shared/preferences';
import { isUnitSystem } from '../../../shared/wood/index';
import { findPreferences, savePreferences } from './preferences.repo';

const view = (row: { units: string | null }): Preferences => ({ units: isUnitSystem(row.units) ? row.units : null });

/** The signed-in person's own display choices (units). Nobody reads or sets another's. */
export function preferenceRoutes({ db }: { db: Db }) {
  const router = Router();
  router.get('/me/preferences', requireUser, async (req, res) => {
    const row = await findPreferences(db, req.user!.id);
    if (!row) throw new AppError(404, 'not_found', 'That account no longer exists.');
    res.json(view(row));
  });
  router.put('/me/preferences', requireUser, async (req, res) => {
    const input = preferencesSchema.parse(req.body);
    const row = await savePreferences(db, req.user!.id, input);
    if (!row) throw new AppError(404, 'not_found', 'That account no longer exists.');
    res.json(view(row));
  });
  return router;
}
