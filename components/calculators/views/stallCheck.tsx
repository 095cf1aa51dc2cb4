import type { StallCheckResults } from '@/lib/hydraulics';
import { formatMessage } from '@/lib/calculators/format';
import { causeStrength } from '@/lib/calculators/verdict';
import { RelatedThreads } from '@/components/search/RelatedThreads';
import type { CalculatorView } from './types';

export const stallCheckView: CalculatorView<StallCheckResults> = {
  extra: (r, units) =>
    r.causes.length === 0 ? (
      <p className="text-sm">
        Nothing in these numbers points to a cause. Tick what the pump does to rank the likely ones.
      </p>
    ) : (
      <>
        <ol className="flex list-none flex-col gap-2 pl-0" aria-label="Likely causes" data-testid="stall-causes">
          {r.causes.slice(0, 6).map((c, i) => (
            <li
              key={c.code}
              className="rounded-md border border-limestone-300 p-2 text-sm dark:border-creek-600"
              data-cause={c.code}
            >
              <p className="font-semibold">
                {i + 1}. {c.title} <span className="cw-muted text-xs">({causeStrength(c.score)})</span>
              </p>
              <p className="cw-muted">{formatMessage({ message: c.reason, parts: c.reasonParts }, units)}</p>
              <a href={`/guides/${c.guide}`} className="cw-link inline-flex min-h-6 items-center text-xs">
                How to fix it
              </a>
            </li>
          ))}
        </ol>
        <RelatedThreads
          query={r.causes
            .slice(0, 2)
            .map((c) => c.title)
            .join(' ')}
        />
      </>
    ),
};
