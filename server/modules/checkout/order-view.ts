import type { Tx } from '../../db/client';
import { notFound } from '../../lib/errors';
import type { SessionUser } from '../../lib/session';
import { loadingAdvice } from '../../../shared/loading';
import { isAttempt, type OrderStatus, type OrderSummary, type OrderView } from '../../../shared/checkout';
import type { PriceLine } from '../../../shared/slabs';
import { readYardAddress } from '../pickups/pickups.repo';
import * as repo from './checkout.repo';

type Breakdown = { lines?: PriceLine[] };

export async function orderView(tx: Tx, id: number): Promise<OrderView & { buyer: { id: string; email: string; name: string } }> {
  const found = await repo.orderWithWindow(tx, id);
  if (!found) throw notFound('That order');
  const { order, window } = found;
  const [lines, yardAddress] = await Promise.all([repo.linesOf(tx, id), readYardAddress(tx)]);
  const attempt = isAttempt(order.status as OrderStatus);
  return {
    id: order.id, code: order.code, status: order.status as OrderStatus,
    slabsCents: order.slabsCents, servicesCents: order.servicesCents, taxCents: order.taxCents, taxExemptCertificate: order.taxExemptCertificate,
    totalCents: order.totalCents,
    refundedCents: order.refundedCents, paymentUrl: order.status === 'pending-payment' ? order.paymentUrl : null,
    totalWeightLb: Math.round(order.totalWeightLb), longestSlabIn: order.longestSlabIn,
    heaviestSlabLb: Math.round(Math.max(0, ...lines.map((l) => l.weightLb))),
    // An attempt books nothing yet: no pickup and no loading help are shown until it is paid.
    loadingHelp: attempt ? false : order.loadingHelp, disputed: order.disputed,
    createdAt: order.createdAt.toISOString(), paidAt: order.paidAt?.toISOString() ?? null,
    pickup: attempt ? null : { on: order.pickupOn, startsAt: window?.startsAt ?? null, endsAt: window?.endsAt ?? null, yardAddress },
    lines: lines.map((l) => ({
      id: l.id, slabId: l.slabId, slabCode: l.slabCode, speciesName: l.speciesName, boardFeet: l.boardFeet,
      weightLb: Math.round(l.weightLb), lengthIn: l.lengthIn, withFlattening: l.withFlattening,
      priceLines: (l.priceBreakdown as Breakdown)?.lines ?? [], slabCents: l.slabCents, servicesCents: l.servicesCents, taxCents: l.taxCents,
      totalCents: l.totalCents, status: l.status,
    })),
    buyer: { id: order.buyerId, email: found.buyerEmail, name: found.buyerName },
  };
}

/** A buyer sees only their own orders; an admin may open any. Others get a 404, not a hint that it exists. */
export async function orderForViewer(tx: Tx, viewer: SessionUser, id: number): Promise<OrderView> {
  const view = await orderView(tx, id);
  if (view.buyer.id !== viewer.id && viewer.role !== 'admin') throw notFound('That order');
  const { buyer: _buyer, ...rest } = view;
  return rest;
}

export async function ordersOfBuyer(tx: Tx, buyerId: string): Promise<OrderSummary[]> {
  const rows = await repo.ordersOfBuyer(tx, buyerId);
  const [lineRows, yardAddress] = await Promise.all([repo.countLinesByOrder(tx, rows.map((r) => r.order.id)), readYardAddress(tx)]);
  const counts = new Map<number, number>();
  for (const l of lineRows) counts.set(l.orderId, (counts.get(l.orderId) ?? 0) + 1);
  return rows.map(({ order, window }) => ({
    id: order.id, code: order.code, status: order.status as OrderStatus, totalCents: order.totalCents,
    createdAt: order.createdAt.toISOString(), slabCount: counts.get(order.id) ?? 0,
    pickup: { on: order.pickupOn, startsAt: window?.startsAt ?? null, endsAt: window?.endsAt ?? null, yardAddress },
  }));
}

/** The pieces both order e-mails share, from the stored order. */
export async function orderEmailInput(tx: Tx, id: number, publicUrl: string) {
  const o = await orderView(tx, id);
  const advice = loadingAdvice(o.lines.map((l) => ({ weightLb: l.weightLb, lengthIn: l.lengthIn })), { loadingHelp: o.loadingHelp });
  return {
    to: o.buyer.email,
    input: {
      name: o.buyer.name, code: o.code, totalCents: o.totalCents, taxCents: o.taxCents, taxExemptCertificate: o.taxExemptCertificate, totalWeightLb: o.totalWeightLb,
      // Lines before tax; the tax is its own line.
      slabs: o.lines.map((l) => ({ code: l.slabCode, speciesName: l.speciesName, totalCents: l.slabCents + l.servicesCents, withFlattening: l.withFlattening })),
      pickup: { yardAddress: o.pickup?.yardAddress ?? 'the mill yard', on: o.pickup?.on ?? '', startsAt: o.pickup?.startsAt ?? '', endsAt: o.pickup?.endsAt ?? '' },
      bring: advice?.bring ?? [], vehicle: advice?.vehicle ?? '', loadingHelp: o.loadingHelp, caution: advice?.caution ?? '',
      url: `${publicUrl}/orders/${o.id}`,
    },
  };
}
