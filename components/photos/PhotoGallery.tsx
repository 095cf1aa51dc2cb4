'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import { FlagButton } from '@/components/moderation/FlagButton';

export interface GalleryPhoto {
  id: string;
  alt?: string | null;
  width?: number;
  height?: number;
  /** the number a flag names; without it the photo cannot be flagged */
  ref?: number;
  /** shown to moderators only: the photo is hidden or deleted for readers */
  hidden?: boolean;
}

const thumbUrl = (id: string) => `/api/photos/${id}/thumb`;
const webUrl = (id: string) => `/api/photos/${id}`;

/**
 * A post's photos as thumbnails; each opens a viewer with the web-size copy. The
 * viewer is a native modal <dialog>: it keeps focus inside, closes on Esc and
 * returns focus to the thumbnail. Arrow keys and buttons step through the photos.
 */
export function PhotoGallery({
  photos,
  label = 'Photos',
  canFlag = false,
}: {
  photos: GalleryPhoto[];
  label?: string;
  canFlag?: boolean;
}) {
  const dialog = useRef<HTMLDialogElement>(null);
  const [open, setOpen] = useState<number | null>(null);
  const count = photos.length;

  const show = (i: number) => {
    setOpen(i);
    if (!dialog.current?.open) dialog.current?.showModal();
  };
  const step = useCallback((by: number) => setOpen((i) => (i === null ? i : (i + by + count) % count)), [count]);

  useEffect(() => {
    const d = dialog.current;
    if (!d) return;
    const onClose = () => setOpen(null);
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'ArrowRight') step(1);
      if (e.key === 'ArrowLeft') step(-1);
    };
    d.addEventListener('close', onClose);
    d.addEventListener('keydown', onKey);
    return () => {
      d.removeEventListener('close', onClose);
      d.removeEventListener('keydown', onKey);
    };
  }, [step]);

  if (count === 0) return null;
  const current = open === null ? null : photos[open];
  const describe = (p: GalleryPhoto, i: number) => p.alt || `Photo ${i + 1} of ${count}`;

  return (
    <section aria-label={label} className="mt-3">
      <ul className="flex flex-wrap gap-2">
        {photos.map((p, i) => (
          <li key={p.id}>
            <button
              type="button"
              onClick={() => show(i)}
              className="block rounded-md border border-limestone-300 hover:border-clay dark:border-creek-600"
              aria-label={`Open ${describe(p, i)}`}
            >
              {/* our own route serves a sized WebP already; next/image would re-encode it */}
              {/* eslint-disable-next-line @next/next/no-img-element */}
              <img
                src={thumbUrl(p.id)}
                alt=""
                loading="lazy"
                className={`h-24 w-24 rounded-md object-cover ${p.hidden ? 'opacity-50' : ''}`}
              />
            </button>
            {p.hidden ? <span className="block text-center font-sans text-xs font-semibold">hidden</span> : null}
          </li>
        ))}
      </ul>
      <dialog
        ref={dialog}
        aria-label={current && open !== null ? describe(current, open) : label}
        className="cw-card m-auto max-h-[95vh] max-w-[95vw] p-3 text-creek backdrop:bg-creek-950/80 dark:text-limestone-100"
      >
        {current && open !== null ? (
          <figure className="flex flex-col gap-2">
            {/* eslint-disable-next-line @next/next/no-img-element */}
            <img
              src={webUrl(current.id)}
              alt={describe(current, open)}
              width={current.width}
              height={current.height}
              className="max-h-[75vh] w-auto max-w-full rounded-md object-contain"
            />
            <figcaption className="flex flex-wrap items-center justify-between gap-2 font-sans text-sm">
              <span className="cw-num" aria-live="polite">
                {current.alt ? `${current.alt} — ` : ''}
                {open + 1} of {count}
              </span>
              <span className="flex flex-wrap items-start gap-2">
                {canFlag && current.ref ? <FlagButton key={current.id} postType="photo" postId={current.ref} /> : null}
                {count > 1 ? (
                  <>
                    <button type="button" className="cw-button" onClick={() => step(-1)}>
                      Previous
                    </button>
                    <button type="button" className="cw-button" onClick={() => step(1)}>
                      Next
                    </button>
                  </>
                ) : null}
                <button type="button" className="cw-button" onClick={() => dialog.current?.close()} autoFocus>
                  Close
                </button>
              </span>
            </figcaption>
          </figure>
        ) : null}
      </dialog>
    </section>
  );
}
