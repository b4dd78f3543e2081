import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client';
import type { BatchReadingsInput, CreateReadingInput, MoistureRound, ReadingSaved, SlabReadings, YardStack } from '../../../shared/readings';

export const readingKeys = {
  all: ['yard-readings'] as const,
  slab: (slabId: number) => [...readingKeys.all, 'slab', slabId] as const,
  /** The catalogue's slab detail key (same shape as its factory): it shows readings and the drying state. */
  slabDetail: (slabId: number) => ['slabs', 'detail', slabId] as const,
  /** Catalogue lists filter by drying state, so they go stale too. */
  slabLists: ['slabs', 'list'] as const,
};

export const slabReadingsQuery = (slabId: number) =>
  queryOptions({
    queryKey: readingKeys.slab(slabId),
    queryFn: () => apiFetch<SlabReadings>(`/api/slabs/${slabId}/moisture-readings`),
  });

function useRefresh() {
  const qc = useQueryClient();
  return (slabIds: number[]) => {
    for (const id of new Set(slabIds)) {
      void qc.invalidateQueries({ queryKey: readingKeys.slab(id) });
      void qc.invalidateQueries({ queryKey: readingKeys.slabDetail(id) });
    }
    void qc.invalidateQueries({ queryKey: readingKeys.slabLists });
    void qc.invalidateQueries({ queryKey: [...readingKeys.all, 'stacks'] });
  };
}

export function useAddReading(slabId: number) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (body: CreateReadingInput) => apiFetch<ReadingSaved>(`/api/slabs/${slabId}/moisture-readings`, { method: 'POST', body }),
    onSuccess: () => refresh([slabId]),
  });
}

export function useBatchReadings() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (body: BatchReadingsInput) => apiFetch<{ items: ReadingSaved[] }>('/api/moisture-readings/batch', { method: 'POST', body }),
    onSuccess: (data) => refresh(data.items.map((i) => i.slab.id)),
  });
}

export function useDeleteReading(slabId: number) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (readingId: number) => apiFetch<{ slab: { id: number; dryingState: string } }>(`/api/moisture-readings/${readingId}`, { method: 'DELETE' }),
    onSuccess: () => refresh([slabId]),
  });
}

export const stacksQuery = () =>
  queryOptions({
    queryKey: [...readingKeys.all, 'stacks'] as const,
    queryFn: async () => (await apiFetch<{ items: YardStack[] }>('/api/yard/stacks')).items,
  });

/** The slabs of one stack in walking order, fetched when the person starts a round there. */
export const fetchRound = (stack: string) => apiFetch<MoistureRound>('/api/yard/moisture-round', { query: { stack } });
