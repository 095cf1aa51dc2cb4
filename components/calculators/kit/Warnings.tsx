'use client';

import type { Warning } from '@/lib/hydraulics';
import { formatMessage } from '@/lib/calculators/format';
import { useUnits } from '@/components/units/UnitsProvider';

/** The engine's warnings in the reader's units, each with the guide that says more. */
export function Warnings({ warnings, label }: { warnings: readonly Warning[]; label?: string }) {
  const { units } = useUnits();
  if (warnings.length === 0) return null;
  return (
    <ul className="flex flex-col gap-2" aria-label={label}>
      {warnings.map((w) => (
        <li
          key={w.code}
          className="rounded-md border-l-4 border-signal bg-signal-100 p-2 text-sm text-creek-900 dark:bg-signal-900 dark:text-signal-100"
          data-warning={w.code}
        >
          <span aria-hidden="true">⚠ </span>
          {formatMessage(w, units)}{' '}
          <a href={`/guides/${w.guide}`} className="cw-link">
            Read more
          </a>
        </li>
      ))}
    </ul>
  );
}
