import { MAX_LISTING_PHOTOS } from '@app/shared/values';
import { useEffect, useMemo, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { countOf } from '@/lib/plural';

const TYPES = ['image/jpeg', 'image/png', 'image/webp'];
const MAX_BYTES = 8 * 1024 * 1024;

export interface PendingPhotosProps {
  files: File[];
  onChange: (files: File[]) => void;
  disabled?: boolean;
}

/**
 * Photos picked on the new-listing form: previewed here and uploaded with the listing when it is saved, so the
 * seller never has to save a draft first. Checks type, size and count before anything is sent (the server
 * checks again).
 */
export function PendingPhotos({ files, onChange, disabled = false }: PendingPhotosProps) {
  const input = useRef<HTMLInputElement>(null);
  const [error, setError] = useState<string | null>(null);
  const urls = useMemo(() => files.map((f) => URL.createObjectURL(f)), [files]);
  useEffect(() => () => urls.forEach((u) => URL.revokeObjectURL(u)), [urls]);
  const room = MAX_LISTING_PHOTOS - files.length;

  const add = (picked: File[]) => {
    if (input.current) input.current.value = '';
    if (picked.length === 0) return;
    const wrong = picked.find((f) => !TYPES.includes(f.type));
    if (wrong) return setError(`${wrong.name} is not a JPEG, PNG or WebP photo.`);
    const big = picked.find((f) => f.size > MAX_BYTES);
    if (big) return setError(`${big.name} is larger than 8 MB.`);
    if (picked.length > room)
      return setError(
        `You can add ${countOf(room, 'more photo', 'more photos')} (${MAX_LISTING_PHOTOS} at most).`,
      );
    setError(null);
    onChange([...files, ...picked]);
  };

  return (
    <fieldset className="flex flex-col gap-3 rounded-md border border-sand-300 p-3">
      <legend className="px-1 text-sm font-bold">
        Photos ({files.length} of {MAX_LISTING_PHOTOS})
      </legend>
      <p className="text-sm text-ink-700">
        JPEG, PNG or WebP, 8 MB each. They are uploaded when you save; location data is removed.
      </p>
      <label className="inline-flex min-h-11 w-fit cursor-pointer items-center rounded-md border border-sand-500 bg-sand-50 px-4 font-bold has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-signal-600">
        Choose photos
        <input
          ref={input}
          type="file"
          name="photos"
          multiple
          accept={TYPES.join(',')}
          className="sr-only"
          disabled={disabled || room <= 0}
          onChange={(e) => add(Array.from(e.currentTarget.files ?? []))}
        />
      </label>
      {error && (
        <p role="alert" className="text-sm font-bold text-flare-700">
          {error}
        </p>
      )}
      {files.length > 0 && (
        <ol className="grid grid-cols-2 gap-3 sm:grid-cols-4" aria-label="Photos to upload">
          {files.map((f, i) => (
            <li
              key={`${f.name}-${i}`}
              className="flex flex-col gap-1 rounded-md border border-sand-300 bg-sand-50 p-2"
            >
              <img
                src={urls[i]}
                alt={`Photo ${i + 1}: ${f.name}`}
                className="aspect-[4/3] w-full rounded-sm object-cover"
              />
              <Button
                size="sm"
                variant="ghost"
                disabled={disabled}
                onClick={() => onChange(files.filter((_, j) => j !== i))}
              >
                Remove<span className="sr-only"> photo {i + 1}</span>
              </Button>
            </li>
          ))}
        </ol>
      )}
    </fieldset>
  );
}
