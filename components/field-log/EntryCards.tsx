import Link from 'next/link';
import type { EntryView } from '@/lib/field-log/store';
import type { UnitSystem } from '@/lib/hydraulics';
import { material, pumpsWords, shown, size } from './format';

/**
 * The field log's entries as cards for a phone, where the table's seven columns would
 * leave the delivery and efficiency off the screen. Hidden from `sm` up, where the table shows.
 */
export function EntryCards({
  entries,
  viewerId,
  units,
  sorts,
  sort,
  dir,
}: {
  entries: EntryView[];
  viewerId: number | null;
  units: UnitSystem;
  sorts: { key: string; label: string; href: string }[];
  sort: string;
  dir: 'asc' | 'desc';
}) {
  return (
    <div className="flex flex-col gap-3 font-sans sm:hidden">
      <nav aria-label="Sort the field log" className="flex flex-wrap items-baseline gap-x-3 gap-y-1 text-sm">
        <span className="cw-muted">Sort by</span>
        {sorts.map((s) => (
          <Link
            key={s.key}
            href={s.href}
            className="cw-link inline-block py-1"
            aria-current={sort === s.key ? 'true' : undefined}
          >
            {s.label}
            {sort === s.key ? (dir === 'asc' ? ' ↑' : ' ↓') : ''}
          </Link>
        ))}
      </nav>
      <ol className="flex flex-col gap-3" aria-label="Field log entries, as cards">
        {entries.map((e) => (
          <li key={e.id} className="cw-card flex flex-col gap-2 p-3" data-entry-card={e.id}>
            <div className="flex flex-wrap items-baseline justify-between gap-x-3">
              <Link href={`/field-log/${e.id}`} className="cw-link font-semibold">
                {e.siteName}
              </Link>
              <span className="cw-muted cw-num text-sm">
                {e.testedOn}
                {e.authorId === viewerId ? ' · yours' : ''}
              </span>
            </div>
            <dl className="grid grid-cols-3 gap-2 text-sm">
              <div>
                <dt className="cw-muted text-xs">Delivered</dt>
                <dd className="cw-num font-semibold">{shown('flow', e.deliveredFlowM3s, units)}</dd>
              </div>
              <div>
                <dt className="cw-muted text-xs">Efficiency</dt>
                <dd className="cw-num font-semibold">{e.performance.dAubuisson.toFixed(2)}</dd>
              </div>
              <div>
                <dt className="cw-muted text-xs">h/H</dt>
                <dd className="cw-num font-semibold">{e.performance.liftRatio.toFixed(1)}</dd>
              </div>
            </dl>
            <p className="cw-muted text-xs">
              {pumpsWords(e.pumpCount, e.arrangement, e.pumpSize)}; drive pipe {shown('length', e.driveLengthM, units)}{' '}
              of {size(e.driveSize)} {material(e.driveMaterial)}
            </p>
          </li>
        ))}
      </ol>
    </div>
  );
}
