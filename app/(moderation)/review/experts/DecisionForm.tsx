'use client';

import { useId, useState, type FormEvent } from 'react';
import { useRouter } from 'next/navigation';
import { FieldError, inputClass, labelClass, sendJson, type FormError } from '@/components/forms/api';

/** Approve or decline one application; the note goes to the applicant, so it is required. */
export function DecisionForm({ applicationId, applicantName }: { applicationId: number; applicantName: string }) {
  const router = useRouter();
  const noteId = useId();
  const [error, setError] = useState<FormError | null>(null);
  const [busy, setBusy] = useState(false);
  const [done, setDone] = useState<string | null>(null);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const submitter = (e.nativeEvent as SubmitEvent).submitter as HTMLButtonElement | null;
    const decision = submitter?.value === 'decline' ? 'decline' : 'approve';
    const note = String(new FormData(e.currentTarget).get('note') ?? '');
    setBusy(true);
    setError(null);
    const out = await sendJson(`/api/expert-applications/${applicationId}/decision`, 'POST', { decision, note });
    setBusy(false);
    if (!out.ok) return setError(out.error);
    setDone(
      decision === 'approve'
        ? `${applicantName} is now an expert.`
        : `The application from ${applicantName} was declined.`,
    );
    router.refresh();
  }

  if (done)
    return (
      <p role="status" className="font-sans text-sm text-moss-600 dark:text-moss-300">
        {done}
      </p>
    );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2 font-sans">
      <label htmlFor={noteId} className={labelClass}>
        Note to {applicantName} (required)
      </label>
      <textarea id={noteId} name="note" rows={3} minLength={3} maxLength={2000} required className={inputClass} />
      <FieldError error={error} field="note" />
      <FieldError error={error} field="decision" />
      <FieldError error={error} />
      <div className="flex flex-wrap gap-2">
        <button type="submit" name="decision" value="approve" className="cw-button" disabled={busy}>
          Approve
        </button>
        <button
          type="submit"
          name="decision"
          value="decline"
          disabled={busy}
          className="inline-flex items-center rounded-md border border-clay px-4 py-2 font-semibold text-clay-600 hover:bg-clay-200 disabled:opacity-50 dark:text-clay-300 dark:hover:bg-creek-800"
        >
          Decline
        </button>
      </div>
    </form>
  );
}
