import { queryOptions } from '@tanstack/react-query';
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
