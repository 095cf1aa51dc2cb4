'use client';

import { useContext, useState } from 'react';
import Link from 'next/link';
import { SessionContext } from 'next-auth/react';
import { can } from '@/lib/auth/policy';
import { sendJson } from '@/components/forms/api';

/**
 * "Save as a worked calculation": posts the inputs as typed; the server recomputes
 * and stores the result and answers with the permalink. Shown per the policy table.
 */
export function SaveCalculation({ tool, inputs }: { tool: string; inputs: URLSearchParams }) {
  // Read the context directly: a card may be drawn where no session provider is (tests, print).
  const session = useContext(SessionContext);
  const user = session?.data?.user;
  const [state, setState] = useState<{ url?: string; error?: string; busy?: boolean }>({});
  const actor = user ? { id: Number(user.id), role: user.role as 'member' } : null;
  if (!can(actor, 'calculation.save')) {
    return (
      <Link href="/sign-in" className="cw-link">
        Sign in to save
      </Link>
    );
  }
  if (state.url) {
    return (
      <Link href={state.url} className="cw-link font-semibold" data-testid="saved-calculation">
        Saved: open the worked calculation
      </Link>
    );
  }
  return (
    <span className="flex items-center gap-2">
      <button
        type="button"
        className="cw-link"
        disabled={state.busy}
        onClick={async () => {
          setState({ busy: true });
          const r = await sendJson<{ url: string }>('/api/calculations', 'POST', {
            tool,
            inputs: Object.fromEntries(inputs.entries()),
          });
          setState(r.ok ? { url: r.data.url } : { error: r.error.message });
        }}
      >
        Save as a worked calculation
      </button>
      {state.error ? (
        <span role="alert" className="text-xs text-signal-700 dark:text-signal-300">
          {state.error}
        </span>
      ) : null}
    </span>
  );
}
