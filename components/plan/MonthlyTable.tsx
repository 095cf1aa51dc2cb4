'use client';

import type { MonthlyDelivery } from '@/lib/hydraulics';
import { formatQuantity } from '@/lib/calculators';
import { MONTH_NAMES } from '@/lib/dates';
import { useUnits } from '@/components/units/UnitsProvider';

/** Delivery against demand month by month as a table: the chart's numbers, exactly. */
export function MonthlyTable({ monthly }: { monthly: MonthlyDelivery }) {
  const { units } = useUnits();
  const day = (x: number) => formatQuantity('dailyVolume', x, units);
  return (
    <div className="cw-scroll-x" tabIndex={0} role="group" aria-label="Delivery by month">
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-limestone-400 text-left">
            <th className="py-1 pr-2">Month</th>
            <th className="py-1 pr-2 text-right">Delivered a day</th>
            <th className="py-1 text-right">Needed a day</th>
          </tr>
        </thead>
        <tbody>
          {monthly.months.map((m) => (
            <tr
              key={m.month}
              className="border-b border-limestone-300 dark:border-creek-600"
              data-short={m.deliveredM3PerDay < m.demandM3PerDay ? 'true' : undefined}
            >
              <td className="py-1 pr-2">{MONTH_NAMES[m.month - 1]?.slice(0, 3)}</td>
              <td className="cw-num py-1 pr-2 text-right">
                {day(m.deliveredM3PerDay)}
                {m.deliveredM3PerDay < m.demandM3PerDay ? (
                  <span className="text-signal-700 dark:text-signal-300"> short</span>
                ) : null}
              </td>
              <td className="cw-num py-1 text-right">{day(m.demandM3PerDay)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
