'use client';

import { useContext, useState } from 'react';
import Link from 'next/link';
import { SessionContext } from 'next-auth/react';
import { can } from '@/lib/auth/policy';
import { sendJson } from '@/components/forms/api';
import { ENGINE_VERSION } from '@/lib/hydraulics';
import { useSiteSaveTarget } from '@/components/sites/SaveTarget';

/** At least 24 × 24 px to touch (WCAG 2.2, 2.5.8). */
const TARGET = 'cw-link inline-flex min-h-6 items-center';

/**
 * "Save as a worked calculation": posts the inputs as typed; the server recomputes
 * and stores the result and answers with the permalink. Shown per the policy table.
 */
export function SaveCalculation({
  tool,
  inputs,
  label = 'Save as a worked calculation',
}: {
  tool: string;
  inputs: URLSearchParams;
  label?: string;
}) {
  // Read the context directly: a card may be drawn where no session provider is (tests, print).
  const session = useContext(SessionContext);
  const user = session?.data?.user;
  const [state, setState] = useState<{ url?: string; error?: string; busy?: boolean }>({});
  const site = useSiteSaveTarget();
  const actor = user ? { id: Number(user.id), role: user.role as 'member' } : null;
  if (!can(actor, 'calculation.save')) {
    return (
      <Link href="/sign-in" className={TARGET}>
        Sign in to save
      </Link>
    );
  }
  if (state.url) {
    // the engine version belongs to the saved record, not to every card: it says which engine a later recompute is held against
    return (
      <span className="flex flex-wrap items-center gap-x-2">
        <Link href={state.url} className={`${TARGET} font-semibold`} data-testid="saved-calculation">
          Saved: open the worked calculation
        </Link>
        <span className="cw-muted text-xs" data-testid="saved-engine">
          computed with engine {ENGINE_VERSION}
        </span>
      </span>
    );
  }
  return (
    <span className="flex items-center gap-2">
      <button
        type="button"
        className={TARGET}
        disabled={state.busy}
        onClick={async () => {
          setState({ busy: true });
          const r = await sendJson<{ url: string }>('/api/calculations', 'POST', {
            tool,
            inputs: Object.fromEntries(inputs.entries()),
            ...(site ? { siteId: site.id } : {}),
          });
          setState(r.ok ? { url: r.data.url } : { error: r.error.message });
        }}
      >
        {site ? `${label} for ${site.name}` : label}
      </button>
      {state.error ? (
        <span role="alert" className="text-xs text-signal-700 dark:text-signal-300">
          {state.error}
        </span>
      ) : null}
    </span>
  );
}
