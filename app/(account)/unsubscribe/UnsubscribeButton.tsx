'use client';

import { useState } from 'react';
import { sendJson, type FormError } from '@/components/forms/api';

/** Posts the signed link's parameters; the page asks first, so a link scanner that opens it changes nothing. */
export function UnsubscribeButton({ query, label }: { query: string; label: string }) {
  const [busy, setBusy] = useState(false);
  const [done, setDone] = useState<string | null>(null);
  const [error, setError] = useState<FormError | null>(null);

  async function onClick() {
    setBusy(true);
    setError(null);
    const out = await sendJson<{ message: string }>(`/api/unsubscribe?${query}`, 'POST', {});
    setBusy(false);
    if (out.ok) setDone(out.data.message);
    else setError(out.error);
  }

  if (done) {
    return (
      <p role="status" className="cw-card font-sans">
        {done}
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-2 font-sans">
      <div>
        <button type="button" className="cw-button" onClick={onClick} disabled={busy}>
          {busy ? 'Switching off…' : label}
        </button>
      </div>
      {error ? (
        <p role="alert" className="text-clay-600 dark:text-clay-300">
          {error.message}
        </p>
      ) : null}
    </div>
  );
}
