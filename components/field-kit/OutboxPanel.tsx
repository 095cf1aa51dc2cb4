'use client';

import Link from 'next/link';
import { useCallback, useEffect, useState } from 'react';
import { discard, flush, pending, revise, type OutboxRecord } from '@/lib/offline/outbox';
import { formatDateTime } from '@/lib/dates';
import { KeptThumb } from '@/components/field-log/KeptPhotos';

/**
 * What this phone still has to send: each record waiting (with a "send now"), or refused
 * with the server's reason for the member to fix. It sends by itself when the phone comes
 * back online and when the page opens.
 */
/** Where to come back to after signing in: this page. */
const here = () => (typeof window === 'undefined' ? '/field-kit' : window.location.pathname);

export function OutboxPanel() {
  const [records, setRecords] = useState<OutboxRecord[] | null>(null);
  const [busy, setBusy] = useState(false);
  const [sent, setSent] = useState<{ label: string; url?: string }[]>([]);

  const refresh = useCallback(async () => setRecords(await pending()), []);
  const send = useCallback(async () => {
    setBusy(true);
    try {
      const out = await flush();
      if (out.sent.length)
        setSent((s) => [
          ...s,
          ...out.sent.map((x) => ({ label: x.record.label, url: (x.response as { url?: string } | null)?.url })),
        ]);
    } finally {
      setBusy(false);
      await refresh();
    }
  }, [refresh]);

  useEffect(() => {
    // the first look sends what waits, as a phone back in signal would
    const first = setTimeout(() => void (navigator.onLine ? send() : refresh()), 0);
    const online = () => void send();
    window.addEventListener('online', online);
    return () => {
      clearTimeout(first);
      window.removeEventListener('online', online);
    };
  }, [send, refresh]);

  if (records === null) return null;
  return (
    <section aria-labelledby="outbox-h" className="cw-card flex flex-col gap-2 font-sans" data-testid="outbox">
      <h2 id="outbox-h" className="font-serif text-xl font-semibold">
        On this phone, not yet sent
      </h2>
      {records.length === 0 ? <p className="cw-muted text-sm">Nothing waiting: everything has been sent.</p> : null}
      <ul className="flex flex-col gap-2">
        {records.map((r) => (
          <li
            key={r.id}
            className="flex flex-col gap-1 border-b border-limestone-300 pb-2 dark:border-creek-600"
            data-state={r.state}
          >
            <span className="font-semibold">{r.label}</span>
            <span className="cw-muted text-xs">Made {formatDateTime(new Date(r.createdAt).toISOString())}</span>
            {r.photos?.length ? (
              <ul className="flex flex-wrap gap-2" aria-label={`Photos kept with ${r.label}`}>
                {r.photos.map((p, i) => (
                  <li key={p.key}>
                    <KeptThumb
                      photo={p}
                      alt={`Photo ${i + 1}: ${p.name}`}
                      className="h-16 w-16 rounded-md border border-limestone-300 object-cover dark:border-creek-600"
                    />
                  </li>
                ))}
              </ul>
            ) : null}
            {r.state === 'waiting' ? (
              <span className="text-sm">Waiting to send{r.attempts > 0 ? ` (tried ${r.attempts} times)` : ''}.</span>
            ) : r.error?.status === 401 ? (
              // the session ended before the signal came back: nothing is wrong with the record
              <span role="alert" className="text-sm text-signal-700 dark:text-signal-300">
                Not sent: you were signed out before it could go. It stays on this phone;{' '}
                <Link href={`/sign-in?callbackUrl=${encodeURIComponent(here())}`} className="cw-link">
                  sign in
                </Link>{' '}
                and send it again.
              </span>
            ) : (
              <span role="alert" className="text-sm text-signal-700 dark:text-signal-300">
                Not accepted: {r.error?.message} It stays on this phone until you let it go; record it again with that
                put right.
              </span>
            )}
            {r.state === 'refused' && r.error?.status === 401 ? (
              <button
                type="button"
                disabled={busy}
                className="cw-link min-h-9 self-start"
                onClick={() => void revise(r.id, r.body).then(send)}
              >
                Send it again<span className="sr-only">: {r.label}</span>
              </button>
            ) : null}
            {r.state === 'refused' ? (
              <button
                type="button"
                className="cw-link min-h-9 self-start"
                onClick={() => void discard(r.id).then(refresh)}
              >
                Let it go<span className="sr-only">: {r.label}</span>
              </button>
            ) : null}
          </li>
        ))}
      </ul>
      {records.some((r) => r.state === 'waiting') ? (
        <button
          type="button"
          disabled={busy}
          onClick={() => void send()}
          className="min-h-9 self-start rounded-md bg-clay-700 px-3 py-1.5 font-semibold text-limestone-50 hover:bg-clay-800 disabled:opacity-50 dark:bg-clay-300 dark:text-creek-950"
        >
          {busy ? 'Sending…' : 'Send now'}
        </button>
      ) : null}
      {sent.length ? (
        <p className="text-sm text-moss-700 dark:text-moss-300" aria-live="polite">
          Sent:{' '}
          {sent.map((s, i) => (
            <span key={i}>
              {i > 0 ? ', ' : ''}
              {s.url ? (
                <Link href={s.url} className="cw-link">
                  {s.label}
                </Link>
              ) : (
                s.label
              )}
            </span>
          ))}
          .
        </p>
      ) : null}
    </section>
  );
}
