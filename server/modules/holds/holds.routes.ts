import { Router } from 'express';
import type { Db } from '../../db/client';
import type { Mailer } from '../../lib/mail';
import { flushOutbox } from '../../lib/outbox';
import { AppError } from '../../lib/errors';
import { requireUser } from '../../lib/session';
import { matchedSetSchema } from '../../../shared/holds';
import { listHolds, placeHold, placeMatchedSet, releaseHold } from './holds.service';
import { getLogger } from '../../lib/logger';

const parseId = (raw: string, what: string) => {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0 || id > 2_147_483_647) throw new AppError(404, 'not_found', `${what} was not found.`);
  return id;
};

const view = (h: { id: number; slabId: number; groupId: string | null; status: string; createdAt: Date; expiresAt: Date }) => ({
  id: h.id, slabId: h.slabId, groupId: h.groupId, status: h.status, createdAt: h.createdAt.toISOString(), expiresAt: h.expiresAt.toISOString(),
});

/** Holds (reservations): any signed-in account may hold a listed slab for a while before paying. */
export function holdRoutes({ db, holdHours, mailer, publicUrl, trustedOrigins }: { db: Db; holdHours?: number; mailer: Mailer; publicUrl?: string; trustedOrigins?: string[] }) {
  const router = Router();
  const base = publicUrl ?? trustedOrigins?.[0] ?? '';
  // The background job would send them within seconds anyway; sending now saves the buyer the wait.
  const sendMail = () => flushOutbox(db, mailer).catch((err) => getLogger().warn({ part: 'holds', reason: (err as Error).message }, 'sending queued e-mail failed'));
  router.post('/slabs/:id/hold', requireUser, async (req, res) => {
    const hold = await placeHold(db, req.user!, parseId(String(req.params.id), 'That slab'), { holdHours, publicUrl: base });
    await sendMail();
    res.status(201).json({ hold: view(hold) });
  });
  router.post('/holds/matched-set', requireUser, async (req, res) => {
    const { slabIds } = matchedSetSchema.parse(req.body);
    const holds = await placeMatchedSet(db, req.user!, slabIds, { holdHours, publicUrl: base });
    await sendMail();
    res.status(201).json({ holds: holds.map(view) });
  });
  router.get('/holds', requireUser, async (req, res) => {
    res.json({ holds: await listHolds(db, req.user!.id) });
  });
  router.delete('/holds/:id', requireUser, async (req, res) => {
    await releaseHold(db, req.user!, parseId(String(req.params.id), 'That hold'), { publicUrl: base });
    await sendMail();
    res.status(204).end();
  });
  return router;
}
