import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch, ApiError } from '../../lib/api-client';
import { PHOTO_FIELD, type UpdatePhotoInput, type YardPhotoList, type YardPhotoView } from '../../../shared/photos';
import type { ApiErrorBody } from '../../../shared/errors';

export const yardPhotoKeys = {
  all: ['yard-photos'] as const,
  list: (slabId: number) => [...yardPhotoKeys.all, slabId] as const,
  /** The catalogue's slab detail key (same shape as its factory): the public page shows these photos. */
  slabDetail: (slabId: number) => ['slabs', 'detail', slabId] as const,
};

export const slabPhotosQuery = (slabId: number) =>
  queryOptions({
    queryKey: yardPhotoKeys.list(slabId),
    queryFn: () => apiFetch<YardPhotoList>(`/api/slabs/${slabId}/photos`),
  });

/**
 * Multipart upload through XMLHttpRequest, because fetch cannot report upload progress.
 * `onProgress` gets 0–1; errors arrive as ApiError like every other call.
 */
export function uploadSlabPhotos(slabId: number, files: File[], onProgress: (share: number) => void, signal?: AbortSignal) {
  return new Promise<YardPhotoList>((resolve, reject) => {
    const form = new FormData();
    for (const f of files) form.append(PHOTO_FIELD, f, f.name);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/slabs/${slabId}/photos`);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.withCredentials = true;
    xhr.upload.onprogress = (e) => { if (e.lengthComputable) onProgress(e.loaded / e.total); };
    xhr.onload = () => {
      let data: unknown = null;
      try { data = JSON.parse(xhr.responseText); } catch { /* not JSON: handled below */ }
      if (xhr.status >= 200 && xhr.status < 300) return resolve(data as YardPhotoList);
      const err = (data as ApiErrorBody | null)?.error;
      reject(new ApiError(xhr.status, err?.code ?? 'error', err?.message ?? xhr.statusText, err?.fieldErrors ?? {}));
    };
    xhr.onerror = () => reject(new TypeError('network'));
    xhr.onabort = () => reject(new DOMException('Upload cancelled', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(form);
  });
}

function useRefreshPhotos(slabId: number) {
  const qc = useQueryClient();
  return (list?: YardPhotoList) => {
    if (list) qc.setQueryData(yardPhotoKeys.list(slabId), list);
    void qc.invalidateQueries({ queryKey: yardPhotoKeys.list(slabId) });
    void qc.invalidateQueries({ queryKey: yardPhotoKeys.slabDetail(slabId) });
  };
}

export function useUploadPhotos(slabId: number) {
  const refresh = useRefreshPhotos(slabId);
  return useMutation({
    mutationFn: ({ files, onProgress, signal }: { files: File[]; onProgress: (share: number) => void; signal?: AbortSignal }) =>
      uploadSlabPhotos(slabId, files, onProgress, signal),
    onSuccess: refresh,
  });
}

export function useUpdatePhoto(slabId: number) {
  const refresh = useRefreshPhotos(slabId);
  return useMutation({
    mutationFn: ({ photoId, body }: { photoId: number; body: UpdatePhotoInput }) =>
      apiFetch<YardPhotoView>(`/api/slabs/${slabId}/photos/${photoId}`, { method: 'PATCH', body }),
    onSuccess: () => refresh(),
  });
}

export function useReorderPhotos(slabId: number) {
  const refresh = useRefreshPhotos(slabId);
  return useMutation({
    mutationFn: (photoIds: number[]) => apiFetch<YardPhotoList>(`/api/slabs/${slabId}/photos/order`, { method: 'POST', body: { photoIds } }),
    onSuccess: refresh,
  });
}

export function useDeletePhoto(slabId: number) {
  const refresh = useRefreshPhotos(slabId);
  return useMutation({
    mutationFn: (photoId: number) => apiFetch<YardPhotoList>(`/api/slabs/${slabId}/photos/${photoId}`, { method: 'DELETE' }),
    onSuccess: refresh,
  });
}
