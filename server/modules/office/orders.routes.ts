import { Router } from 'express';
import type { AppDeps } from '../../app';
import { AppError } from '../../lib/errors';
import { requireRole } from '../../lib/session';
import { createRefundSchema, parseOrderListQuery, parsePickupBoardQuery, rescheduleSchema } from '../../../shared/office';
import { getOrderDetail, listOrders } from './orders.service';
import { issueRefund } from './refunds.service';
import { markNoShow, markPickedUp, pickupBoard, reschedulePickup } from './pickup-board.service';
import { parseRouteId } from './route-id';

const KEY_PATTERN = /^[A-Za-z0-9:_-]{8,100}$/;

/** The client sends one key per refund it means to make; repeats of that request reuse it. */
function refundKey(header: string | undefined, orderId: number) {
  if (!header || !KEY_PATTERN.test(header)) {
    throw new AppError(400, 'idempotency_key_required', 'The refund request needs an Idempotency-Key header (8–100 letters, digits, - _ :). Reload the page and try again.');
  }
  return `office-refund:${orderId}:${header}`;
}

export function officeOrderRoutes(deps: AppDeps) {
  const { db } = deps;
  const router = Router();
  const admin = requireRole('admin');
  const orderId = (raw: unknown) => parseRouteId(String(raw), 'That order');

  router.get('/office/orders', admin, async (req, res) => {
    res.json({ items: await listOrders(db, parseOrderListQuery(req.query as Record<string, unknown>)) });
  });
  router.get('/office/orders/:id', admin, async (req, res) => {
    res.json(await getOrderDetail(db, orderId(req.params.id)));
  });
  router.post('/office/orders/:id/refunds', admin, async (req, res) => {
    const id = orderId(req.params.id);
    const input = createRefundSchema.parse(req.body);
    const result = await issueRefund(deps, req.user!, id, { ...input, idempotencyKey: refundKey(req.get('Idempotency-Key'), id) });
    res.status(result.replayed ? 200 : 201).json(result);
  });
  router.get('/office/pickups', admin, async (req, res) => {
    res.json(await pickupBoard(db, parsePickupBoardQuery(req.query as Record<string, unknown>)));
  });
  router.post('/office/orders/:id/picked-up', admin, async (req, res) => {
    res.json(await markPickedUp(db, req.user!, orderId(req.params.id)));
  });
  router.post('/office/orders/:id/no-show', admin, async (req, res) => {
    res.json(await markNoShow(deps, req.user!, orderId(req.params.id)));
  });
  router.post('/office/orders/:id/reschedule', admin, async (req, res) => {
    res.json(await reschedulePickup(deps, req.user!, orderId(req.params.id), rescheduleSchema.parse(req.body)));
  });
  return router;
}
