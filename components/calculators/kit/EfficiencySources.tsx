import type { ReactNode } from 'react';
import { EFFICIENCY_BANDS, EFFICIENCY_SOURCES, type PumpType } from '@/lib/hydraulics';

/** The pump type a form holds, or undefined (both bands are then listed). */
export const pumpTypeOf = (v: unknown): PumpType | undefined =>
  v === 'homemade' || v === 'commercial' ? v : undefined;

/**
 * The card's one "Sources" disclosure: where the verdict's lines, the curves and
 * the rules of practice come from. The card's face stays short and free of
 * "from memory" notes; a reader who wants to check a number opens it.
 */
export function SourcesDisclosure({ lines, children }: { lines: readonly string[]; children?: ReactNode }) {
  return (
    <details className="text-xs" data-testid="calculator-sources">
      <summary className="cw-link cursor-pointer py-1 text-sm">Sources</summary>
      <ul className="mt-1 flex list-disc flex-col gap-1 pl-4">
        {lines.map((l) => (
          <li key={l}>{l}.</li>
        ))}
        {children}
      </ul>
    </details>
  );
}

/** The published tables an efficiency band is built from, as items of the card's Sources. */
export function EfficiencySources({ pumpType }: { pumpType?: PumpType }) {
  const types: PumpType[] = pumpType ? [pumpType] : ['homemade', 'commercial'];
  return (
    <>
      {types.map((t) => (
        <li key={t}>
          Efficiency band, {EFFICIENCY_BANDS[t].label}: {EFFICIENCY_BANDS[t].source}.
        </li>
      ))}
      {EFFICIENCY_SOURCES.map((s) => (
        <li key={s.id}>
          {s.label}: {s.citation}
          {s.note ? ` (${s.note})` : ''}.
        </li>
      ))}
    </>
  );
}
