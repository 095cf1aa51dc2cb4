import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import 'katex/dist/katex.min.css';
import { findWorkedCalculation } from '@/lib/calculations/store';
import { computeFromForm, getCalculator, resultsDiffer } from '@/lib/calculators';
import { CalculatorById } from '@/components/calculators/Calculators';
import { formatDate } from '@/lib/dates';

export const metadata: Metadata = { title: 'Worked calculation' };

export default async function WorkedCalculationPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const saved: Awaited<ReturnType<typeof findWorkedCalculation>> = await findWorkedCalculation(id);
  if (!saved) notFound();
  const entry = getCalculator(saved.tool);
  const form = saved.inputs as Record<string, string>;
  const now = computeFromForm(saved.tool, form);
  const changed = !now.ok || resultsDiffer(saved.results, now.output.results);

  return (
    <div className="flex flex-col gap-4">
      <nav aria-label="Breadcrumb" className="cw-muted text-sm" data-print-hide>
        <Link href="/calculators" className="cw-link">
          Calculators
        </Link>{' '}
        › worked calculation
      </nav>
      <h1 className="font-serif text-3xl font-semibold">
        {saved.title ?? `${entry?.name ?? saved.tool}: worked calculation`}
      </h1>
      <p className="cw-muted text-sm">
        {entry?.name ?? saved.tool} · saved {saved.author ? `by ${saved.author.displayName} ` : ''}on{' '}
        {formatDate(saved.createdAt)} with engine {saved.engineVersion}
      </p>
      {changed ? (
        <p
          role="status"
          className="rounded-md border-l-4 border-signal bg-signal-100 p-3 text-sm text-creek-900 dark:bg-signal-900 dark:text-signal-100"
          data-testid="calc-changed"
        >
          {now.ok
            ? `The result has changed since it was saved: it is recomputed below with engine ${now.engineVersion}.`
            : `These inputs no longer compute with the current engine: ${now.message}`}
        </p>
      ) : (
        <p role="status" className="text-sm text-moss-600 dark:text-moss-300" data-testid="calc-unchanged">
          Recomputed with the current engine: the same result as when it was saved.
        </p>
      )}
      <p className="cw-prose text-sm">
        The calculator below opens with the saved inputs. Change any of them to <strong>try with my numbers</strong>:
        your copy is yours alone and the saved calculation stays as it was.
      </p>
      <CalculatorById id={saved.tool} props={form} />
    </div>
  );
}
