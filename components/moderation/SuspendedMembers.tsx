'use client';

import { useId, useState, type FormEvent } from 'react';
import useSWR from 'swr';
import { FieldError, inputClass, labelClass, sendJson, type FormError } from '@/components/forms/api';
import { formatDate } from '@/lib/dates';

export interface SuspendedView {
  id: number;
  handle: string;
  displayName: string;
  role: string;
  until: string;
  reason: string | null;
}

async function fetcher(url: string): Promise<{ items: SuspendedView[] }> {
  const res = await fetch(url);
  const json = await res.json().catch(() => null);
  if (!res.ok) throw new Error(json?.error?.message ?? `The suspended accounts could not be loaded (${res.status}).`);
  return json;
}

const day = formatDate;

/** One suspended account and the form that lifts its suspension, with the reason the member will read. */
function LiftForm({ member, onDone }: { member: SuspendedView; onDone: (message: string) => void }) {
  const id = useId();
  const [reason, setReason] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<FormError | null>(null);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const why = reason.trim();
    if (why.length < 3)
      return setError({ field: 'reason', message: 'Lifting a suspension needs a reason (at least 3 characters).' });
    setBusy(true);
    setError(null);
    const out = await sendJson<{ auditId: number }>(`/api/review/suspensions/${member.id}/lift`, 'POST', {
      reason: why,
    });
    setBusy(false);
    if (!out.ok) return setError(out.error);
    setReason('');
    onDone(`${member.displayName} can write again. They get a notice with your reason, and the audit log has it.`);
  }

  return (
    <li className="cw-card flex flex-col gap-2 font-sans text-sm">
      <p>
        <span className="font-semibold">{member.displayName}</span> <span className="cw-muted">@{member.handle}</span>,
        suspended until <span className="cw-num">{day(member.until)}</span>
        {member.reason ? <> — “{member.reason}”</> : null}
      </p>
      <form
        onSubmit={onSubmit}
        noValidate
        aria-label={`Lift the suspension of ${member.displayName}`}
        className="flex flex-col gap-2"
      >
        <div>
          <label htmlFor={`${id}-reason`} className={labelClass}>
            Reason for lifting it
          </label>
          <input
            id={`${id}-reason`}
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            minLength={3}
            maxLength={1000}
            required
            className={inputClass}
          />
          <FieldError error={error} field="reason" />
        </div>
        <FieldError error={error} />
        <button type="submit" className="cw-button self-start" disabled={busy}>
          Lift suspension
        </button>
      </form>
    </li>
  );
}

/** The accounts suspended now, soonest end first; a moderator may lift a suspension early. */
export function SuspendedMembers() {
  const { data, error, mutate } = useSWR('/api/review/suspensions', fetcher, { revalidateOnFocus: false });
  const [lastDone, setLastDone] = useState<string | null>(null);
  return (
    <section aria-labelledby="suspended-heading" className="flex flex-col gap-3">
      <h2 id="suspended-heading" className="font-serif text-2xl font-semibold">
        Suspended accounts
      </h2>
      {lastDone ? (
        <p role="status" className="font-sans text-sm font-semibold text-moss-600 dark:text-moss-300">
          {lastDone}
        </p>
      ) : null}
      {error ? (
        <p role="alert" className="cw-card font-sans text-sm">
          {(error as Error).message}
        </p>
      ) : !data ? (
        <p className="cw-muted font-sans text-sm">Loading the suspended accounts…</p>
      ) : data.items.length === 0 ? (
        <p className="cw-muted font-sans text-sm">No account is suspended.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {data.items.map((m) => (
            <LiftForm
              key={m.id}
              member={m}
              onDone={(message) => {
                setLastDone(message);
                void mutate();
              }}
            />
          ))}
        </ul>
      )}
    </section>
  );
}
