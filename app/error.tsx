'use client';

import { useEffect, useState } from 'react';
import { ServiceUnavailable } from '@/components/ServiceUnavailable';
import { sendJson } from '@/components/forms/api';

/**
 * App-wide error boundary: plain words and a retry, never a stack trace. Pages let a
 * database outage throw and this is the one place it is shown. A production build
 * hands a boundary only the error's digest, never its message, so the boundary asks
 * /api/health whether the database answers: 503 means the outage page. "Try again"
 * fetches the page afresh (`retry`), not just the boundary's children.
 */
export default function ErrorPage({ error, retry }: { error: Error & { digest?: string }; retry: () => void }) {
  const [database, setDatabase] = useState<'checking' | 'up' | 'down'>('checking');
  useEffect(() => {
    console.error(error);
    let live = true;
    sendJson('/api/health', 'GET').then((r) => live && setDatabase(r.status === 503 ? 'down' : 'up'));
    return () => {
      live = false;
    };
  }, [error]);

  if (database === 'checking')
    return (
      <p className="cw-muted" aria-busy="true">
        Loading…
      </p>
    );
  return (
    <div className="mx-auto flex max-w-prose flex-col gap-4">
      {database === 'down' ? (
        <ServiceUnavailable />
      ) : (
        <div role="alert" className="cw-card">
          <h1 className="font-serif text-2xl font-semibold">Something went wrong</h1>
          <p className="cw-muted mt-2">This page could not be shown. Nothing you sent has been lost.</p>
          {error.digest ? <p className="cw-muted mt-2 text-xs">Reference: {error.digest}</p> : null}
        </div>
      )}
      <button type="button" onClick={() => retry()} className="cw-button self-start">
        Try again
      </button>
    </div>
  );
}
