'use client';

import { useState } from 'react';
import Link from 'next/link';
import { Field } from './Field';
import { sendJson } from '@/components/forms/api';

export function ResetRequestForm() {
  const [note, setNote] = useState<string | null>(null);
  const [error, setError] = useState<string | undefined>();
  return (
    <form
      className="cw-card flex max-w-md flex-col gap-3"
      aria-label="Reset password"
      onSubmit={async (e) => {
        e.preventDefault();
        const res = await sendJson<{ message: string }>('/api/account/password-reset', 'POST', {
          email: String(new FormData(e.currentTarget).get('email')),
        });
        if (res.ok) setNote(res.data.message);
        else setError(res.error.message);
      }}
    >
      <Field id="reset-email" name="email" type="email" label="E-mail" autoComplete="email" required error={error} />
      <button type="submit" className="cw-button self-start">
        E-mail me a reset link
      </button>
      {note ? (
        <p role="status" className="text-sm text-moss-600 dark:text-moss-300">
          {note}
        </p>
      ) : null}
    </form>
  );
}

export function NewPasswordForm({ token }: { token: string }) {
  const [result, setResult] = useState<{ ok: boolean; message: string; field?: string } | null>(null);
  if (result?.ok) {
    return (
      <div role="status" className="cw-card">
        <p className="font-semibold">{result.message}</p>
        <Link href="/sign-in" className="cw-link mt-2 inline-block">
          Sign in
        </Link>
      </div>
    );
  }
  return (
    <form
      className="cw-card flex max-w-md flex-col gap-3"
      aria-label="Choose a new password"
      onSubmit={async (e) => {
        e.preventDefault();
        const res = await sendJson<{ message: string }>('/api/account/password-reset/confirm', 'POST', {
          token,
          password: String(new FormData(e.currentTarget).get('password')),
        });
        setResult(
          res.ok
            ? { ok: true, message: res.data.message }
            : { ok: false, message: res.error.message, field: res.error.field },
        );
      }}
    >
      <Field
        id="new-password"
        name="password"
        type="password"
        label="New password (10 characters or more)"
        autoComplete="new-password"
        required
        error={result && result.field === 'password' ? result.message : undefined}
      />
      {result && result.field !== 'password' ? (
        <p role="alert" className="text-sm font-semibold text-signal-700 dark:text-signal-300">
          {result.message}{' '}
          <Link href="/reset-password" className="cw-link">
            Ask for a new link
          </Link>
        </p>
      ) : null}
      <button type="submit" className="cw-button self-start">
        Save the new password
      </button>
    </form>
  );
}
