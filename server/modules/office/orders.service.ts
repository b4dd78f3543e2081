import type { Db, Tx } from '../../db/client';
import { notFound } from '../../lib/errors';
import type { OrderDetail, OrderListItem, OrderStatus, PaymentView } from '../../../shared/office';
import * as repo from './orders.repo';

type OrderRow = NonNullable<Awaited<ReturnType<typeof repo.findOrder>>>;
type LineRow = Awaited<ReturnType<typeof repo.linesOf>>[number];

const soldCodes = (lines: LineRow[], orderId: number) =>
  lines.filter((l) => l.line.orderId === orderId && l.line.status === 'sold').map((l) => l.line.slabCode);

function listItem({ order, buyerName, buyerEmail }: OrderRow, lines: LineRow[]): OrderListItem {
  return {
    id: order.id, code: order.code, status: order.status as OrderStatus, buyerName, buyerEmail,
    totalCents: order.totalCents, refundedCents: order.refundedCents, pickupOn: order.pickupOn,
    paidAt: order.paidAt?.toISOString() ?? null, slabCodes: soldCodes(lines, order.id),
  };
}

export async function listOrders(db: Db, query: { status?: OrderStatus; q?: string }): Promise<OrderListItem[]> {
  const rows = await repo.findOrders(db, query);
  const lines = await repo.linesOf(db, rows.map((r) => r.order.id));
  return rows.map((r) => listItem(r, lines));
}

export const toPaymentView = (p: Awaited<ReturnType<typeof repo.paymentsOf>>[number]): PaymentView => ({
  id: p.id, kind: p.kind === 'refund' ? 'refund' : 'charge', amountCents: p.amountCents, status: p.status, reason: p.reason,
  providerId: p.providerId, createdBy: p.createdBy, createdAt: p.createdAt.toISOString(),
});

/** The order as the office sees it: lines with their slabs' current status, and every money movement. */
export async function getOrderDetail(db: Tx, id: number): Promise<OrderDetail> {
  const row = await repo.findOrder(db, id);
  if (!row) throw notFound('That order');
  const [lines, pays, window] = await Promise.all([repo.linesOf(db, [id]), repo.paymentsOf(db, id), repo.findWindow(db, row.order.pickupWindowId)]);
  const { order } = row;
  const pending = pays.filter((p) => p.kind === 'refund' && p.status === 'pending').reduce((n, p) => n + p.amountCents, 0);
  return {
    ...listItem(row, lines),
    buyerId: order.buyerId, slabsCents: order.slabsCents, servicesCents: order.servicesCents,
    refundableCents: order.paidAt ? Math.max(0, order.totalCents - order.refundedCents - pending) : 0,
    totalWeightLb: order.totalWeightLb, longestSlabIn: order.longestSlabIn, loadingHelp: order.loadingHelp, disputed: order.disputed,
    pickupWindow: window ? { id: window.id, weekday: window.weekday, startsAt: window.startsAt, endsAt: window.endsAt, capacity: window.capacity } : null,
    pickedUpAt: order.pickedUpAt?.toISOString() ?? null, pickedUpBy: order.pickedUpBy, createdAt: order.createdAt.toISOString(),
    lines: lines.map(({ line, slabStatus }) => ({
      id: line.id, slabId: line.slabId, slabCode: line.slabCode, speciesName: line.speciesName, status: line.status === 'refunded' ? 'refunded' : 'sold',
      boardFeet: line.boardFeet, weightLb: line.weightLb, lengthIn: line.lengthIn, totalCents: line.totalCents, slabStatus,
    })),
    payments: pays.map(toPaymentView),
  };
}
