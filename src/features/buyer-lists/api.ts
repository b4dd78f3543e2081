import { useSyncExternalStore } from 'react';
import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client';
import { COMPARE_FULL_MESSAGE, MAX_COMPARE, type MySlabMarks, type SavedSlabsResponse } from '../../../shared/buyer-lists';
import type { SlabDetail } from '../../../shared/slabs';

export const buyerListKeys = {
  all: ['buyer-lists'] as const,
  marks: () => [...buyerListKeys.all, 'marks'] as const,
  saved: () => [...buyerListKeys.all, 'saved'] as const,
  compare: (ids: number[]) => [...buyerListKeys.all, 'compare', ids] as const,
};

/** What the signed-in buyer saved and asked to hear about; callers enable it only when signed in. */
export const slabMarksQuery = () =>
  queryOptions({ queryKey: buyerListKeys.marks(), queryFn: () => apiFetch<MySlabMarks>('/api/me/slab-marks') });

export const savedSlabsQuery = () =>
  queryOptions({ queryKey: buyerListKeys.saved(), queryFn: async () => (await apiFetch<SavedSlabsResponse>('/api/saved-slabs')).items });

export const compareQuery = (ids: number[]) =>
  queryOptions({
    queryKey: buyerListKeys.compare(ids),
    queryFn: () => apiFetch<{ items: SlabDetail[]; missingIds: number[] }>('/api/compare', { query: { ids: ids.join(',') } }),
    enabled: ids.length > 0,
  });

function useMarkMutation<T>(fn: (slabId: number) => Promise<T>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => qc.invalidateQueries({ queryKey: buyerListKeys.all }) });
}

export const useSaveSlab = () => useMarkMutation((id) => apiFetch(`/api/saved-slabs/${id}`, { method: 'PUT' }));
export const useUnsaveSlab = () => useMarkMutation((id) => apiFetch<void>(`/api/saved-slabs/${id}`, { method: 'DELETE' }));
export const useWatchSlab = () => useMarkMutation((id) => apiFetch(`/api/slabs/${id}/watch`, { method: 'POST' }));
export const useUnwatchSlab = () => useMarkMutation((id) => apiFetch<void>(`/api/slabs/${id}/watch`, { method: 'DELETE' }));

// --- the compare list: kept in this browser (visitors compare too), at most four slabs ---

const STORE_KEY = 'stickerline.compare';
const listeners = new Set<() => void>();
let cached: { raw: string | null; ids: number[] } = { raw: null, ids: [] };

function readIds(): number[] {
  const raw = typeof localStorage === 'undefined' ? null : localStorage.getItem(STORE_KEY);
  if (raw === cached.raw) return cached.ids;
  let ids: number[] = [];
  try {
    const parsed: unknown = raw ? JSON.parse(raw) : [];
    if (Array.isArray(parsed)) ids = parsed.filter((n): n is number => Number.isInteger(n) && n > 0).slice(0, MAX_COMPARE);
  } catch { /* a damaged entry counts as an empty list */ }
  cached = { raw, ids };
  return ids;
}

function writeIds(ids: number[]) {
  localStorage.setItem(STORE_KEY, JSON.stringify(ids));
  listeners.forEach((l) => l());
}

const subscribe = (listener: () => void) => {
  listeners.add(listener);
  const onStorage = (e: StorageEvent) => { if (e.key === STORE_KEY) listener(); };
  window.addEventListener('storage', onStorage);
  return () => { listeners.delete(listener); window.removeEventListener('storage', onStorage); };
};

export type CompareAdd = { ok: true } | { ok: false; message: string };

export function useCompareList() {
  const ids = useSyncExternalStore(subscribe, readIds, () => []);
  return {
    ids,
    has: (id: number) => ids.includes(id),
    add: (id: number): CompareAdd => {
      const now = readIds();
      if (now.includes(id)) return { ok: true };
      if (now.length >= MAX_COMPARE) return { ok: false, message: COMPARE_FULL_MESSAGE };
      writeIds([...now, id]);
      return { ok: true };
    },
    remove: (id: number) => writeIds(readIds().filter((x) => x !== id)),
    clear: () => writeIds([]),
  };
}
