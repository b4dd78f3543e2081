import { queryOptions, keepPreviousData } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client';
import type { SlabDetail, SlabListResponse } from '../../../shared/slabs';

export type CatalogueFilters = Record<string, string>;

export const slabKeys = {
  all: ['slabs'] as const,
  list: (filters: CatalogueFilters) => [...slabKeys.all, 'list', filters] as const,
  detail: (id: number) => [...slabKeys.all, 'detail', id] as const,
  species: ['species'] as const,
};

export const slabListQuery = (filters: CatalogueFilters) =>
  queryOptions({
    queryKey: slabKeys.list(filters),
    queryFn: () => apiFetch<SlabListResponse>('/api/slabs', { query: filters }),
    placeholderData: keepPreviousData,
  });

export const slabDetailQuery = (id: number) =>
  queryOptions({
    queryKey: slabKeys.detail(id),
    queryFn: () => apiFetch<SlabDetail>(`/api/slabs/${id}`),
  });

export type SpeciesOption = { slug: string; name: string; ratePerBoardFootCents: number };

export const speciesQuery = () =>
  queryOptions({
    queryKey: slabKeys.species,
    queryFn: async () => (await apiFetch<{ items: SpeciesOption[] }>('/api/species')).items,
    staleTime: 5 * 60_000,
  });
