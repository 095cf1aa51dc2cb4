'use client';

import { useCallback, useEffect, useState } from 'react';
import { forgetPage, keepPage, keptHow, memberIs, type KeptHow } from '@/lib/offline/kept';

const WORDS: Record<KeptHow | 'none', string> = {
  kept: 'Kept on this phone for offline.',
  visited: 'On this phone for offline, since you opened it.',
  none: 'Not kept on this phone.',
};

/**
 * The member's own page (a site, a field log test) on this phone for when there is no
 * signal: kept by opening it, or with the button (a site keeps its recent tests with it),
 * and let go again. Only in this member's cache (lib/offline/kept.ts). The marker on the
 * section tells the keeper that the page it fetched is this member's.
 */
export function KeepForOffline({
  memberId,
  path,
  alsoKeep = [],
  button = true,
}: {
  memberId: number;
  path: string;
  /** the site's recent field log tests, kept with it by the button */
  alsoKeep?: string[];
  /** false on a page that is kept by opening it only (a field log test) */
  button?: boolean;
}) {
  const member = String(memberId);
  const [how, setHow] = useState<KeptHow | 'none' | null>(null);
  const [busy, setBusy] = useState(false);
  const [failed, setFailed] = useState(false);

  const look = useCallback(async () => setHow((await keptHow(member, path)) ?? 'none'), [member, path]);
  useEffect(() => {
    if (!('caches' in window)) return;
    void (async () => {
      // this page was made for this member by the server: they are the one signed in
      if (navigator.onLine) {
        await memberIs(member);
        await keepPage(member, path, 'visited').catch(() => false);
      }
      await look();
    })();
  }, [member, path, look]);

  const keep = async () => {
    setBusy(true);
    setFailed(false);
    try {
      const ok = await keepPage(member, path, 'kept');
      for (const p of alsoKeep) await keepPage(member, p, 'kept').catch(() => false);
      setFailed(!ok);
    } catch {
      setFailed(true);
    } finally {
      setBusy(false);
      await look();
    }
  };
  const forget = async () => {
    setBusy(true);
    await forgetPage(member, path);
    for (const p of alsoKeep) await forgetPage(member, p);
    setBusy(false);
    await look();
  };

  const attrs = { 'data-keep-member': member };
  if (!button)
    return <p {...attrs} data-testid="kept-state" data-kept={how ?? undefined} className="sr-only" aria-hidden />;
  return (
    <section
      {...attrs}
      aria-label="Offline"
      data-testid="keep-offline"
      data-kept={how ?? undefined}
      data-print-hide
      className="flex flex-wrap items-center gap-x-3 gap-y-1 font-sans text-sm"
    >
      <span role="status" data-testid="kept-state">
        {how === null ? '' : WORDS[how]}
      </span>
      {how === 'kept' || how === 'visited' ? (
        <button type="button" className="cw-link min-h-9" disabled={busy} onClick={() => void forget()}>
          Forget it on this phone
        </button>
      ) : null}
      {how !== 'kept' ? (
        <button
          type="button"
          disabled={busy || how === null}
          onClick={() => void keep()}
          className="min-h-9 rounded-md border border-clay-700 px-3 py-1 font-semibold text-clay-800 hover:bg-limestone-200 disabled:opacity-50 dark:border-clay-300 dark:text-clay-200 dark:hover:bg-creek-800"
        >
          {busy ? 'Keeping…' : 'Keep for offline'}
        </button>
      ) : null}
      {failed ? (
        <span role="alert" className="text-signal-700 dark:text-signal-300">
          Could not keep it: open the page again with a signal.
        </span>
      ) : null}
    </section>
  );
}
