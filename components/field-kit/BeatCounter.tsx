'use client';

import { useId, useState } from 'react';
import { BEAT_COUNT_SECONDS, beatsPerMinute } from '@/lib/hydraulics';
import { formatNumber } from '@/lib/calculators';
import { BIG_BUTTON, Seconds, useTicker } from './parts';

/**
 * Beats a minute by ear: tap on each beat of the waste valve for 15 to 30 seconds. The
 * count stops by itself at 30 s, so the reader can keep their eyes on the pump.
 */
export function BeatCounter({ onCount }: { onCount?: (bpm: number) => void }) {
  const id = useId();
  const [taps, setTaps] = useState<number[]>([]);
  const [done, setDone] = useState(false);
  const counting = taps.length > 0 && !done;
  const now = useTicker(counting);
  const elapsed = taps.length > 0 ? ((done ? taps[taps.length - 1]! : now) - taps[0]!) / 1000 : 0;

  const finish = (list: number[]) => {
    setDone(true);
    if (list.length >= 3) onCount?.(beatsPerMinute({ tapsS: list.map((t) => t / 1000) }).bpm);
  };
  const tap = () => {
    if (done) return;
    const t = performance.now();
    const list = [...taps, t];
    setTaps(list);
    if ((t - list[0]!) / 1000 >= BEAT_COUNT_SECONDS.max) finish(list);
  };

  const result = done && taps.length >= 3 ? beatsPerMinute({ tapsS: taps.map((t) => t / 1000) }) : null;

  return (
    <section aria-labelledby={`${id}-h`} className="cw-card flex flex-col gap-3 font-sans" data-testid="beat-counter">
      <h2 id={`${id}-h`} className="font-serif text-xl font-semibold">
        Beats a minute
      </h2>
      <p className="cw-muted text-sm">
        Tap on each beat of the waste valve for {BEAT_COUNT_SECONDS.min} to {BEAT_COUNT_SECONDS.max} seconds, then press
        Done.
      </p>
      <button type="button" onClick={tap} disabled={done} className={BIG_BUTTON} data-testid="beat-tap">
        <span className="text-2xl">{taps.length === 0 ? 'Tap on the first beat' : 'Beat'}</span>
        {counting ? (
          <span className="text-base font-normal">
            {taps.length} taps · <Seconds s={elapsed} />
          </span>
        ) : null}
      </button>
      <div className="flex flex-wrap gap-3">
        <button
          type="button"
          className="min-h-9 rounded-md border border-limestone-400 px-3 disabled:opacity-50 dark:border-creek-500"
          disabled={!counting || taps.length < 3}
          onClick={() => finish(taps)}
        >
          Done
        </button>
        <button
          type="button"
          className="cw-link min-h-9 px-2"
          disabled={taps.length === 0}
          onClick={() => {
            setTaps([]);
            setDone(false);
          }}
        >
          Count again
        </button>
      </div>
      {result ? (
        <div aria-live="polite" data-testid="beat-result" className="flex flex-col gap-1">
          <p className="text-lg">
            <span className="cw-num text-2xl font-semibold">{formatNumber(Math.round(result.bpm))}</span> beats a minute
            <span className="cw-muted text-sm">
              {' '}
              ({result.beats} beats in <Seconds s={result.durationS} />)
            </span>
          </p>
          {result.tooShort ? (
            <p className="text-sm text-signal-700 dark:text-signal-300">
              Counted for under {BEAT_COUNT_SECONDS.min} seconds: one tap early or late moves this a lot. Count again
              for longer.
            </p>
          ) : null}
          {result.uneven ? (
            <p className="text-sm text-signal-700 dark:text-signal-300">
              One gap is far longer or shorter than the others: a beat was missed or tapped twice. Count again.
            </p>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
