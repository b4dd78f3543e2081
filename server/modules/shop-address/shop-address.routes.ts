import { Router } from 'express';
import { requireRole } from '../../lib/session';
import { shopAddress } from './shop-address';

/** The shop's public address for the yard desk's QR code. Staff only: it may name the mill's LAN. */
export function shopAddressRoutes({ publicUrl }: { publicUrl: string }) {
  const router = Router();
  router.get('/yard/shop-address', requireRole('seller', 'admin'), (_req, res) => {
    res.json(shopAddress(publicUrl));
  });
  return router;
}
