'use client';

import type { MonthlyDelivery } from '@/lib/hydraulics';
import { formatQuantity } from '@/lib/calculators';
import { useUnits } from '@/components/units/UnitsProvider';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** Delivery against demand month by month, when the reader gave a wet and a dry flow. */
export function MonthlyTable({ monthly }: { monthly: MonthlyDelivery }) {
  const { units } = useUnits();
  const day = (x: number) => formatQuantity('dailyVolume', x, units);
  return (
    <section aria-labelledby="plan-months" className="cw-card font-sans" data-testid="plan-months">
      <h2 id="plan-months" className="mb-2 font-serif text-xl font-semibold">
        Month by month
      </h2>
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
                <td className="py-1 pr-2">{MONTHS[m.month - 1]}</td>
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
      <p className="cw-muted mt-2 text-xs">How the months are estimated: {monthly.method}.</p>
    </section>
  );
}
