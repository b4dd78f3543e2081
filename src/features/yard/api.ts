import { keepPreviousData, queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client';
import type { LogMatchedSets, MatchedSetView } from '../../../shared/matched-sets';
import type { CreateLogInput, LogDetail, LogSummary, NextLogCode, UpdateLog } from '../../../shared/logs';
import type {
  BulkResult, BulkSlabAction, CreateFigureKind, CreateSlab, FigureKind, UpdateSlab, YardSlabDetail, YardSlabPage,
} from '../../../shared/slab-input';

export type InventoryFilters = Record<string, string>;
export type SpeciesOption = { slug: string; name: string; ratePerBoardFootCents: number };

export const yardKeys = {
  all: ['yard'] as const,
  logs: () => [...yardKeys.all, 'logs'] as const,
  log: (id: number) => [...yardKeys.all, 'logs', id] as const,
  slabs: () => [...yardKeys.all, 'slabs'] as const,
  slabList: (filters: InventoryFilters) => [...yardKeys.all, 'slabs', 'list', filters] as const,
  slab: (id: number) => [...yardKeys.all, 'slabs', 'detail', id] as const,
  figureKinds: () => [...yardKeys.all, 'figure-kinds'] as const,
  species: () => [...yardKeys.all, 'species'] as const,
  shopAddress: () => [...yardKeys.all, 'shop-address'] as const,
  matchedSets: (logId: number) => [...yardKeys.all, 'logs', logId, 'matched-sets'] as const,
};

export const logMatchedSetsQuery = (logId: number) =>
  queryOptions({ queryKey: yardKeys.matchedSets(logId), queryFn: () => apiFetch<LogMatchedSets>(`/api/logs/${logId}/matched-sets`) });

/** Marking or unmarking a set changes the log page and every public slab page of the log. */
export function useMatchedSetChange(logId: number) {
  const qc = useQueryClient();
  const refresh = () => { void qc.invalidateQueries({ queryKey: yardKeys.matchedSets(logId) }); void qc.invalidateQueries({ queryKey: ['slabs'] }); };
  return {
    mark: useMutation({ mutationFn: (slabIds: number[]) => apiFetch<MatchedSetView>('/api/matched-sets', { method: 'POST', body: { slabIds } }), onSuccess: refresh }),
    unmark: useMutation({ mutationFn: (setId: number) => apiFetch<{ id: number }>(`/api/matched-sets/${setId}`, { method: 'DELETE' }), onSuccess: refresh }),
  };
}

export type ShopAddress = { url: string; phonesCanReach: boolean; suggestions: string[] };

export const shopAddressQuery = () =>
  queryOptions({ queryKey: yardKeys.shopAddress(), queryFn: () => apiFetch<ShopAddress>('/api/yard/shop-address'), staleTime: Infinity });

/** The code a new log would get now, and today's date at the mill (for the form's date checks). Under the logs key, so saving a log refreshes it. */
export const nextLogCodeQuery = (felledOn: string | null | undefined) => {
  const day = felledOn && /^\d{4}-\d{2}-\d{2}$/.test(felledOn) ? felledOn : '';
  return queryOptions({
    queryKey: [...yardKeys.logs(), 'next-code', day] as const,
    queryFn: () => apiFetch<NextLogCode>(`/api/logs/next-code${day ? `?felledOn=${day}` : ''}`),
    placeholderData: keepPreviousData,
  });
};

export const logListQuery = () =>
  queryOptions({ queryKey: yardKeys.logs(), queryFn: async () => (await apiFetch<{ items: LogSummary[] }>('/api/logs')).items });

export const logDetailQuery = (id: number) =>
  queryOptions({ queryKey: yardKeys.log(id), queryFn: () => apiFetch<LogDetail>(`/api/logs/${id}`) });

export const inventoryQuery = (filters: InventoryFilters) =>
  queryOptions({
    queryKey: yardKeys.slabList(filters),
    queryFn: () => apiFetch<YardSlabPage>('/api/yard/slabs', { query: filters }),
    placeholderData: keepPreviousData,
  });

export const yardSlabQuery = (id: number) =>
  queryOptions({ queryKey: yardKeys.slab(id), queryFn: () => apiFetch<YardSlabDetail>(`/api/yard/slabs/${id}`) });

export const figureKindsQuery = () =>
  queryOptions({
    queryKey: yardKeys.figureKinds(),
    queryFn: async () => (await apiFetch<{ items: FigureKind[] }>('/api/figure-kinds')).items,
    staleTime: 5 * 60_000,
  });

export const yardSpeciesQuery = () =>
  queryOptions({
    queryKey: yardKeys.species(),
    queryFn: async () => (await apiFetch<{ items: SpeciesOption[] }>('/api/species')).items,
    staleTime: 5 * 60_000,
  });

/** The CSV of the current inventory view; a plain link so the browser downloads it. */
export const inventoryCsvUrl = (filters: InventoryFilters) => {
  const params = new URLSearchParams(Object.entries(filters).filter(([k, v]) => v && k !== 'page' && k !== 'pageSize'));
  const qs = params.toString();
  return `/api/yard/slabs.csv${qs ? `?${qs}` : ''}`;
};

export function useCreateLog() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateLogInput) => apiFetch<LogDetail>('/api/logs', { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: yardKeys.logs() }),
  });
}

export function useUpdateLog(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateLog) => apiFetch<LogDetail>(`/api/logs/${id}`, { method: 'PATCH', body }),
    onSuccess: (log) => { qc.setQueryData(yardKeys.log(id), log); void qc.invalidateQueries({ queryKey: yardKeys.logs() }); },
  });
}

export function useSaveSlab(id: number | null) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateSlab | UpdateSlab) =>
      id === null
        ? apiFetch<YardSlabDetail>('/api/slabs', { method: 'POST', body })
        : apiFetch<YardSlabDetail>(`/api/slabs/${id}`, { method: 'PATCH', body }),
    onSuccess: (slab) => {
      qc.setQueryData(yardKeys.slab(slab.id), slab);
      void qc.invalidateQueries({ queryKey: yardKeys.all });
      // The public catalogue caches slabs too; its keys start with 'slabs'.
      void qc.invalidateQueries({ queryKey: ['slabs'] });
    },
  });
}

export function useBulkAction() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: BulkSlabAction) => apiFetch<{ results: BulkResult[] }>('/api/yard/slabs/bulk', { method: 'POST', body }),
    onSettled: () => qc.invalidateQueries({ queryKey: yardKeys.all }),
  });
}

export function useAddFigureKind() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateFigureKind) => apiFetch<FigureKind>('/api/figure-kinds', { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: yardKeys.figureKinds() }),
  });
}

/** Removes a slab or log recorded by mistake; the server refuses anything a buyer ever saw. */
export function useDeleteRecord(kind: 'slab' | 'log') {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => apiFetch<{ deleted: string }>(kind === 'slab' ? `/api/slabs/${id}` : `/api/logs/${id}`, { method: 'DELETE' }),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: yardKeys.all });
      void qc.invalidateQueries({ queryKey: ['slabs'] });
    },
  });
}
