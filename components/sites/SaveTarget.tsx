'use client';

import { createContext, useContext, type ReactNode } from 'react';

/**
 * The owner's site a calculator was opened from: "Save as a worked calculation" links what it
 * saves to it. A context, so the calculator card itself need not know about sites.
 */
const SiteSaveTarget = createContext<{ id: string; name: string } | null>(null);

export function SaveToSite({ site, children }: { site: { id: string; name: string }; children: ReactNode }) {
  return <SiteSaveTarget.Provider value={site}>{children}</SiteSaveTarget.Provider>;
}

export const useSiteSaveTarget = () => useContext(SiteSaveTarget);
