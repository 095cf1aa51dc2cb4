'use client';

import { useEffect } from 'react';

/** App-wide error boundary: plain words and a retry, never a stack trace. */
export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <div role="alert" className="cw-card mx-auto max-w-prose">
      <h1 className="font-serif text-2xl font-semibold">Something went wrong</h1>
      <p className="cw-muted mt-2">
        This page could not be shown. If the database is restarting it will be back in a minute; nothing you sent has
        been lost.
      </p>
      {error.digest ? <p className="cw-muted mt-2 text-xs">Reference: {error.digest}</p> : null}
      <button type="button" onClick={reset} className="cw-button mt-4">
        Try again
      </button>
    </div>
  );
}
