'use client';

import { useEffect, useState, type ReactNode } from 'react';
import { formatNumber } from '@/lib/calculators';

/** A button for a wet thumb: most of a phone's width and a good height, the words large. */
export const BIG_BUTTON =
  'flex min-h-32 w-full flex-col items-center justify-center gap-1 rounded-xl bg-clay-700 px-4 py-6 font-sans font-semibold text-limestone-50 shadow-sm select-none touch-manipulation hover:bg-clay-800 active:bg-clay-800 disabled:opacity-50 dark:bg-clay-300 dark:text-creek-950 dark:hover:bg-clay-200';

/** A labelled input with its error beside it. */
export function Field({
  id,
  label,
  error,
  children,
}: {
  id: string;
  label: string;
  error?: string;
  children: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold">
        {label}
      </label>
      <div className="flex flex-wrap items-center gap-2">{children}</div>
      {error ? (
        <p role="alert" className="text-xs text-signal-700 dark:text-signal-300">
          {error}
        </p>
      ) : null}
    </div>
  );
}

/** Seconds as a stopwatch shows them, to the tenth. */
export function Seconds({ s }: { s: number }) {
  return <span className="cw-num">{formatNumber(Math.floor(s * 10) / 10)} s</span>;
}

/** The time now, refreshed ten times a second while something is being timed. */
export function useTicker(running: boolean): number {
  const [now, setNow] = useState(() => (typeof performance === 'undefined' ? 0 : performance.now()));
  useEffect(() => {
    if (!running) return;
    const t = setInterval(() => setNow(performance.now()), 100);
    return () => clearInterval(t);
  }, [running]);
  return now;
}
