import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client';
import type { OrderResponse, OrdersResponse } from '../../../shared/checkout';

export const orderKeys = {
  all: ['orders'] as const,
  mine: () => [...orderKeys.all, 'mine'] as const,
  detail: (id: number) => [...orderKeys.all, 'detail', id] as const,
};

export const myOrdersQuery = () =>
  queryOptions({ queryKey: orderKeys.mine(), queryFn: async () => (await apiFetch<OrdersResponse>('/api/orders')).orders });

export const orderQuery = (id: number) =>
  queryOptions({ queryKey: orderKeys.detail(id), queryFn: async () => (await apiFetch<OrderResponse>(`/api/orders/${id}`)).order });

/**
 * After the payment page: 'check' asks the server to verify the payment with the provider,
 * 'cancel' closes the page so it can no longer be paid. Either way the answer is the order.
 */
export function usePaymentReturn(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (what: 'check' | 'cancel') =>
      apiFetch<OrderResponse>(`/api/orders/${id}/${what === 'check' ? 'payment-check' : 'payment-cancel'}`, { method: 'POST', body: {} }),
    onSuccess: ({ order }) => {
      qc.setQueryData(orderKeys.detail(id), order);
      return Promise.all(['holds', 'orders', 'slabs'].map((k) => qc.invalidateQueries({ queryKey: [k] })));
    },
  });
}
