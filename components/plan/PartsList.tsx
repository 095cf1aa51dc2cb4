'use client';

import { useState } from 'react';
import { partsCsv, type PartRow } from '@/lib/plan/parts';

/**
 * What to buy, grouped as the water runs (intake to tank): a table on a wide screen, one
 * card a part on a phone, and the same rows to copy or download as CSV.
 */
export function PartsList({ rows }: { rows: PartRow[] }) {
  const [copied, setCopied] = useState(false);
  const csv = partsCsv(rows);
  const href = `data:text/csv;charset=utf-8,${encodeURIComponent(csv)}`;
  return (
    <section aria-labelledby="plan-parts" className="cw-card font-sans" data-testid="parts-list">
      <div className="mb-2 flex flex-wrap items-baseline justify-between gap-3">
        <h2 id="plan-parts" className="font-serif text-xl font-semibold">
          Parts list
        </h2>
        <p className="flex gap-4 text-sm" data-print-hide>
          <a href={href} download="site-plan-parts.csv" className="cw-link inline-flex min-h-6 items-center">
            Download CSV
          </a>
          <button
            type="button"
            className="cw-link inline-flex min-h-6 items-center"
            onClick={() => void navigator.clipboard?.writeText(csv).then(() => setCopied(true))}
          >
            {copied ? 'Copied' : 'Copy'}
          </button>
        </p>
      </div>
      <table className="hidden w-full border-collapse text-sm sm:table print:table">
        <thead>
          <tr className="border-b border-limestone-400 text-left">
            <th className="py-1 pr-2">Part of</th>
            <th className="py-1 pr-2">What</th>
            <th className="py-1 pr-2">Size</th>
            <th className="py-1 pr-2 text-right">How many</th>
            <th className="py-1">How much</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={i} className="border-b border-limestone-300 align-top dark:border-creek-600">
              <td className="py-1 pr-2">{r.group}</td>
              <td className="py-1 pr-2">
                {r.what}
                {r.note ? <span className="cw-muted block text-xs">{r.note}</span> : null}
              </td>
              <td className="py-1 pr-2">{r.size}</td>
              <td className="cw-num py-1 pr-2 text-right">{r.quantity}</td>
              <td className="cw-num py-1">{r.amount}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <ul className="flex flex-col gap-2 sm:hidden print:hidden">
        {rows.map((r, i) => (
          <li key={i} className="rounded-md border border-limestone-300 p-2 text-sm dark:border-creek-600">
            <p className="cw-muted text-xs uppercase tracking-wide">{r.group}</p>
            <p className="font-semibold">
              {r.quantity} × {r.what}
            </p>
            {r.size || r.amount ? <p className="cw-num">{[r.size, r.amount].filter(Boolean).join(', ')}</p> : null}
            {r.note ? <p className="cw-muted text-xs">{r.note}</p> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
