import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client';
import type {
  ActiveHold, AuditPage, CreateRefundInput, MillNumbers, OfficeUser, OrderDetail, OrderListItem, OrderStatus,
  PaymentView, PickupBoard, RescheduleInput, UpdateUserInput, UserRole,
} from '../../../shared/office';

export type AuditFilters = { actor?: string; action?: string; entityType?: string; from?: string; to?: string; page?: number };
export type UserFilters = { q?: string; role?: UserRole };
export type OrderFilters = { status?: OrderStatus; q?: string };

export const officeKeys = {
  all: ['office'] as const,
  users: (f: UserFilters) => ['office', 'users', f] as const,
  audit: (f: AuditFilters) => ['office', 'audit', f] as const,
  numbers: () => ['office', 'numbers'] as const,
  holds: () => ['office', 'holds'] as const,
  pickups: (from?: string, days?: number) => ['office', 'pickups', { from, days }] as const,
  orders: (f: OrderFilters) => ['office', 'orders', f] as const,
  order: (id: number) => ['office', 'order', id] as const,
};

export const usersQuery = (f: UserFilters) => queryOptions({
  queryKey: officeKeys.users(f),
  queryFn: () => apiFetch<{ items: OfficeUser[] }>('/api/office/users', { query: f }),
});
export const auditQuery = (f: AuditFilters) => queryOptions({
  queryKey: officeKeys.audit(f),
  queryFn: () => apiFetch<AuditPage>('/api/office/audit', { query: f }),
});
export const numbersQuery = () => queryOptions({
  queryKey: officeKeys.numbers(),
  queryFn: () => apiFetch<MillNumbers>('/api/office/numbers'),
});
export const holdsQuery = () => queryOptions({
  queryKey: officeKeys.holds(),
  queryFn: () => apiFetch<{ items: ActiveHold[] }>('/api/office/holds'),
});
export const pickupsQuery = (from?: string, days?: number) => queryOptions({
  queryKey: officeKeys.pickups(from, days),
  queryFn: () => apiFetch<PickupBoard>('/api/office/pickups', { query: { from, days } }),
});
export const ordersQuery = (f: OrderFilters) => queryOptions({
  queryKey: officeKeys.orders(f),
  queryFn: () => apiFetch<{ items: OrderListItem[] }>('/api/office/orders', { query: f }),
});
export const orderQuery = (id: number) => queryOptions({
  queryKey: officeKeys.order(id),
  queryFn: () => apiFetch<OrderDetail>(`/api/office/orders/${id}`),
});

/** Every office change can move several screens (board, orders, holds, numbers, audit): refresh them all. */
function useOfficeMutation<I, O>(fn: (input: I) => Promise<O>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => qc.invalidateQueries({ queryKey: officeKeys.all }) });
}

export const useUpdateUser = () =>
  useOfficeMutation(({ id, ...body }: UpdateUserInput & { id: string }) => apiFetch<OfficeUser>(`/api/office/users/${id}`, { method: 'PATCH', body }));
export const useReleaseHold = () =>
  useOfficeMutation((id: number) => apiFetch<{ id: number }>(`/api/office/holds/${id}`, { method: 'DELETE' }));
export const useMarkPickedUp = () =>
  useOfficeMutation((orderId: number) => apiFetch<OrderDetail>(`/api/office/orders/${orderId}/picked-up`, { method: 'POST' }));
export const useMarkNoShow = () =>
  useOfficeMutation((orderId: number) => apiFetch<{ rule: string; order: OrderDetail }>(`/api/office/orders/${orderId}/no-show`, { method: 'POST' }));
export const useReschedule = () =>
  useOfficeMutation(({ orderId, ...body }: RescheduleInput & { orderId: number }) =>
    apiFetch<OrderDetail>(`/api/office/orders/${orderId}/reschedule`, { method: 'POST', body }));

/** The refund form keeps one key per intended refund, so a repeated click cannot refund twice. */
export const useRefund = () =>
  useOfficeMutation(({ orderId, idempotencyKey, body }: { orderId: number; idempotencyKey: string; body: CreateRefundInput }) =>
    apiFetch<{ replayed: boolean; refund: PaymentView; order: OrderDetail }>(`/api/office/orders/${orderId}/refunds`, {
      method: 'POST', body, headers: { 'Idempotency-Key': idempotencyKey },
    }));
