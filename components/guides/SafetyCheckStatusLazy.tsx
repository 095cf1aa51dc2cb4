'use client';

import dynamic from 'next/dynamic';

/** The status is fetched live after the page loads, so its code loads then too, off the guide's first load. */
export const SafetyCheckStatusLazy = dynamic(() => import('./SafetyCheckStatus').then((m) => m.SafetyCheckStatus), {
  ssr: false,
  loading: () => <p className="cw-muted text-sm">Looking up safety checks…</p>,
});
