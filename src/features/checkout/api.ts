import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client';
import type { CheckoutInput, CheckoutStarted } from '../../../shared/checkout';
import type { PickupSlotsResponse } from '../../../shared/pickups';

export const checkoutKeys = {
  all: ['checkout'] as const,
  slots: (days: number) => [...checkoutKeys.all, 'slots', days] as const,
};

export const pickupSlotsQuery = (days = 21) =>
  queryOptions({
    queryKey: checkoutKeys.slots(days),
    queryFn: () => apiFetch<PickupSlotsResponse>('/api/pickup-slots', { query: { days } }),
    staleTime: 15_000,
  });

/** One checkout attempt = one key, made when the attempt starts and reused if it is retried. */
export const newIdempotencyKey = () =>
  `co-${globalThis.crypto?.randomUUID?.() ?? `${Date.now()}-${Math.random().toString(36).slice(2)}`}`;

export function useCheckout() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ input, key }: { input: CheckoutInput; key: string }) =>
      apiFetch<CheckoutStarted>('/api/checkout', { method: 'POST', body: input, headers: { 'Idempotency-Key': key } }),
    // Holds, orders and slab statuses all change: refresh them by their key prefixes.
    onSettled: () => Promise.all(['holds', 'orders', 'slabs', 'checkout'].map((k) => qc.invalidateQueries({ queryKey: [k] }))),
  });
}
