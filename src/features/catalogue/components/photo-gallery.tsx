import { useState } from 'react';
import type { SlabPhotoView } from '../../../../shared/slabs';
import { PHOTO_VIEW_LABELS, type PhotoView } from '../../../../shared/photos';

const viewLabel = (v: string | null) => (v ? PHOTO_VIEW_LABELS[v as PhotoView] ?? null : null);

export function PhotoGallery({ photos, code }: { photos: SlabPhotoView[]; code: string }) {
  const [index, setIndex] = useState(0);
  if (photos.length === 0) {
    return <div className="flex aspect-[3/1.4] items-center justify-center rounded-lg bg-surface-sunk text-ink-soft">No photos yet</div>;
  }
  const current = photos[Math.min(index, photos.length - 1)];
  return (
    <figure className="flex flex-col gap-2">
      <img
        src={current.displayUrl}
        width={current.width}
        height={current.height}
        alt={current.altText || `Slab ${code}, photo ${index + 1} of ${photos.length}`}
        className="h-auto w-full rounded-lg border border-line bg-surface-sunk object-contain"
      />
      {(viewLabel(current.view) || current.isIllustration) && (
        <figcaption className="text-sm text-ink-soft">
          {viewLabel(current.view) && <span className="font-semibold text-ink">{viewLabel(current.view)}. </span>}
          {current.isIllustration && "Drawn illustration from the slab's measurements — not a photograph."}
        </figcaption>
      )}
      {photos.length > 1 && (
        <ul className="flex gap-2 overflow-x-auto" aria-label="More photos">
          {photos.map((p, i) => (
            <li key={p.id}>
              <button
                type="button"
                onClick={() => setIndex(i)}
                aria-label={`Show photo ${i + 1}${viewLabel(p.view) ? `: ${viewLabel(p.view)}` : ''}`}
                aria-pressed={i === index}
                className={`block h-16 w-24 overflow-hidden rounded border-2 ${i === index ? 'border-accent' : 'border-transparent'}`}
              >
                <img src={p.thumbUrl} alt="" className="h-full w-full object-cover" />
              </button>
            </li>
          ))}
        </ul>
      )}
    </figure>
  );
}
