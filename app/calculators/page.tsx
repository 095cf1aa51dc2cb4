import type { Metadata } from 'next';
import Link from 'next/link';
import { CALCULATOR_LIST } from '@/lib/calculators';

export const metadata: Metadata = {
  title: 'Calculators',
  description:
    'Yield estimate, array planner, drive pipe check, delivery line, source flow, demand and storage, and the stall check.',
};

export default function CalculatorsPage() {
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Calculators</h1>
      <p className="cw-prose cw-muted">
        Every calculator shows its working, so you can check each number by hand. They are a guide for planning, not a
        substitute for local codes or a licensed plumber or engineer.
      </p>
      <ul className="grid gap-3 sm:grid-cols-2">
        {CALCULATOR_LIST.map((c) => (
          <li key={c.id}>
            <Link href={`/calculators/${c.id}`} className="cw-card block h-full no-underline hover:border-clay">
              <h2 className="font-semibold text-clay-600 dark:text-clay-300">{c.name}</h2>
              <p className="cw-muted mt-1 text-sm">{c.line}</p>
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
