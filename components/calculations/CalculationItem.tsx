import Link from 'next/link';
import { getCalculator } from '@/lib/calculators';
import { formatDate } from '@/lib/dates';

/** One worked calculation in a list: its title (or its calculator's name), the calculator and the day. */
export function CalculationItem({
  c,
}: {
  c: { id: string; tool: string; title: string | null; createdAt: string | Date };
}) {
  const name = getCalculator(c.tool)?.name ?? c.tool;
  return (
    <li className="cw-card py-3">
      <Link href={`/calculations/${c.id}`} className="cw-link font-semibold">
        {c.title ?? `${name}: worked calculation`}
      </Link>
      <p className="cw-muted text-sm">
        {name} · {formatDate(c.createdAt)}
      </p>
    </li>
  );
}
