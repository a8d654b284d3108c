import type { ListingPhotoDto } from '@app/shared';
import { MAX_LISTING_PHOTOS } from '@app/shared/values';
import { useQueryClient } from '@tanstack/react-query';
import { useRef, useState, type DragEvent } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { cn } from '@/lib/cn';
import { errorMessage } from '@/lib/form-errors';
import { listingKeys } from '../api/keys';
import { useDeletePhoto, useReorderPhotos } from '../api/manage-photos';
import { uploadPhotos } from '../api/upload-photos';
import { countOf } from '@/lib/plural';

export interface PhotoManagerProps {
  listingId: number;
  photos: ListingPhotoDto[];
}

/** Drag-and-drop (or pick) photos with upload progress; reorder with move buttons; remove. */
export function PhotoManager({ listingId, photos }: PhotoManagerProps) {
  const queryClient = useQueryClient();
  const input = useRef<HTMLInputElement>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [isOver, setIsOver] = useState(false);
  const remove = useDeletePhoto();
  const reorder = useReorderPhotos();
  const room = MAX_LISTING_PHOTOS - photos.length;

  const send = async (files: File[]) => {
    if (files.length === 0) return;
    setError(null);
    if (files.length > room) {
      setError(
        `You can add ${countOf(room, 'more photo', 'more photos')} (${MAX_LISTING_PHOTOS} at most).`,
      );
      return;
    }
    setProgress(0);
    try {
      await uploadPhotos(listingId, files, setProgress);
      await queryClient.invalidateQueries({ queryKey: listingKeys.all });
    } catch (e) {
      setError(errorMessage(e));
    } finally {
      setProgress(null);
      if (input.current) input.current.value = '';
    }
  };
  const onDrop = (e: DragEvent<HTMLDivElement>) => {
    e.preventDefault();
    setIsOver(false);
    void send(Array.from(e.dataTransfer.files));
  };
  const move = (index: number, by: number) => {
    const ids = photos.map((p) => p.id);
    const [id] = ids.splice(index, 1);
    if (id === undefined) return;
    ids.splice(index + by, 0, id);
    reorder.mutate({ listingId, photoIds: ids });
  };

  return (
    <section aria-labelledby="photos-heading" className="flex flex-col gap-3">
      <h2 id="photos-heading" className="text-xl">
        Photos ({photos.length} of {MAX_LISTING_PHOTOS})
      </h2>
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setIsOver(true);
        }}
        onDragLeave={() => setIsOver(false)}
        onDrop={onDrop}
        className={cn(
          'flex flex-col items-center gap-2 rounded-lg border-2 border-dashed p-6 text-center',
          isOver ? 'border-signal-600 bg-signal-50' : 'border-sand-500 bg-sand-50',
        )}
      >
        <p className="text-sm">
          Drop JPEG, PNG or WebP photos here (8 MB each). Location data is removed.
        </p>
        <label className="inline-flex min-h-11 cursor-pointer items-center rounded-md border border-sand-500 bg-sand-50 px-4 font-bold">
          Choose photos
          <input
            ref={input}
            type="file"
            name="photos"
            multiple
            accept="image/jpeg,image/png,image/webp"
            className="sr-only"
            disabled={room <= 0 || progress !== null}
            onChange={(e) => void send(Array.from(e.currentTarget.files ?? []))}
          />
        </label>
        {progress !== null && (
          <div className="w-full max-w-xs">
            <progress value={progress} max={1} className="w-full" aria-label="Upload progress" />
            <p className="text-xs" role="status">
              Uploading… {Math.round(progress * 100)} %
            </p>
          </div>
        )}
      </div>
      {error && <Alert tone="error">{error}</Alert>}
      {photos.length > 0 && (
        <ol className="grid grid-cols-2 gap-3 sm:grid-cols-4" aria-label="Photo order">
          {photos.map((p, i) => (
            <li
              key={p.id}
              className="flex flex-col gap-1 rounded-md border border-sand-300 bg-sand-50 p-2"
            >
              <img
                src={p.thumbUrl}
                alt={`Photo ${i + 1}`}
                className="aspect-[4/3] w-full rounded-sm object-cover"
              />
              <div className="flex flex-wrap gap-1">
                <Button size="sm" variant="ghost" disabled={i === 0} onClick={() => move(i, -1)}>
                  ←<span className="sr-only"> Move photo {i + 1} earlier</span>
                </Button>
                <Button
                  size="sm"
                  variant="ghost"
                  disabled={i === photos.length - 1}
                  onClick={() => move(i, 1)}
                >
                  →<span className="sr-only"> Move photo {i + 1} later</span>
                </Button>
                <Button
                  size="sm"
                  variant="ghost"
                  onClick={() => remove.mutate({ listingId, photoId: p.id })}
                >
                  Remove<span className="sr-only"> photo {i + 1}</span>
                </Button>
              </div>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
