import { useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Tag } from '../../../components/ui/tag';
import { PHOTO_LIMITS, PHOTO_VIEW_LABELS, PHOTO_VIEWS, type PhotoView, type YardPhotoView } from '../../../../shared/photos';

type Props = {
  photo: YardPhotoView;
  index: number;
  count: number;
  busy: boolean;
  onMove: (direction: -1 | 1) => void;
  onCover: () => void;
  onAltText: (text: string) => void;
  onView: (view: PhotoView | null) => void;
  onDelete: () => void;
};

/** One photo in the grid with every action as a button, so the order can be changed by keyboard alone. */
export function PhotoTile({ photo, index, count, busy, onMove, onCover, onAltText, onView, onDelete }: Props) {
  const altId = useId();
  const viewId = useId();
  const [alt, setAlt] = useState(photo.altText);
  const [confirming, setConfirming] = useState(false);
  const label = `photo ${index + 1} of ${count}`;
  return (
    <li className="flex flex-col gap-2 rounded-md border border-line bg-surface-raised p-2">
      <div className="relative">
        <img src={photo.thumbUrl} alt={photo.altText || `Slab ${label}`} width={photo.width} height={photo.height}
          className="aspect-[4/3] w-full rounded object-cover" loading="lazy" />
        <span className="absolute left-2 top-2 flex gap-1">
          <Tag tone="neutral">{index + 1}</Tag>
          {photo.isCover && <Tag tone="moss">Cover</Tag>}
          {photo.view && <Tag tone="accent">{PHOTO_VIEW_LABELS[photo.view]}</Tag>}
        </span>
      </div>
      <div className="grid grid-cols-2 gap-2">
        <Button variant="secondary" disabled={busy || index === 0} onClick={() => onMove(-1)} aria-label={`Move ${label} earlier`}>← Earlier</Button>
        <Button variant="secondary" disabled={busy || index === count - 1} onClick={() => onMove(1)} aria-label={`Move ${label} later`}>Later →</Button>
      </div>
      {!photo.isCover && (
        <Button variant="secondary" disabled={busy} onClick={onCover} aria-label={`Make ${label} the cover`}>Make cover</Button>
      )}
      <div className="flex flex-col gap-1">
        <label htmlFor={viewId} className="text-sm font-semibold text-ink">What it shows</label>
        <select id={viewId} value={photo.view ?? ''} disabled={busy} onChange={(e) => onView((e.target.value || null) as PhotoView | null)}
          className="min-h-11 w-full rounded-md border border-line bg-surface px-2 text-ink">
          <option value="">Not said</option>
          {PHOTO_VIEWS.map((v) => <option key={v} value={v}>{PHOTO_VIEW_LABELS[v]}</option>)}
        </select>
      </div>
      <form className="flex flex-col gap-1" onSubmit={(e) => { e.preventDefault(); onAltText(alt); }}>
        <label htmlFor={altId} className="text-sm font-semibold text-ink">Description for screen readers</label>
        <div className="flex gap-2">
          <input id={altId} value={alt} maxLength={PHOTO_LIMITS.maxAltText} onChange={(e) => setAlt(e.target.value)}
            className="min-h-11 w-full min-w-0 rounded-md border border-line bg-surface px-2 text-ink" placeholder="e.g. Live edge, bark removed" />
          <Button variant="quiet" type="submit" disabled={busy || alt === photo.altText}>Save</Button>
        </div>
      </form>
      {confirming ? (
        <div role="group" aria-label={`Delete ${label}?`} className="flex flex-col gap-2 rounded bg-danger-soft p-2">
          <p className="text-sm text-ink">Delete this photo for good?</p>
          <div className="flex gap-2">
            <Button variant="danger" disabled={busy} onClick={onDelete}>Yes, delete</Button>
            <Button variant="quiet" onClick={() => setConfirming(false)} autoFocus>Keep it</Button>
          </div>
        </div>
      ) : (
        <Button variant="quiet" disabled={busy} onClick={() => setConfirming(true)} aria-label={`Delete ${label}`}>Delete…</Button>
      )}
    </li>
  );
}
