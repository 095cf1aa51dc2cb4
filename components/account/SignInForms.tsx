'use client';

import { useState } from 'react';
import Link from 'next/link';
import { signIn } from 'next-auth/react';
import { Field } from './Field';
import { safeReturnPath } from '@/lib/auth/return-path';
import { SIGN_IN_ERRORS } from '@/lib/auth/sign-in-errors';
import { sendJson } from '@/components/forms/api';

/** "Confirm your e-mail first", with a way out: a new link, for the link lost or past its 48 hours. */
function ConfirmAgain({ email }: { email: string }) {
  const [note, setNote] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <div className="flex flex-col gap-2" data-testid="confirm-again">
      <p role="alert" className="text-sm font-semibold text-signal-700 dark:text-signal-300">
        {SIGN_IN_ERRORS.unverified}
      </p>
      {note ? (
        <p role="status" className={`text-sm ${note.ok ? 'text-moss-600 dark:text-moss-300' : 'font-semibold'}`}>
          {note.text}
        </p>
      ) : (
        <button
          type="button"
          className="cw-link self-start text-left text-sm"
          disabled={busy}
          onClick={async () => {
            setBusy(true);
            const res = await sendJson<{ message: string }>('/api/account/verify-email/resend', 'POST', { email });
            setBusy(false);
            setNote(res.ok ? { ok: true, text: res.data.message } : { ok: false, text: res.error.message });
          }}
        >
          Lost the link, or is it over 48 hours old? E-mail me a new one
        </button>
      )}
    </div>
  );
}

/** Password sign-in, and a passwordless link by e-mail. */
export function SignInForms({ callbackUrl: asked = '/' }: { callbackUrl?: string }) {
  // checked again here: whatever renders this form, the browser only ever goes to a path on this site
  const callbackUrl = safeReturnPath(asked);
  const [error, setError] = useState<string | null>(null);
  const [unconfirmed, setUnconfirmed] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [linkNote, setLinkNote] = useState<string | null>(null);
  const [linkError, setLinkError] = useState<string | undefined>();

  return (
    <div className="grid gap-6 md:grid-cols-2">
      <form
        className="cw-card flex flex-col gap-3"
        aria-label="Sign in with a password"
        onSubmit={async (e) => {
          e.preventDefault();
          const f = new FormData(e.currentTarget);
          setBusy(true);
          setError(null);
          setUnconfirmed(null);
          const email = String(f.get('email'));
          const res = await signIn('password', { email, password: String(f.get('password')), redirect: false });
          setBusy(false);
          if (res?.ok && !res.error) window.location.assign(callbackUrl);
          else if (res?.error === SIGN_IN_ERRORS.unverified) setUnconfirmed(email);
          else setError(res?.error && res.error !== 'CredentialsSignin' ? res.error : SIGN_IN_ERRORS.wrong);
        }}
      >
        <h2 className="text-lg font-semibold">With your password</h2>
        <Field id="signin-email" name="email" type="email" label="E-mail" autoComplete="email" required />
        <Field
          id="signin-password"
          name="password"
          type="password"
          label="Password"
          autoComplete="current-password"
          required
        />
        {error ? (
          <p role="alert" className="text-sm font-semibold text-signal-700 dark:text-signal-300">
            {error}
          </p>
        ) : null}
        {unconfirmed ? <ConfirmAgain key={unconfirmed} email={unconfirmed} /> : null}
        <button type="submit" className="cw-button self-start" disabled={busy}>
          Sign in
        </button>
        <p className="text-sm">
          <Link href="/reset-password" className="cw-link">
            Forgotten your password?
          </Link>{' '}
          ·{' '}
          <Link href="/sign-up" className="cw-link">
            New here? Sign up
          </Link>
        </p>
      </form>
      <form
        className="cw-card flex flex-col gap-3"
        aria-label="Sign in with an e-mailed link"
        onSubmit={async (e) => {
          e.preventDefault();
          const f = new FormData(e.currentTarget);
          setLinkError(undefined);
          const res = await signIn('email', { email: String(f.get('email')), redirect: false, callbackUrl });
          if (res?.ok && !res.error) setLinkNote('If that address has an account, a sign-in link is on its way.');
          else
            setLinkError(
              res?.error === 'EmailSignin' || !res?.error
                ? 'The link could not be sent just now; try again in a minute.'
                : res.error,
            );
        }}
      >
        <h2 className="text-lg font-semibold">With a link by e-mail</h2>
        <p className="cw-muted text-sm">No password needed: we e-mail you a link that signs you in once.</p>
        <Field
          id="link-email"
          name="email"
          type="email"
          label="E-mail"
          autoComplete="email"
          required
          error={linkError}
        />
        <button type="submit" className="cw-button self-start">
          E-mail me a link
        </button>
        {linkNote ? (
          <p role="status" className="text-sm text-moss-600 dark:text-moss-300">
            {linkNote}
          </p>
        ) : null}
      </form>
    </div>
  );
}
