'use client';

import { useId, useState, type FormEvent } from 'react';
import { FieldError, inputClass, labelClass, sendJson, type FormError } from '@/components/forms/api';

/**
 * An expert's safety check on the guide as it reads now. Only the verdict and
 * notes are sent: the server ties the check to the file's current hash itself.
 */
export function RecordSafetyCheck({ slug, onRecorded }: { slug: string; onRecorded: () => void | Promise<unknown> }) {
  const id = useId();
  const [error, setError] = useState<FormError | null>(null);
  const [busy, setBusy] = useState(false);
  const [done, setDone] = useState(false);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const f = new FormData(form);
    setBusy(true);
    setError(null);
    setDone(false);
    const out = await sendJson(`/api/guides/${slug}/safety-checks`, 'POST', {
      verdict: f.get('verdict'),
      notes: String(f.get('notes') ?? ''),
    });
    setBusy(false);
    if (!out.ok) return setError(out.error);
    form.reset();
    setDone(true);
    await onRecorded();
  }

  return (
    <details className="mt-3" data-testid="record-safety-check">
      <summary className="cw-link cursor-pointer">Record a safety check</summary>
      <form onSubmit={onSubmit} noValidate className="cw-card mt-2 flex flex-col gap-3">
        <p className="cw-muted">
          Your check applies to this guide exactly as it reads now; an edit later marks it as changed.
        </p>
        <fieldset>
          <legend className={labelClass}>Verdict</legend>
          <div className="mt-1 flex flex-wrap gap-4">
            <label className="flex items-center gap-2">
              <input type="radio" name="verdict" value="sound" required /> Sound
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" name="verdict" value="needs changes" /> Needs changes
            </label>
          </div>
          <FieldError error={error} field="verdict" />
        </fieldset>
        <div>
          <label htmlFor={`${id}-notes`} className={labelClass}>
            Notes (optional)
          </label>
          <textarea id={`${id}-notes`} name="notes" rows={4} maxLength={4000} className={inputClass} />
          <FieldError error={error} field="notes" />
        </div>
        <FieldError error={error} />
        <div className="flex items-center gap-3">
          <button type="submit" className="cw-button" disabled={busy}>
            {busy ? 'Recording…' : 'Record safety check'}
          </button>
          {done ? (
            <span role="status" className="text-moss-600 dark:text-moss-300">
              Recorded.
            </span>
          ) : null}
        </div>
      </form>
    </details>
  );
}
