'use client';

import Link from 'next/link';
import { useCallback, useEffect, useState } from 'react';
import { discard, flush, pending, revise, type OutboxKind, type OutboxRecord } from '@/lib/offline/outbox';
import { formatDateTime } from '@/lib/dates';
import { KeptThumb } from '@/components/field-log/KeptPhotos';

/** What each kind of record is called in the list. */
export const KIND_WORDS: Record<OutboxKind, string> = {
  'field-log': 'Field log test',
  site: 'New site',
  'site-version': 'Changed survey',
  question: 'Question',
};

/** The server's reason as a sentence (its messages may end without a full stop). */
const sentence = (m: string) => (/[.!?]$/.test(m.trim()) ? m.trim() : `${m.trim()}.`);
/** Where to come back to after signing in: this page. */
const here = () => (typeof window === 'undefined' ? '/field-kit' : window.location.pathname);
const tried = (n: number) => (n === 0 ? '' : n === 1 ? ' (tried once)' : ` (tried ${n} times)`);

/**
 * What this phone still has to send, of every kind (or of the kinds a page is about):
 * each record waiting, with "Send now", or refused with the server's reason and a way to
 * put it right (a record refused only because the member was signed out is sent again
 * after signing in), with the photos kept with it. It sends by itself when the phone comes
 * back online and when it opens. The one panel for every page that keeps records.
 */
export function OutboxPanel({
  kinds,
  title = 'On this phone, not yet sent',
}: {
  kinds?: OutboxKind[];
  title?: string;
}) {
  const [records, setRecords] = useState<OutboxRecord[] | null>(null);
  const [busy, setBusy] = useState(false);
  const [sent, setSent] = useState<{ label: string; url?: string }[]>([]);
  const kindsKey = kinds?.join(',') ?? '';

  const refresh = useCallback(async () => {
    const all = await pending();
    setRecords(kindsKey ? all.filter((r) => kindsKey.split(',').includes(r.kind)) : all);
  }, [kindsKey]);
  const send = useCallback(async () => {
    setBusy(true);
    try {
      const out = await flush();
      if (out.sent.length)
        setSent((s) => [
          ...s,
          ...out.sent.map((x) => ({ label: x.record.label, url: (x.response as { url?: string } | null)?.url })),
        ]);
    } catch {
      // the device's storage failed: what it holds stays for the next try
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
    <section aria-labelledby="outbox-all-h" className="cw-card flex flex-col gap-2 font-sans" data-testid="outbox">
      <h2 id="outbox-all-h" className="font-serif text-xl font-semibold">
        {title}
      </h2>
      {records.length === 0 ? <p className="cw-muted text-sm">Nothing waiting: everything has been sent.</p> : null}
      <ul className="flex flex-col gap-2">
        {records.map((r) => (
          <li
            key={r.id}
            className="flex flex-col gap-1 border-b border-limestone-300 pb-2 dark:border-creek-600"
            data-state={r.state}
            data-kind={r.kind}
          >
            <span className="cw-muted text-xs font-semibold tracking-wide uppercase">{KIND_WORDS[r.kind]}</span>
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
              <span className="text-sm">Waiting to send{tried(r.attempts)}.</span>
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
                Not accepted: {sentence(r.error?.message ?? '')}{' '}
                {r.fixAt
                  ? 'It stays on this phone until you put it right or let it go.'
                  : 'It stays on this phone until you let it go; make it again with that put right.'}
              </span>
            )}
            {r.state === 'refused' ? (
              <span className="flex flex-wrap gap-x-4">
                {r.error?.status === 401 ? (
                  <button
                    type="button"
                    disabled={busy}
                    className="cw-link min-h-9 self-start"
                    onClick={() => void revise(r.id, r.body).then(send)}
                  >
                    Send it again<span className="sr-only">: {r.label}</span>
                  </button>
                ) : null}
                {r.fixAt && r.error?.status !== 401 ? (
                  // a full load: the form may be the page already open, still showing "kept"
                  <a href={r.fixAt} className="cw-link inline-flex min-h-9 items-center">
                    Put it right<span className="sr-only">: {r.label}</span>
                  </a>
                ) : null}
                <button
                  type="button"
                  className="cw-link min-h-9 self-start"
                  onClick={() => void discard(r.id).then(refresh)}
                >
                  Let it go<span className="sr-only">: {r.label}</span>
                </button>
              </span>
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
          {busy ? 'Sending…' : records.some((r) => r.attempts > 0) ? 'Try again now' : 'Send now'}
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
