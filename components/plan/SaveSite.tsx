'use client';

import { useContext, useId, useRef, useState } from 'react';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { SessionContext } from 'next-auth/react';
import { can, type Actor } from '@/lib/auth/policy';
import { sendJson } from '@/components/forms/api';
import { enqueue } from '@/lib/offline/outbox';
import { OutboxPanel } from '@/components/offline/OutboxPanel';

const TARGET = 'cw-link inline-flex min-h-6 items-center';

/** Where a planner's save goes: a new site, or the next version of the reader's own site. */
export type SaveTarget = { kind: 'new' } | { kind: 'version'; siteId: string };

/**
 * Keeping a plan: a member names it and saves it as a site (private until they share it),
 * or saves a changed survey as the next version of their site. The server plans the
 * survey again; what it stores is the engine's, not this page's.
 */
export function SaveSite({ survey, target }: { survey: Record<string, string>; target: SaveTarget }) {
  const session = useContext(SessionContext);
  const user = session?.data?.user;
  const actor: Actor | null = user ? { id: Number(user.id), role: user.role as Actor['role'] } : null;
  const router = useRouter();
  const id = useId();
  const [name, setName] = useState('');
  const [state, setState] = useState<{ busy?: boolean; error?: string; field?: string; kept?: boolean }>({});
  // one key per save, however often it is sent, so a save cut off after the server wrote it is one site
  const sendKey = useRef<string | null>(null);
  // a new version is offered on the owner's own site page only, which the server made for
  // them: with no signal the session cannot be asked, and the member is still its owner
  if (target.kind === 'new' && !can(actor, 'site.save'))
    return (
      <Link href="/sign-in" className={TARGET}>
        Sign in to save this site
      </Link>
    );
  const send = async () => {
    setState({ busy: true });
    const key = (sendKey.current ??= crypto.randomUUID());
    const [url, body] =
      target.kind === 'new' ? ['/api/sites', { name, survey }] : [`/api/sites/${target.siteId}/versions`, { survey }];
    const r = navigator.onLine
      ? await sendJson<{ url: string }>(url, 'POST', body, { headers: { 'Idempotency-Key': key } })
      : null;
    if (r?.ok) return router.push(r.data.url);
    if (r && r.status !== 0) return setState({ error: r.error.message, field: r.error.field });
    // no signal: the survey waits on the phone and is sent, once, when it is back
    await enqueue({
      id: key,
      kind: target.kind === 'new' ? 'site' : 'site-version',
      url,
      body,
      label: target.kind === 'new' ? `Site: ${name.trim() || 'unnamed'}` : 'Survey changed on this site',
    });
    sendKey.current = null;
    setState({ kept: true });
  };
  if (state.kept)
    return (
      <div className="flex basis-full flex-col gap-2" data-testid="site-kept">
        <p role="status" className="text-sm">
          No signal: the survey is kept on this phone and will be sent when it is back online.
        </p>
        <OutboxPanel />
      </div>
    );
  if (target.kind === 'version')
    return (
      <span className="flex flex-wrap items-center gap-2">
        <button type="button" className={TARGET} disabled={state.busy} onClick={() => void send()}>
          Save as a new version of this site
        </button>
        {state.error ? (
          <span role="alert" className="text-xs text-signal-700 dark:text-signal-300">
            {state.error}
          </span>
        ) : null}
      </span>
    );
  return (
    <form
      className="flex flex-wrap items-end gap-2"
      aria-label="Save this site"
      onSubmit={(e) => {
        e.preventDefault();
        void send();
      }}
    >
      <label htmlFor={`${id}-name`} className="flex flex-col text-sm">
        <span>Name the site</span>
        <input
          id={`${id}-name`}
          value={name}
          maxLength={80}
          onChange={(e) => setName(e.target.value)}
          placeholder="e.g. Lower meadow"
          aria-invalid={state.field === 'name' || undefined}
          aria-describedby={state.error ? `${id}-error` : undefined}
          className="rounded-md border border-limestone-400 bg-limestone-50 px-2 py-1.5 dark:border-creek-500 dark:bg-creek-950"
        />
      </label>
      <button
        type="submit"
        disabled={state.busy}
        className="min-h-9 rounded-md bg-clay-700 px-3 py-1.5 font-semibold text-limestone-50 hover:bg-clay-800 dark:bg-clay-300 dark:text-creek-950"
      >
        Save as my site
      </button>
      {state.error ? (
        <span id={`${id}-error`} role="alert" className="basis-full text-xs text-signal-700 dark:text-signal-300">
          {state.error}
        </span>
      ) : null}
    </form>
  );
}
