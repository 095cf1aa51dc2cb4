'use client';

import { useEffect, useRef, useState } from 'react';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { signIn } from 'next-auth/react';
import { postJson } from './Field';

/**
 * The page an e-mailed link opens. The token is used by a POST from the page, not
 * by the GET itself, so a mail scanner that prefetches links cannot spend it.
 */
export function TokenAction({ token, kind }: { token: string; kind: 'verify' | 'sign-in' }) {
  const [state, setState] = useState<{ ok: boolean; message: string } | null>(null);
  const started = useRef(false);
  const router = useRouter();
  useEffect(() => {
    if (started.current) return;
    started.current = true;
    void (async () => {
      if (kind === 'verify') {
        const res = await postJson('/api/account/verify-email', { token });
        setState({ ok: res.status === 200, message: res.body.message ?? res.body.error?.message ?? 'That did not work.' });
      } else {
        const res = await signIn('link', { token, redirect: false });
        if (res?.ok && !res.error) {
          router.push('/');
          router.refresh();
        }
        else setState({ ok: false, message: res?.error ?? 'This link is not valid.' });
      }
    })();
  }, [token, kind, router]);
  if (!state) return <p role="status">{kind === 'verify' ? 'Confirming your e-mail…' : 'Signing you in…'}</p>;
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
