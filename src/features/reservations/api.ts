import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client';
import type { HoldsResponse, HoldView } from '../../../shared/holds';

export const holdKeys = {
  all: ['holds'] as const,
  mine: () => [...holdKeys.all, 'mine'] as const,
};

export const myHoldsQuery = () =>
  queryOptions({
    queryKey: holdKeys.mine(),
    queryFn: async () => (await apiFetch<HoldsResponse>('/api/holds')).holds,
  });

type Created = Pick<HoldView, 'id' | 'slabId' | 'groupId' | 'expiresAt'>;

/** Reserving changes the slab's status too, so catalogue data is refreshed (by its key prefix). */
function useInvalidateAfterHold() {
  const qc = useQueryClient();
  return () => Promise.all([
    qc.invalidateQueries({ queryKey: holdKeys.all }), qc.invalidateQueries({ queryKey: ['slabs'] }),
    // The buyer's marks on slabs (saved, waiting, own holds) change with a hold too.
    qc.invalidateQueries({ queryKey: ['buyer-lists'] }),
  ]);
}

export function useHoldSlab() {
  const invalidate = useInvalidateAfterHold();
  return useMutation({
    mutationFn: (slabId: number) => apiFetch<{ hold: Created }>(`/api/slabs/${slabId}/hold`, { method: 'POST' }),
    onSuccess: invalidate,
  });
}

export function useHoldPair() {
  const invalidate = useInvalidateAfterHold();
  return useMutation({
    mutationFn: (slabIds: number[]) => apiFetch<{ holds: Created[] }>('/api/holds/matched-set', { method: 'POST', body: { slabIds } }),
    onSuccess: invalidate,
  });
}

export function useReleaseHold() {
  const invalidate = useInvalidateAfterHold();
  return useMutation({
    mutationFn: (holdId: number) => apiFetch<void>(`/api/holds/${holdId}`, { method: 'DELETE' }),
    onSuccess: invalidate,
  });
}
