'use client';

import { useState } from 'react';
import { signOut } from 'next-auth/react';

/** Ends every session of the account, this browser's too (a lost phone, a shared computer). */
export function SignOutEverywhere() {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <section aria-labelledby="sessions" className="flex flex-col gap-2 font-sans">
      <h2 id="sessions" className="font-serif text-xl font-semibold">
        Sessions
      </h2>
      <p className="text-sm">
        Signed in on a computer you no longer use, or lost a phone? This signs your account out on every device, this
        one included.
      </p>
      <button
        type="button"
        className="cw-button self-start"
        disabled={busy}
        onClick={async () => {
          setBusy(true);
          setError(null);
          const res = await fetch('/api/account/sign-out-everywhere', {
            method: 'POST',
            headers: { 'content-type': 'application/json' },
            body: '{}',
          }).catch(() => null);
          if (res?.ok) {
            await signOut({ callbackUrl: '/sign-in' });
            return;
          }
          setBusy(false);
          setError(
            ((await res?.json().catch(() => null)) as { error?: { message?: string } } | null)?.error?.message ??
              'That did not work just now; try again in a minute.',
          );
        }}
      >
        Sign out everywhere
      </button>
      {error ? (
        <p role="alert" className="text-sm font-semibold text-signal-700 dark:text-signal-300">
          {error}
        </p>
      ) : null}
    </section>
  );
}
