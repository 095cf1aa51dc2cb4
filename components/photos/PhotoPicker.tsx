'use client';

import { useId, useRef, useState, type ChangeEvent } from 'react';
import { PHOTO_LIMITS, PHOTO_MESSAGES } from '@/lib/photos/limits';

export interface PickedPhoto {
  id: string;
  width: number;
  height: number;
  url: string;
  thumbUrl: string;
}

const ACCEPT = 'image/jpeg,image/png,image/webp';

/**
 * Chooses photos for a question or an answer. Each choice is uploaded at once to
 * POST /api/photos; the form that owns this picker sends the ids with the post,
 * and the server attaches them when the post is saved.
 */
export function PhotoPicker({
  onChange,
  initial = [],
  max = PHOTO_LIMITS.maxFiles,
}: {
  onChange: (ids: string[]) => void;
  initial?: PickedPhoto[];
  max?: number;
}) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const [photos, setPhotos] = useState<PickedPhoto[]>(initial);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const room = max - photos.length;

  function update(next: PickedPhoto[]) {
    setPhotos(next);
    onChange(next.map((p) => p.id));
  }

  async function onPick(e: ChangeEvent<HTMLInputElement>) {
    const chosen = Array.from(e.target.files ?? []);
    e.target.value = '';
    if (chosen.length === 0) return;
    setError(null);
    if (chosen.length > room)
      return setError(`You can add ${room} more photo${room === 1 ? '' : 's'} (${max} at most).`);
    const tooBig = chosen.find((f) => f.size > PHOTO_LIMITS.maxFileBytes);
    if (tooBig) return setError(PHOTO_MESSAGES.fileTooLarge(tooBig.name));
    if (chosen.reduce((sum, f) => sum + f.size, 0) > PHOTO_LIMITS.maxTotalBytes)
      return setError(PHOTO_MESSAGES.uploadTooLarge());

    const form = new FormData();
    for (const f of chosen) form.append('photos', f);
    setBusy(true);
    try {
      const res = await fetch('/api/photos', { method: 'POST', body: form });
      const json = (await res.json().catch(() => null)) as {
        photos?: PickedPhoto[];
        error?: { message?: string };
      } | null;
      if (!res.ok || !json?.photos)
        return setError(json?.error?.message ?? `The photos could not be added (${res.status}).`);
      update([...photos, ...json.photos]);
    } catch {
      setError('Clackwater could not be reached. Check your connection and try again.');
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col gap-2" data-testid="photo-picker">
      <label htmlFor={`${id}-input`} className="block font-sans text-sm font-semibold">
        Photos (optional)
      </label>
      <p id={`${id}-hint`} className="cw-muted text-sm">
        {PHOTO_MESSAGES.hint(max)}
      </p>
      <input
        ref={input}
        id={`${id}-input`}
        type="file"
        accept={ACCEPT}
        multiple
        disabled={busy || room <= 0}
        onChange={onPick}
        aria-describedby={`${id}-hint${error ? ` ${id}-error` : ''}`}
        className="font-sans text-sm file:mr-3 file:rounded-md file:border-0 file:bg-clay file:px-3 file:py-2 file:font-semibold file:text-limestone-50 hover:file:bg-clay-600"
      />
      {busy ? (
        <p role="status" className="cw-muted text-sm">
          Uploading…
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-semibold text-clay-600 dark:text-clay-300">
          {error}
        </p>
      ) : null}
      {photos.length > 0 ? (
        <ul className="flex flex-wrap gap-3" aria-label="Photos added">
          {photos.map((p, i) => (
            <li key={p.id} className="flex flex-col items-start gap-1">
              {/* our own route serves a sized WebP already; next/image would re-encode it */}
              {/* eslint-disable-next-line @next/next/no-img-element */}
              <img
                src={p.thumbUrl}
                alt={`Photo ${i + 1} of ${photos.length}`}
                className="h-24 w-24 rounded-md border border-limestone-300 object-cover dark:border-creek-600"
              />
              <button
                type="button"
                className="cw-link text-sm"
                onClick={() => update(photos.filter((x) => x.id !== p.id))}
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
