'use client';

import { lazy, Suspense, type ComponentType, type ReactNode } from 'react';
import { useHydrated } from '@/components/useHydrated';
import type { CalculatorId } from '@/lib/calculators/ids';
import type { LiveProps } from './live/props';

/**
 * A calculator in a guide: the server's shell (name, one line, room for the card) in the
 * page's HTML, and the live card, engine and all, fetched once the page has hydrated. The
 * card's code is then no part of the guide's first load, and each card brings only its own
 * calculator (one import per id below, so the bundler splits them).
 */
const LIVE: Record<CalculatorId, () => Promise<{ default: ComponentType<LiveProps> }>> = {
  'yield-estimate': () => import('./live/yieldEstimate'),
  'array-planner': () => import('./live/arrayPlanner'),
  'drive-pipe-check': () => import('./live/drivePipeCheck'),
  'delivery-line': () => import('./live/deliveryLine'),
  'source-flow': () => import('./live/sourceFlow'),
  'demand-and-storage': () => import('./live/demandAndStorage'),
  'stall-check': () => import('./live/stallCheck'),
};

type CardProps = LiveProps & { shell: ReactNode };

/** One React.lazy per id, made here so a re-render never fetches again; it fetches when first drawn. A failed fetch keeps the shell and says so. */
const CARDS = {} as Record<CalculatorId, ComponentType<CardProps>>;
for (const id of Object.keys(LIVE) as CalculatorId[]) {
  CARDS[id] = lazy(() =>
    LIVE[id]().then(
      ({ default: Live }) => ({ default: ({ props }: CardProps) => <Live props={props} /> }),
      () => ({ default: ({ shell }: CardProps) => <Unavailable shell={shell} /> }),
    ),
  );
}

function Unavailable({ shell }: { shell: ReactNode }) {
  return (
    <div>
      {shell}
      <p role="status" className="cw-muted text-sm">
        The calculator could not be loaded. Reload the page to try again.
      </p>
    </div>
  );
}

export function GuideCalculator({
  id,
  props,
  shell,
}: {
  id: CalculatorId;
  props: Record<string, string | undefined>;
  shell: ReactNode;
}) {
  // the fetch starts once the page has hydrated
  if (!useHydrated()) return shell;
  const Live = CARDS[id];
  return (
    <Suspense fallback={shell}>
      <Live props={props} shell={shell} />
    </Suspense>
  );
}
