import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Notice } from '../../../components/ui/notice';
import { friendlyMessage } from '../../../lib/api-client';
import { slabPhotosQuery, useDeletePhoto, useReorderPhotos, useUpdatePhoto } from '../api';
import { PhotoUpload } from './photo-upload';
import { PhotoTile } from './photo-tile';

/** The yard desk's photo tool for one slab: upload, order, cover, descriptions, delete. */
export function PhotoManager({ slabId }: { slabId: number }) {
  const photos = useQuery(slabPhotosQuery(slabId));
  const update = useUpdatePhoto(slabId);
  const reorder = useReorderPhotos(slabId);
  const remove = useDeletePhoto(slabId);
  // Spoken after each change, since moved tiles leave the keyboard focus where it was.
  const [announcement, setAnnouncement] = useState('');

  if (photos.isPending) return <p className="text-ink-soft">Loading photos…</p>;
  if (photos.isError) return <Notice tone="danger" role="alert">{friendlyMessage(photos.error)}</Notice>;

  const items = photos.data.items;
  const busy = update.isPending || reorder.isPending || remove.isPending;
  const failed = [update, reorder, remove].find((m) => m.isError);

  function move(index: number, direction: -1 | 1) {
    const ids = items.map((p) => p.id);
    const target = index + direction;
    [ids[index], ids[target]] = [ids[target], ids[index]];
    reorder.mutate(ids, { onSuccess: () => setAnnouncement(`Photo moved to position ${target + 1} of ${ids.length}.`) });
  }

  return (
    <section aria-labelledby="yard-photos-heading" className="flex flex-col gap-4">
      <h2 id="yard-photos-heading" className="font-display text-xl text-ink">Photos ({items.length} of {photos.data.maxPerSlab})</h2>
      <PhotoUpload slabId={slabId} room={photos.data.maxPerSlab - items.length} />
      <p className="sr-only" aria-live="polite">{announcement}</p>
      {failed?.error && <Notice tone="danger" role="alert">{friendlyMessage(failed.error)}</Notice>}
      {items.length === 0 ? (
        <Notice>No photos yet. The first photo added becomes the cover shown in the catalogue.</Notice>
      ) : (
        <ol className="grid grid-cols-1 gap-3 min-[420px]:grid-cols-2 md:grid-cols-3">
          {items.map((photo, index) => (
            <PhotoTile
              key={photo.id} photo={photo} index={index} count={items.length} busy={busy}
              onMove={(d) => move(index, d)}
              onCover={() => update.mutate({ photoId: photo.id, body: { isCover: true } }, { onSuccess: () => setAnnouncement(`Photo ${index + 1} is now the cover.`) })}
              onAltText={(altText) => update.mutate({ photoId: photo.id, body: { altText } }, { onSuccess: () => setAnnouncement('Description saved.') })}
              onView={(view) => update.mutate({ photoId: photo.id, body: { view } }, { onSuccess: () => setAnnouncement('Photo label saved.') })}
              onDelete={() => remove.mutate(photo.id, { onSuccess: () => setAnnouncement('Photo deleted.') })}
            />
          ))}
        </ol>
      )}
    </section>
  );
}
