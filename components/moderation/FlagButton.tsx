'use client';

import { useId, useState, type FormEvent } from 'react';
import { FieldError, sendJson, type FormError } from '@/components/forms/api';
import { FLAG_REASON_WORDS, type FlagReason, type PostType } from './words';

const REASONS = Object.keys(FLAG_REASON_WORDS) as FlagReason[];

/**
 * "Flag" beside a post: opens a small form asking why, then sends it to the review
 * queue. A note is required only for "other" — the other reasons say enough.
 */
export function FlagButton({
  postType,
  postId,
  onFlagged,
}: {
  postType: PostType;
  postId: number;
  onFlagged?: () => void;
}) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState<FlagReason | null>(null);
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<FormError | null>(null);
  const [done, setDone] = useState(false);

  if (done)
    return (
      <span role="status" className="text-xs font-semibold text-moss-600 dark:text-moss-300">
        Flagged — a moderator will look at it
      </span>
    );
  if (!open)
    return (
      <button type="button" className="cw-link text-xs" aria-expanded={false} onClick={() => setOpen(true)}>
        Flag
      </button>
    );

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    if (!reason) return setError({ field: 'reason', message: 'Choose why you are flagging this post.' });
    const trimmed = note.trim();
    if (reason === 'other' && trimmed.length < 3)
      return setError({ field: 'note', message: 'Say what is wrong (at least 3 characters).' });
    setBusy(true);
    setError(null);
    const out = await sendJson<{ flagId: number; hidden: boolean }>('/api/flags', 'POST', {
      postType,
      postId,
      reason,
      ...(trimmed ? { note: trimmed } : {}),
    });
    setBusy(false);
    if (!out.ok) return setError(out.error);
    setDone(true);
    onFlagged?.();
  }

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={`Flag this ${postType}`}
      className="mt-2 flex w-full flex-col gap-2 rounded-md border border-limestone-300 p-3 font-sans text-sm dark:border-creek-600"
    >
      <fieldset className="flex flex-col gap-1">
        <legend className="font-semibold">Why should a moderator look at this {postType}?</legend>
        {REASONS.map((r) => (
          <label key={r} className="flex items-center gap-2">
            <input type="radio" name={`${id}-reason`} value={r} checked={reason === r} onChange={() => setReason(r)} />
            {FLAG_REASON_WORDS[r]}
          </label>
        ))}
      </fieldset>
      <FieldError error={error} field="reason" />
      <label htmlFor={`${id}-note`} className="font-semibold">
        Note for the moderator {reason === 'other' ? '(required)' : '(optional)'}
      </label>
      <textarea
        id={`${id}-note`}
        value={note}
        onChange={(e) => setNote(e.target.value)}
        rows={2}
        maxLength={1000}
        required={reason === 'other'}
        className="rounded-md border border-limestone-400 bg-limestone-50 p-2 dark:bg-creek-950"
      />
      <FieldError error={error} field="note" />
      <FieldError error={error} />
      <span className="flex gap-2">
        <button type="submit" className="cw-button text-sm" disabled={busy}>
          Send flag
        </button>
        <button type="button" className="cw-link text-sm" onClick={() => setOpen(false)}>
          Cancel
        </button>
      </span>
    </form>
  );
}
