'use client';

import { useEffect, useRef, useState } from 'react';
import Link from 'next/link';
import { sendJson } from '@/components/forms/api';

/**
 * The page an e-mailed link opens. The token is used by a POST from the page, not
 * by the GET itself, so a mail scanner that prefetches links cannot spend it.
 */
export function TokenAction({ token }: { token: string }) {
  const [state, setState] = useState<{ ok: boolean; message: string } | null>(null);
  const started = useRef(false);
  useEffect(() => {
    if (started.current) return;
    started.current = true;
    void (async () => {
      const res = await sendJson<{ message: string }>('/api/account/verify-email', 'POST', { token });
      setState(res.ok ? { ok: true, message: res.data.message } : { ok: false, message: res.error.message });
    })();
  }, [token]);
  if (!state) return <p role="status">Confirming your e-mail…</p>;
  return (
    <div role={state.ok ? 'status' : 'alert'} className="cw-card max-w-prose">
      <p className="font-semibold">{state.message}</p>
      <p className="mt-3">
        <Link href="/sign-in" className="cw-link">
          {state.ok ? 'Sign in' : 'Back to sign in'}
        </Link>
      </p>
    </div>
  );
}
