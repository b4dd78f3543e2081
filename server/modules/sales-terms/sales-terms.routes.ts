import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '../../db/client';
import { requireRole, requireUser } from '../../lib/session';
import { resaleCertificateSchema, salesTermsSchema } from '../../../shared/sales-terms';
import { parseRouteId } from '../office/route-id';
import * as service from './sales-terms.service';

const reviewSchema = z.object({ decision: z.enum(['approved', 'refused'], { error: 'Choose approve or refuse' }) }).strict();

export function salesTermsRoutes({ db }: { db: Db }) {
  const router = Router();
  const admin = requireRole('admin');
  // Public: the policy and contact details, also shown at checkout.
  router.get('/sales-terms', async (_req, res) => { res.json(await service.getPublicSalesTerms(db)); });
  router.get('/office/sales-terms', admin, async (_req, res) => { res.json(await service.getSalesTerms(db)); });
  router.put('/office/sales-terms', admin, async (req, res) => {
    res.json(await service.saveSalesTerms(db, req.user!, salesTermsSchema.parse(req.body)));
  });
  router.get('/account/resale-certificate', requireUser, async (req, res) => {
    res.json({ certificate: await service.myCertificate(db, req.user!.id) });
  });
  router.put('/account/resale-certificate', requireUser, async (req, res) => {
    const { number } = resaleCertificateSchema.parse(req.body);
    res.json({ certificate: await service.submitMyCertificate(db, req.user!, number) });
  });
  router.get('/office/resale-certificates', admin, async (_req, res) => { res.json({ items: await service.listCertificates(db) }); });
  router.post('/office/resale-certificates/:id/review', admin, async (req, res) => {
    const id = parseRouteId(String(req.params.id), 'That certificate');
    res.json({ certificate: await service.reviewCertificate(db, req.user!, id, reviewSchema.parse(req.body).decision) });
  });
  return router;
}
