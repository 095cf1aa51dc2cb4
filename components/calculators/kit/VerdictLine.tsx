import { BEYOND_RANGE_WORDS, VERDICT_WORDS, type Verdict, type VerdictLevel } from '@/lib/calculators/verdict';

/**
 * Each level in its own colour and symbol, so the words and the colour both say
 * it (and a reader who cannot tell moss from amber still reads the word).
 * Every pair of text and background here is at least 4.5:1 in both themes.
 */
export const LOOK: Record<VerdictLevel, { symbol: string; box: string }> = {
  works: {
    symbol: '✓',
    box: 'border-l-8 border-moss-600 bg-moss-100 text-creek-900 dark:border-moss-300 dark:bg-creek-800 dark:text-moss-100',
  },
  marginal: {
    symbol: '◐',
    box: 'border-l-8 border-signal-700 bg-signal-100 text-creek-900 dark:border-signal-300 dark:bg-signal-900 dark:text-signal-100',
  },
  'wont-work': {
    symbol: '✕',
    box: 'border-l-8 border-clay-700 bg-clay-200 text-creek-900 dark:border-clay-300 dark:bg-creek-800 dark:text-clay-200',
  },
  ask: {
    symbol: '?',
    box: 'border-l-8 border-creek-400 bg-creek-50 text-creek-900 dark:border-creek-300 dark:bg-creek-800 dark:text-limestone-100',
  },
};

/** A result the engine cannot vouch for: no calm fill, a heavy dashed edge and a dark label that says so. */
export const BEYOND_BOX =
  'border-4 border-dashed border-clay-700 bg-limestone-50 text-creek-900 dark:border-clay-300 dark:bg-creek-950 dark:text-limestone-100';

export const BEYOND_BADGE = 'bg-creek-900 text-limestone-50 dark:bg-limestone-100 dark:text-creek-950';

/** The card's headline: what the numbers mean for this site, and why, in one sentence. */
export function VerdictLine({ verdict, id }: { verdict: Verdict; id: string }) {
  const look = LOOK[verdict.level];
  return (
    <div
      id={id}
      className={`rounded-md p-3 ${verdict.beyondRange ? BEYOND_BOX : look.box}`}
      data-testid="verdict"
      data-verdict={verdict.level}
      data-beyond-range={verdict.beyondRange ? 'true' : undefined}
    >
      <p className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <strong className="text-xl font-semibold" data-testid="verdict-words">
          <span aria-hidden="true">{look.symbol} </span>
          {VERDICT_WORDS[verdict.level]}
        </strong>
        {verdict.beyondRange ? (
          <span className={`rounded px-2 py-0.5 text-sm font-semibold ${BEYOND_BADGE}`} data-testid="beyond-range">
            <span aria-hidden="true">⚠ </span>
            {BEYOND_RANGE_WORDS}
          </span>
        ) : null}
      </p>
      <p className="mt-1 text-sm">{verdict.reason}</p>
    </div>
  );
}
