import { EFFICIENCY_BANDS, EFFICIENCY_SOURCES, type PumpType } from '@/lib/hydraulics';

/** The pump type a form holds, or undefined (both bands are then listed). */
export const pumpTypeOf = (v: unknown): PumpType | undefined =>
  v === 'homemade' || v === 'commercial' ? v : undefined;

/**
 * The published tables an efficiency band is built from, behind a small
 * disclosure under the chart: the card's face stays short, and a reader who
 * wants to check a yield can see where its curve comes from.
 */
export function EfficiencySources({ pumpType }: { pumpType?: PumpType }) {
  const types: PumpType[] = pumpType ? [pumpType] : ['homemade', 'commercial'];
  return (
    <details className="text-xs" data-testid="efficiency-sources">
      <summary className="cw-link cursor-pointer">Sources</summary>
      <ul className="mt-1 flex list-disc flex-col gap-1 pl-4">
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
      </ul>
    </details>
  );
}
