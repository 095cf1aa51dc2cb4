'use client';

import { useId, useState, type FormEvent } from 'react';
import { FieldError, inputClass, labelClass, sendJson, type FormError } from '@/components/forms/api';
import type { PostType } from './words';

/** The author of a hidden post asks the moderators to look again; the request waits in the review queue. */
export function AppealForm({ postType, postId }: { postType: PostType; postId: number }) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const [text, setText] = useState('');
  const [busy, setBusy] = useState(false);
  const [sent, setSent] = useState(false);
  const [error, setError] = useState<FormError | null>(null);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const why = text.trim();
    if (why.length < 10)
      return setError({ field: 'text', message: 'Say why the moderators should look again (at least 10 characters).' });
    setBusy(true);
    setError(null);
    const out = await sendJson<{ id: number }>('/api/appeals', 'POST', { postType, postId, text: why });
    setBusy(false);
    if (!out.ok) return setError(out.error);
    setSent(true);
  }

  if (sent)
    return (
      <p role="status" className="font-sans text-sm font-semibold text-moss-600 dark:text-moss-300">
        Sent: a moderator will review the decision, and you will get a notice when they have.
      </p>
    );
  if (!open)
    return (
      <button type="button" className="cw-button self-start" onClick={() => setOpen(true)}>
        Ask for a review
      </button>
    );
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Ask for a review" className="flex flex-col gap-2 font-sans">
      <div>
        <label htmlFor={`${id}-text`} className={labelClass}>
          Why should the moderators look again?
        </label>
        <textarea
          id={`${id}-text`}
          value={text}
          onChange={(e) => setText(e.target.value)}
          rows={3}
          minLength={10}
          maxLength={1000}
          required
          aria-invalid={error?.field === 'text' || undefined}
          className={inputClass}
        />
        <FieldError error={error} field="text" />
      </div>
      <FieldError error={error} field="postId" />
      <FieldError error={error} />
      <button type="submit" className="cw-button self-start" disabled={busy}>
        Send to the moderators
      </button>
    </form>
  );
}
