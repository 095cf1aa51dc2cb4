'use client';

import { useState } from 'react';
import { sendJson, type FormError } from '@/components/forms/api';

const ROLE_OPTIONS = ['member', 'expert', 'moderator', 'admin'] as const;
type RoleOption = (typeof ROLE_OPTIONS)[number];

/** One member's role: saved as soon as it is picked, put back if the server refuses. */
export function RolePicker({ userId, handle, role }: { userId: number; handle: string; role: RoleOption }) {
  const [current, setCurrent] = useState<RoleOption>(role);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<FormError | null>(null);
  const [saved, setSaved] = useState(false);

  async function pick(next: RoleOption) {
    const before = current;
    setCurrent(next);
    setBusy(true);
    setError(null);
    setSaved(false);
    const out = await sendJson(`/api/admin/users/${userId}/role`, 'PUT', { role: next });
    setBusy(false);
    if (out.ok) setSaved(true);
    else {
      setCurrent(before);
      setError(out.error);
    }
  }

  return (
    <div className="font-sans">
      <label className="sr-only" htmlFor={`role-${userId}`}>
        Role of {handle}
      </label>
      <select
        id={`role-${userId}`}
        value={current}
        disabled={busy}
        onChange={(e) => pick(e.target.value as RoleOption)}
        className="rounded-md border border-limestone-400 bg-limestone-50 px-2 py-1 dark:border-creek-500 dark:bg-creek-950"
      >
        {ROLE_OPTIONS.map((r) => (
          <option key={r} value={r}>
            {r}
          </option>
        ))}
      </select>
      {saved ? (
        <span className="ml-2 text-sm text-moss-600 dark:text-moss-300" role="status">
          saved
        </span>
      ) : null}
      {error ? (
        <p role="alert" className="mt-1 text-sm font-semibold text-clay-600 dark:text-clay-300">
          {error.message}
        </p>
      ) : null}
    </div>
  );
}
