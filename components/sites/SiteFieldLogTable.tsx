'use client';

import Link from 'next/link';
import { formatQuantity } from '@/lib/calculators/format';
import { formatDate } from '@/lib/dates';
import type { LayoutDifference, MeasuredTest } from '@/lib/sites/measured';
import { useUnits } from '@/components/units/UnitsProvider';

const DIFFERS_WORDS: Record<LayoutDifference, string> = {
  pumpSize: 'pump size',
  pumpCount: 'number of pumps',
  driveSize: 'drive pipe size',
  deliverySize: 'delivery line size',
};

/**
 * The tests on a site, oldest first, in the reader's units as they switch: what the
 * buckets caught a day (and a minute), what the plan gives for that day's drive flow,
 * fall and lift, and the one as a share of the other.
 */
export function SiteFieldLogTable({ rows }: { rows: MeasuredTest[] }) {
  const { units } = useUnits();
  const day = (m3s: number) => formatQuantity('dailyVolume', m3s * 86400, units);
  const minute = (m3s: number) => formatQuantity('flow', m3s, units);
  const notes = (r: MeasuredTest) => (
    <>
      <span className="cw-muted block text-xs">plan version {r.planVersion}</span>
      {r.hidden ? <span className="block text-xs font-semibold">hidden from readers</span> : null}
      {r.differs.length ? (
        <span className="cw-muted block text-xs">
          built with another {r.differs.map((d) => DIFFERS_WORDS[d]).join(', ')} than the plan
        </span>
      ) : null}
    </>
  );
  return (
    <>
      {/* on a phone the four columns would squeeze each figure onto three lines: one card a test */}
      <ol className="flex flex-col gap-2 text-sm sm:hidden" aria-label="Tests against the plan">
        {rows.map((r) => (
          <li key={r.id} className="border-b border-limestone-300 pb-2 dark:border-creek-600" data-test-card={r.id}>
            <div className="flex items-baseline justify-between gap-3">
              <Link href={`/field-log/${r.id}`} className="cw-link">
                {formatDate(r.testedOn)}
              </Link>
              <span className="cw-num font-semibold">
                {r.ratio !== null ? `${r.ratio.toFixed(2)} of the plan` : 'no prediction'}
              </span>
            </div>
            <p className="cw-num">
              {day(r.measured.mean)} measured
              {r.predictedM3s !== null ? `, plan ${day(r.predictedM3s)}` : ''}
            </p>
            {notes(r)}
          </li>
        ))}
      </ol>
      <div className="cw-scroll-x hidden sm:block" tabIndex={0} role="group" aria-label="Tests against the plan">
        <table className="w-full border-collapse text-sm" data-testid="site-tests">
          <thead>
            <tr className="border-b border-limestone-400 text-left">
              <th className="py-1 pr-2 align-bottom">Tested</th>
              <th className="py-1 pr-2 text-right align-bottom">Measured a day</th>
              <th className="py-1 pr-2 text-right align-bottom">Plan for that day’s flow</th>
              <th className="py-1 text-right align-bottom">Measured ÷ plan</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.id} className="border-b border-limestone-300 align-top dark:border-creek-600" data-test={r.id}>
                <td className="py-1 pr-2">
                  <Link href={`/field-log/${r.id}`} className="cw-link whitespace-nowrap">
                    {formatDate(r.testedOn)}
                  </Link>
                  {notes(r)}
                </td>
                <td className="cw-num py-1 pr-2 text-right">
                  {day(r.measured.mean)}
                  <span className="cw-muted block text-xs">{minute(r.measured.mean)}</span>
                </td>
                <td className="cw-num py-1 pr-2 text-right">
                  {r.predictedM3s !== null ? (
                    <>
                      {day(r.predictedM3s)}
                      <span className="cw-muted block text-xs">{minute(r.predictedM3s)}</span>
                    </>
                  ) : (
                    <span className="cw-muted">no prediction</span>
                  )}
                </td>
                <td className="cw-num py-1 text-right font-semibold">{r.ratio !== null ? r.ratio.toFixed(2) : '—'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
