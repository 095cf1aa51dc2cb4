'use client';

import Link from 'next/link';
import { useUnits } from '@/components/units/UnitsProvider';
import { siteSheetRows } from '@/lib/calculators/site-sheet';

/** A question's site sheet in the reader's units (the page is the same for every reader; the units are the reader's own). */
export function SiteSheetCard({
  sheet,
  fieldLogEntryId,
}: {
  sheet: Record<string, string> | null;
  fieldLogEntryId: number | null;
}) {
  const { units } = useUnits();
  const rows = siteSheetRows(sheet, units);
  if (!rows.length) return null;
  return (
    <section aria-label="Site sheet" className="cw-card">
      <h2 className="mb-2 text-sm font-semibold uppercase tracking-wide">Site sheet</h2>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm sm:grid-cols-3" data-testid="site-sheet">
        {rows.map((r) => (
          <div key={r.label}>
            <dt className="cw-muted text-xs">{r.label}</dt>
            <dd className="cw-num">{r.value}</dd>
          </div>
        ))}
      </dl>
      {sheet?.fall && sheet?.lift && sheet?.driveLength ? (
        <p className="mt-2 text-sm">
          <Link href={`/calculators/stall-check?${new URLSearchParams(sheet)}`} className="cw-link">
            Run the stall check on this site sheet
          </Link>
        </p>
      ) : null}
      {fieldLogEntryId ? (
        <p className="mt-2 text-sm">
          <Link href={`/field-log/${fieldLogEntryId}`} className="cw-link">
            Filled from field log entry {fieldLogEntryId}
          </Link>
        </p>
      ) : null}
    </section>
  );
}
