'use client';

import { createContext, useCallback, useContext, useMemo, useSyncExternalStore, type ReactNode } from 'react';
import { useRouter } from 'next/navigation';
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

const UnitsContext = createContext<{ units: UnitPreference; setUnits: (u: UnitPreference) => void }>({
  units: DEFAULT_UNITS,
  setUnits: () => {},
});

/**
 * Holds the site-wide unit switch. Static pages (guides) render with the default
 * and follow the cookie once hydrated; dynamic pages re-render on the server
 * after a switch (router.refresh) so server-drawn numbers follow too.
 */
export function UnitsProvider({ children }: { children: ReactNode }) {
  const router = useRouter();
  const units = useSyncExternalStore(subscribe, readCookie, () => DEFAULT_UNITS);
  const setUnits = useCallback(
    (u: UnitPreference) => {
      document.cookie = `${UNITS_COOKIE}=${u}; path=/; max-age=${ONE_YEAR}; samesite=lax`;
      document.documentElement.setAttribute('data-units', u); // guides' both-systems text (ForUnits.tsx)
      listeners.forEach((l) => l());
      router.refresh();
    },
    [router],
  );
  const value = useMemo(() => ({ units, setUnits }), [units, setUnits]);
  return <UnitsContext.Provider value={value}>{children}</UnitsContext.Provider>;
}

export function useUnits() {
  return useContext(UnitsContext);
}
