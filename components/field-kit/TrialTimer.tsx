'use client';

import { useEffect, useId, useRef, useState } from 'react';
import { measureSourceFlow, parseQuantity, type SourceFlowResults } from '@/lib/hydraulics';
import { formatMessage, formatNumber, formatQuantity } from '@/lib/calculators';
import { useUnits } from '@/components/units/UnitsProvider';
import { BIG_BUTTON, Field, Seconds, useTicker } from './parts';

/** Buckets people have at hand, in the reader's own units. */
const BUCKETS = { US: ['1 gal', '2 gal', '5 gal'], metric: ['5 L', '10 L', '20 L'] } as const;

export interface Trial {
  volumeM3: number;
  timeS: number;
}

/**
 * The trial timer: one hand at the outlet. Tap as the bucket goes under, tap when it is
 * full; the bucket's volume is picked once and kept. The mean and spread come from the
 * source flow calculator itself, so the timer and the calculator never disagree.
 */
export function TrialTimer({ onTrials }: { onTrials?: (trials: Trial[]) => void }) {
  const { units } = useUnits();
  const id = useId();
  const [bucket, setBucket] = useState<string>(BUCKETS[units][2]);
  const [trials, setTrials] = useState<Trial[]>([]);
  const [startedAt, setStartedAt] = useState<number | null>(null);
  const now = useTicker(startedAt !== null);
  const picked = useRef(false);

  // a reader whose units arrive after the first paint gets their own bucket, unless they chose one
  useEffect(() => {
    if (!picked.current) setBucket(BUCKETS[units][2]);
  }, [units]);

  let volumeM3: number | null = null;
  let bucketError: string | undefined;
  try {
    volumeM3 = parseQuantity(/[a-z]/i.test(bucket) ? bucket : `${bucket} ${units === 'US' ? 'gal' : 'L'}`, 'volume');
    if (!(volumeM3 > 0)) throw new Error();
  } catch {
    volumeM3 = null;
    bucketError = units === 'US' ? 'Give the bucket’s volume, e.g. 5 gal.' : 'Give the bucket’s volume, e.g. 20 L.';
  }

  const tap = () => {
    const t = performance.now();
    if (startedAt === null) {
      if (volumeM3 !== null) setStartedAt(t);
      return;
    }
    const timeS = (t - startedAt) / 1000;
    setStartedAt(null);
    // a slip of the thumb: under half a second is no fill
    if (timeS < 0.5 || volumeM3 === null) return;
    const next = [...trials, { volumeM3, timeS }];
    setTrials(next);
    onTrials?.(next);
  };
  const drop = (i: number) => {
    const next = trials.filter((_, j) => j !== i);
    setTrials(next);
    onTrials?.(next);
  };

  const out = trials.length > 0 ? measureSourceFlow({ method: 'bucket', trials }) : null;
  const r: SourceFlowResults | undefined = out?.results;
  const flow = (q: number) => formatQuantity('flow', q, units);

  return (
    <section aria-labelledby={`${id}-h`} className="cw-card flex flex-col gap-3 font-sans" data-testid="trial-timer">
      <h2 id={`${id}-h`} className="font-serif text-xl font-semibold">
        Bucket trials
      </h2>
      <Field id={`${id}-bucket`} label="The bucket holds" error={bucketError}>
        <input
          id={`${id}-bucket`}
          value={bucket}
          inputMode="decimal"
          onChange={(e) => {
            picked.current = true;
            setBucket(e.target.value);
          }}
          aria-invalid={bucketError ? true : undefined}
          className="w-32 rounded-md border border-limestone-400 bg-limestone-50 px-2 py-1.5 dark:border-creek-500 dark:bg-creek-950"
        />
        <span className="flex flex-wrap gap-2">
          {BUCKETS[units].map((b) => (
            <button
              key={b}
              type="button"
              aria-pressed={bucket === b}
              onClick={() => {
                picked.current = true;
                setBucket(b);
              }}
              className="min-h-9 rounded-md border border-limestone-400 px-3 aria-pressed:bg-creek-800 aria-pressed:text-limestone-50 dark:border-creek-500 dark:aria-pressed:bg-limestone-200 dark:aria-pressed:text-creek-950"
            >
              {b.replace('gal', 'US gal')}
            </button>
          ))}
        </span>
      </Field>
      <button type="button" onClick={tap} disabled={volumeM3 === null} className={BIG_BUTTON} data-testid="trial-tap">
        {startedAt === null ? (
          <>
            <span className="text-2xl">Start</span>
            <span className="text-base font-normal">as the bucket goes under the outlet</span>
          </>
        ) : (
          <>
            <span className="text-2xl">Stop</span>
            <span className="text-base font-normal">
              when it is full · <Seconds s={(now - startedAt) / 1000} />
            </span>
          </>
        )}
      </button>
      {trials.length > 0 ? (
        <ol className="flex flex-col gap-1" aria-label="Trials">
          {trials.map((t, i) => (
            <li
              key={i}
              className="flex items-center justify-between gap-2 border-b border-limestone-300 py-1 dark:border-creek-600"
            >
              <span>
                Trial {i + 1}: {formatQuantity('volume', t.volumeM3, units)} in{' '}
                <span className="cw-num">{formatNumber(t.timeS)} s</span> ={' '}
                <span className="cw-num font-semibold whitespace-nowrap">{flow(t.volumeM3 / t.timeS)}</span>
              </span>
              <button type="button" className="cw-link min-h-9 px-2" onClick={() => drop(i)}>
                Remove<span className="sr-only"> trial {i + 1}</span>
              </button>
            </li>
          ))}
        </ol>
      ) : (
        <p className="cw-muted text-sm">Time three fills or more; the mean of them is the flow.</p>
      )}
      {r?.stats ? (
        <div aria-live="polite" data-testid="trial-result" className="flex flex-col gap-1">
          <p className="text-lg">
            Mean flow <span className="cw-num text-2xl font-semibold">{flow(r.flowM3s)}</span>
          </p>
          {r.stats.n > 1 ? (
            <p className="cw-muted text-sm">
              Spread: {flow(r.stats.minM3s)} to {flow(r.stats.maxM3s)}, standard deviation {flow(r.stats.sdM3s)}.
            </p>
          ) : null}
          {out!.warnings.map((w) => (
            <p key={w.code} className="text-sm text-signal-700 dark:text-signal-300" data-warning={w.code}>
              {formatMessage(w, units)}
            </p>
          ))}
          {out!.warnings.length === 0 ? (
            <p className="text-sm text-moss-700 dark:text-moss-300">The trials agree: you can use the mean.</p>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
