'use client';

import { useState } from 'react';
import { Field } from './Field';
import { sendJson } from '@/components/forms/api';
import { HANDLE_RULE, signUpSchema } from '@/lib/validation/account';

export function SignUpForm() {
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  if (done) {
    return (
      <div role="status" className="cw-card">
        <p className="font-semibold">{done}</p>
        <p className="cw-muted mt-2 text-sm">The link works once and lasts 48 hours. Then sign in.</p>
      </div>
    );
  }
  return (
    <form
      className="cw-card flex max-w-md flex-col gap-3"
      aria-label="Sign up"
      onSubmit={async (e) => {
        e.preventDefault();
        const f = new FormData(e.currentTarget);
        // the handle's rule in our words before anything is sent, not the browser's "match the requested format"
        const handle = signUpSchema.shape.handle.safeParse(String(f.get('handle') ?? ''));
        if (!handle.success) {
          setErrors({ handle: handle.error.issues[0]?.message ?? HANDLE_RULE });
          e.currentTarget.querySelector<HTMLInputElement>('#signup-handle')?.focus();
          return;
        }
        setBusy(true);
        const res = await sendJson<{ message: string; note?: string }>(
          '/api/account/sign-up',
          'POST',
          Object.fromEntries(['email', 'password', 'handle', 'displayName'].map((k) => [k, String(f.get(k) ?? '')])),
        );
        setBusy(false);
        if (res.ok) setDone([res.data.message, res.data.note].filter(Boolean).join(' '));
        else setErrors({ [res.error.field ?? 'form']: res.error.message });
      }}
    >
      <Field
        id="signup-email"
        name="email"
        type="email"
        label="E-mail"
        autoComplete="email"
        required
        error={errors.email}
      />
      <Field
        id="signup-handle"
        name="handle"
        label="Handle (public, on your posts)"
        hint={HANDLE_RULE}
        autoComplete="username"
        autoCapitalize="none"
        spellCheck={false}
        required
        error={errors.handle}
        onChange={() => (errors.handle ? setErrors((all) => ({ ...all, handle: '' })) : undefined)}
      />
      <Field
        id="signup-name"
        name="displayName"
        label="Display name"
        autoComplete="nickname"
        required
        error={errors.displayName}
      />
      <Field
        id="signup-password"
        name="password"
        type="password"
        label="Password (10 characters or more)"
        autoComplete="new-password"
        required
        error={errors.password}
      />
      {errors.form ? (
        <p role="alert" className="text-sm font-semibold text-signal-700 dark:text-signal-300">
          {errors.form}
        </p>
      ) : null}
      <button type="submit" className="cw-button self-start" disabled={busy}>
        Sign up
      </button>
    </form>
  );
}
