'use client';

import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { FieldError, inputClass, labelClass, sendJson, type FormError } from '@/components/forms/api';

/** Links this entry as the "after" of an earlier one on the same site, then opens the comparison. */
export function LinkForm({ entryId, candidates }: { entryId: number; candidates: { id: number; label: string }[] }) {
  const router = useRouter();
  const [beforeId, setBeforeId] = useState(candidates[0]?.id ?? 0);
  const [whatChanged, setWhatChanged] = useState('');
  const [error, setError] = useState<FormError | null>(null);
  const [busy, setBusy] = useState(false);
  if (candidates.length === 0)
    return <p className="cw-muted font-sans text-sm">No other entry of yours on this site to compare with yet.</p>;
  return (
    <form
      className="flex flex-col gap-3 font-sans"
      aria-label="Link as the after of an earlier test"
      onSubmit={async (ev) => {
        ev.preventDefault();
        setBusy(true);
        const out = await sendJson<{ url: string }>(`/api/field-log/${entryId}/link`, 'POST', {
          beforeId,
          whatChanged,
        });
        setBusy(false);
        if (out.ok) router.push(out.data.url);
        else setError(out.error);
      }}
    >
      <label className={labelClass}>
        Before (an earlier test on this site)
        <select
          className={inputClass}
          value={beforeId}
          onChange={(e) => setBeforeId(Number(e.target.value))}
          name="beforeId"
        >
          {candidates.map((c) => (
            <option key={c.id} value={c.id}>
              {c.label}
            </option>
          ))}
        </select>
      </label>
      <FieldError error={error} field="beforeId" />
      <label className={labelClass}>
        What changed
        <input
          className={inputClass}
          name="whatChanged"
          value={whatChanged}
          onChange={(e) => setWhatChanged(e.target.value)}
          placeholder="e.g. a second pump in parallel"
        />
      </label>
      <FieldError error={error} field="whatChanged" />
      <FieldError error={error} />
      <button type="submit" className="cw-button self-start" disabled={busy}>
        Link and compare
      </button>
    </form>
  );
}
