import { useId, useRef, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { friendlyMessage } from '../../../lib/api-client';
import { PHOTO_ACCEPT, PHOTO_LIMITS } from '../../../../shared/photos';
import { useUploadPhotos } from '../api';

const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;

/** Picks several photos, checks the obvious limits before sending, and shows real upload progress. */
export function PhotoUpload({ slabId, room }: { slabId: number; room: number }) {
  const inputId = useId();
  const progressId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [files, setFiles] = useState<File[]>([]);
  const [share, setShare] = useState(0);
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const upload = useUploadPhotos(slabId);

  function pick(list: FileList | null) {
    const chosen = list ? Array.from(list) : [];
    setDone(null);
    // A new choice starts afresh: the last upload's refusal no longer applies.
    upload.reset();
    setFiles(chosen);
    const tooBig = chosen.filter((f) => f.size > PHOTO_LIMITS.maxFileBytes);
    if (tooBig.length) setProblem(`${tooBig.map((f) => `${f.name} (${mb(f.size)})`).join(', ')}: each photo can be at most ${mb(PHOTO_LIMITS.maxFileBytes)}.`);
    else if (chosen.length > Math.min(room, PHOTO_LIMITS.maxFilesPerUpload)) setProblem(`There is room for ${room} more photo${room === 1 ? '' : 's'} on this slab (at most ${PHOTO_LIMITS.maxFilesPerUpload} at once). Choose fewer.`);
    else setProblem(null);
  }

  function submit(e: FormEvent) {
    e.preventDefault();
    if (!files.length || problem) return;
    setShare(0);
    upload.mutate({ files, onProgress: setShare }, {
      onSuccess: () => {
        setDone(`${files.length} photo${files.length === 1 ? '' : 's'} added.`);
        setFiles([]);
        if (input.current) input.current.value = '';
      },
    });
  }

  const percent = Math.round(share * 100);
  return (
    <form onSubmit={submit} className="flex flex-col gap-3 rounded-md border border-line bg-surface-raised p-4" aria-busy={upload.isPending}>
      <div className="flex flex-col gap-1">
        <label htmlFor={inputId} className="text-sm font-semibold text-ink">Add photos</label>
        <input
          ref={input} id={inputId} type="file" multiple accept={PHOTO_ACCEPT} disabled={upload.isPending || room <= 0}
          onChange={(e) => pick(e.target.files)} aria-describedby={`${inputId}-hint`}
          className="block w-full text-ink file:mr-3 file:min-h-11 file:rounded-md file:border file:border-accent file:bg-surface file:px-4 file:font-semibold file:text-accent"
        />
        <p id={`${inputId}-hint`} className="text-sm text-ink-soft">
          JPEG, PNG or WebP, up to {mb(PHOTO_LIMITS.maxFileBytes)} each; {room > 0 ? `room for ${room} more` : 'this slab has the most photos allowed'}.
          Camera details and location are removed when the photos are saved.
        </p>
      </div>
      {problem && <Notice tone="danger" role="alert">{problem}</Notice>}
      {upload.isError && <Notice tone="danger" role="alert" title="The photos were not added">{friendlyMessage(upload.error)}</Notice>}
      {done && !upload.isPending && <Notice tone="success" role="status">{done}</Notice>}
      {upload.isPending && (
        <div className="flex flex-col gap-1">
          <label htmlFor={progressId} className="text-sm text-ink">
            {percent < 100 ? `Uploading ${files.length} photo${files.length === 1 ? '' : 's'}… ${percent} %` : 'Preparing the photos…'}
          </label>
          <progress id={progressId} max={100} value={percent} className="h-3 w-full accent-accent" />
        </div>
      )}
      <div>
        <Button type="submit" disabled={!files.length || Boolean(problem) || upload.isPending}>
          {files.length ? `Upload ${files.length} photo${files.length === 1 ? '' : 's'}` : 'Upload'}
        </Button>
      </div>
    </form>
  );
}
