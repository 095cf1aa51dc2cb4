'use client';

import { useEffect, useId, useRef, useState, type ChangeEvent } from 'react';
import { pending } from '@/lib/offline/outbox';
import { keepRefusal, keptBytes, keptPhotoHint, type KeptPhoto } from '@/lib/offline/photos';

const ACCEPT = 'image/jpeg,image/png,image/webp';

/** A kept photo drawn from the file on the phone (no network needed). */
export function KeptThumb({ photo, alt, className }: { photo: KeptPhoto; alt: string; className?: string }) {
  const img = useRef<HTMLImageElement>(null);
  // the object URL lives as long as the picture is on screen
  useEffect(() => {
    const url = URL.createObjectURL(photo.blob);
    if (img.current) img.current.src = url;
    return () => URL.revokeObjectURL(url);
  }, [photo.blob]);
  return (
    // a file on this phone, shown as it is: next/image has nothing to fetch or resize
    // eslint-disable-next-line @next/next/no-img-element
    <img
      ref={img}
      alt={alt}
      className={className ?? 'h-24 w-24 rounded-md border border-limestone-300 object-cover dark:border-creek-600'}
    />
  );
}

/**
 * The field log form's photos: chosen files are kept on the phone, shown from the file,
 * and uploaded when the test is saved (or, with no signal, when the outbox sends it), so
 * choosing a photo needs no signal. The bounds are lib/offline/photos.ts's.
 */
export function KeptPhotos({ photos, onChange }: { photos: KeptPhoto[]; onChange: (photos: KeptPhoto[]) => void }) {
  const id = useId();
  const [error, setError] = useState<string | null>(null);

  async function onPick(e: ChangeEvent<HTMLInputElement>) {
    const chosen = Array.from(e.target.files ?? []);
    e.target.value = '';
    if (chosen.length === 0) return;
    const onDevice = keptBytes(await pending().catch(() => [])) + keptBytes([{ photos }]);
    const refused = keepRefusal(chosen, photos.length, onDevice);
    setError(refused);
    if (refused) return;
    onChange([...photos, ...chosen.map((f) => ({ key: crypto.randomUUID(), blob: f, name: f.name }))]);
  }

  return (
    <div className="flex flex-col gap-2" data-testid="kept-photos">
      <label htmlFor={`${id}-input`} className="block font-sans text-sm font-semibold">
        Photos of the installation (optional)
      </label>
      <p id={`${id}-hint`} className="cw-muted text-sm">
        {keptPhotoHint()}
      </p>
      <input
        id={`${id}-input`}
        type="file"
        accept={ACCEPT}
        multiple
        onChange={(e) => void onPick(e)}
        aria-describedby={`${id}-hint${error ? ` ${id}-error` : ''}`}
        className="font-sans text-sm file:mr-3 file:rounded-md file:border-0 file:bg-clay file:px-3 file:py-2 file:font-semibold file:text-limestone-50 hover:file:bg-clay-600"
      />
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-semibold text-clay-600 dark:text-clay-300">
          {error}
        </p>
      ) : null}
      {photos.length > 0 ? (
        <ul className="flex flex-wrap gap-3" aria-label="Photos added">
          {photos.map((p, i) => (
            <li key={p.key} className="flex flex-col items-start gap-1">
              <KeptThumb photo={p} alt={`Photo ${i + 1} of ${photos.length}: ${p.name}`} />
              <span className="cw-muted max-w-24 truncate text-xs">{p.uploadedId ? 'sent' : 'on this phone'}</span>
              <button
                type="button"
                className="cw-link text-sm"
                onClick={() => onChange(photos.filter((x) => x.key !== p.key))}
              >
                Remove<span className="sr-only"> photo {i + 1}</span>
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
