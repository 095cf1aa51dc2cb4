'use client';

import { lazy, Suspense } from 'react';
import { useHydrated } from '@/components/useHydrated';

// The status is fetched live after the page loads, so its code loads then too, off the guide's
// first load (React.lazy behind useHydrated rather than next/dynamic, whose loader would ship with it).
const SafetyCheckStatus = lazy(() => import('./SafetyCheckStatus').then((m) => ({ default: m.SafetyCheckStatus })));

const LOOKING = <p className="cw-muted text-sm">Looking up safety checks…</p>;

export function SafetyCheckStatusLazy(props: { slug: string; updated: string }) {
  if (!useHydrated()) return LOOKING;
  return (
    <Suspense fallback={LOOKING}>
      <SafetyCheckStatus {...props} />
    </Suspense>
  );
}
