import type { OrderStatus } from '../../../../shared/office';

/** Plain words for order states, used on every office screen. */
export const ORDER_STATUS_LABELS: Record<OrderStatus, string> = {
  'pending-payment': 'Attempt: payment page open',
  abandoned: 'Attempt: not paid',
  paid: 'Paid, waiting at the yard',
  'picked-up': 'Collected',
  'no-show': 'Not collected',
  refunded: 'Refunded',
  cancelled: 'Cancelled',
};

export const dollars = (cents: number) => `$${(cents / 100).toFixed(2)}`;
