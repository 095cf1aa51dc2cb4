'use client';

import {
  createContext,
  useCallback,
  useContext,
  useEffect,
  useMemo,
  useRef,
  useSyncExternalStore,
  type ReactNode,
} from 'react';
import { useRouter } from 'next/navigation';
import { useSession } from 'next-auth/react';
import { sendJson } from '@/lib/http/client';
import { DEFAULT_UNITS, parseUnitPreference, UNITS_COOKIE, type UnitPreference } from '@/lib/units/preference';

const listeners = new Set<() => void>();
const ONE_YEAR = 60 * 60 * 24 * 365;

function readCookie(): UnitPreference {
  const m = document.cookie.match(new RegExp(`(?:^|; )${UNITS_COOKIE}=([^;]*)`));
  return parseUnitPreference(m?.[1]);
}

function subscribe(cb: () => void) {
  listeners.add(cb);
  return () => listeners.delete(cb);
}

interface UnitsApi {
  units: UnitPreference;
  /** the reader's choice: remembered in this browser, and saved on the account when signed in */
  setUnits: (u: UnitPreference) => void;
  /** follow a choice already saved (Settings' own save): this browser only */
  adoptUnits: (u: UnitPreference) => void;
}

const UnitsContext = createContext<UnitsApi>({ units: DEFAULT_UNITS, setUnits: () => {}, adoptUnits: () => {} });

/**
 * The one unit preference: saved on the account for members, a cookie for visitors
 * (and for members, so server-drawn pages read it). The header's switch saves it,
 * Settings saves it, and a saved choice that differs from this browser's cookie (a
 * first sign-in here, a change made in another browser) is taken up when the session
 * brings it. Static pages (guides) render with the default and follow the cookie once
 * hydrated; dynamic pages re-render on the server after a change (router.refresh).
 */
export function UnitsProvider({ children }: { children: ReactNode }) {
  const router = useRouter();
  const { data: session, status, update } = useSession();
  const units = useSyncExternalStore(subscribe, readCookie, () => DEFAULT_UNITS);

  const adoptUnits = useCallback(
    (u: UnitPreference) => {
      const changed = readCookie() !== u;
      document.cookie = `${UNITS_COOKIE}=${u}; path=/; max-age=${ONE_YEAR}; samesite=lax`;
      document.documentElement.setAttribute('data-units', u); // guides' both-systems text (ForUnits.tsx)
      listeners.forEach((l) => l());
      if (changed) router.refresh();
    },
    [router],
  );

  const signedIn = session?.user?.id !== undefined;
  const loading = status === 'loading';
  // The session then carries the new choice, so the alignment below sees no change to undo.
  const save = useCallback(
    (u: UnitPreference) =>
      void sendJson<{ units: UnitPreference }>('/api/account/units', 'PUT', { units: u }).then((out) => {
        if (out.ok) void update();
      }),
    [update],
  );
  // A switch pressed before the session has said who is reading: saved once it has.
  const chosenWhileLoading = useRef<UnitPreference | null>(null);
  const setUnits = useCallback(
    (u: UnitPreference) => {
      adoptUnits(u);
      if (loading) chosenWhileLoading.current = u;
      else if (signedIn) save(u);
    },
    [adoptUnits, loading, signedIn, save],
  );

  // Take up the saved choice each time the session brings a different one, not on every render:
  // between a switch and its save the session still holds the old choice, and a choice made
  // while it loaded is newer than what it brings.
  const saved = session?.user?.units;
  const seen = useRef<UnitPreference | undefined>(undefined);
  useEffect(() => {
    if (status === 'unauthenticated') chosenWhileLoading.current = null;
    if (saved === undefined || seen.current === saved) return;
    seen.current = saved;
    const chosen = chosenWhileLoading.current;
    chosenWhileLoading.current = null;
    if (chosen) {
      if (chosen !== saved) save(chosen);
    } else if (readCookie() !== saved) adoptUnits(saved);
  }, [saved, status, adoptUnits, save]);

  const value = useMemo(() => ({ units, setUnits, adoptUnits }), [units, setUnits, adoptUnits]);
  return <UnitsContext.Provider value={value}>{children}</UnitsContext.Provider>;
}

export function useUnits() {
  return useContext(UnitsContext);
}
