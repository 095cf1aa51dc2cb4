import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { currentUserInPage } from '@/lib/auth/session';
import { idParam } from '@/lib/http/guard';
import { getComparison, type Comparison } from '@/lib/field-log/store';
import { pumpsWords, shown } from '@/components/field-log/format';
import { readUnitPreference } from '@/lib/units/server';
import { formatDate } from '@/lib/dates';

export const metadata: Metadata = { title: 'Before and after' };
export const dynamic = 'force-dynamic';

export default async function ComparePage({ params }: { params: Promise<{ before: string; after: string }> }) {
  const p = await params;
  const beforeId = idParam(p.before);
  const afterId = idParam(p.after);
  if (!beforeId || !afterId) notFound();
  const c: Comparison | null = await getComparison(beforeId, afterId, await currentUserInPage());
  if (!c) notFound();
  const units = await readUnitPreference();
  const flow = (si: number) => shown('flow', si, units);
  const side = (label: string, e: Comparison['before']) => (
    <div className="cw-card flex flex-col gap-1 font-sans text-sm">
      <h2 className="font-serif text-lg font-semibold">
        {label}:{' '}
        <Link href={`/field-log/${e.id}`} className="cw-link">
          {formatDate(e.testedOn)}
        </Link>
      </h2>
      <p>
        {pumpsWords(e.pumpCount, e.arrangement, e.pumpSize)}; drive flow {flow(e.driveFlowM3s)} ({e.driveFlowMethod})
      </p>
      <p className="cw-num">
        Delivered {flow(e.deliveredFlowM3s)} (trials {flow(e.performance.spread.min)} to{' '}
        {flow(e.performance.spread.max)}), efficiency {e.performance.dAubuisson.toFixed(2)}
      </p>
    </div>
  );
  return (
    <article className="flex flex-col gap-5">
      <header>
        <p className="font-sans text-sm">
          <Link href="/field-log" className="cw-link">
            Field log
          </Link>
        </p>
        <h1 className="font-serif text-3xl font-semibold">{c.before.siteName}: before and after</h1>
        <p className="cw-muted font-sans">What changed: {c.whatChanged}</p>
      </header>
      <div className="grid gap-4 sm:grid-cols-2">
        {side('Before', c.before)}
        {side('After', c.after)}
      </div>
      <section aria-labelledby="ratio-heading" className="cw-card font-sans">
        <h2 id="ratio-heading" className="mb-2 font-serif text-xl font-semibold">
          Delivery after ÷ before
        </h2>
        <p className="text-lg">
          Measured:{' '}
          <strong className="cw-num" data-testid="measured-ratio">
            {c.measured.ratio.toFixed(2)}×
          </strong>{' '}
          <span className="cw-muted cw-num text-sm">
            (spread of the trials {c.measured.low.toFixed(2)}–{c.measured.high.toFixed(2)})
          </span>
        </p>
        <p className="mt-1">
          Array planner predicted:{' '}
          {c.planner ? (
            <strong className="cw-num" data-testid="planner-ratio">
              {c.planner.ratio.toFixed(2)}×
            </strong>
          ) : (
            <span className="cw-muted">
              no prediction (the planner needs both delivery lines and pumps side by side, not staged)
            </span>
          )}
        </p>
        <p className="cw-muted mt-2 text-sm">
          The planner gives each pump the before test&apos;s drive flow per pump and shares the delivery line; a
          measured ratio below it usually means the pumps shared less drive water than that, or the intake drew down.
        </p>
      </section>
    </article>
  );
}
