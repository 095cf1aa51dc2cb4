'use client';

import Link from 'next/link';
import { useId, useState } from 'react';
import { fromSI, levelSurvey, parseQuantity, roundAsWritten, type UnitSystem } from '@/lib/hydraulics';
import { formatNumber, formatQuantity } from '@/lib/calculators';
import { useUnits } from '@/components/units/UnitsProvider';

interface Station {
  upper: string;
  lower: string;
}
const EMPTY: Station = { upper: '', lower: '' };

/** A pole reading as typed; a bare number is in the reader's pole marks (inches or centimetres). */
function reading(text: string, units: UnitSystem): number | null {
  const t = text.trim();
  if (t === '') return null;
  try {
    const m = parseQuantity(/[a-z"']/i.test(t) ? t : `${t} ${units === 'US' ? 'in' : 'cm'}`, 'smallLength');
    return m >= 0 && m <= 5 ? m : null;
  } catch {
    return null;
  }
}

/** The stations that read, in metres; null when one typed does not. */
function read(stations: Station[], units: UnitSystem) {
  const legs = [];
  for (const s of stations) {
    if (s.upper.trim() === '' && s.lower.trim() === '') continue;
    const upperM = reading(s.upper, units);
    const lowerM = reading(s.lower, units);
    if (upperM === null || lowerM === null) return null;
    legs.push({ upperM, lowerM });
  }
  return legs;
}

/**
 * The hose-level survey: a station for each stage walked down from the intake to the
 * pump, the running total as the fall, and a closure check if the reader walks back.
 */
export function FallSurvey() {
  const { units } = useUnits();
  const id = useId();
  const [down, setDown] = useState<Station[]>([{ ...EMPTY }]);
  const [back, setBack] = useState<Station[]>([]);
  const mark = units === 'US' ? 'in' : 'cm';

  const downLegs = read(down, units);
  const backLegs = read(back, units);
  const survey = downLegs && downLegs.length > 0 && backLegs ? levelSurvey({ down: downLegs, back: backLegs }) : null;
  // rounded as a tape is read: 4.1 ft or 1.22 m for the fall, and a stage in the poles' own marks (18 in, 46 cm)
  const written = (kind: 'length' | 'smallLength', m: number) => {
    const unit = kind === 'length' ? (units === 'US' ? 'ft' : 'm') : mark;
    return `${formatNumber(roundAsWritten(fromSI(m, unit, kind), unit, kind))} ${unit}`;
  };
  const fallText = (m: number) => written('length', m);

  const table = (list: Station[], set: (s: Station[]) => void, which: 'down' | 'back') => (
    <ol
      className="flex flex-col gap-2"
      aria-label={which === 'down' ? 'Stations walking down' : 'Stations walking back'}
    >
      {list.map((s, i) => {
        const bad = (t: string) => t.trim() !== '' && reading(t, units) === null;
        const leg = which === 'down' ? survey?.legs[i] : undefined;
        return (
          <li
            key={i}
            className="flex flex-wrap items-end gap-2 border-b border-limestone-300 pb-2 dark:border-creek-600"
          >
            <span className="w-16 text-sm font-semibold">Stage {i + 1}</span>
            {(['upper', 'lower'] as const).map((k) => (
              <label key={k} className="flex flex-col text-xs">
                <span>{k === 'upper' ? 'Uphill pole reads' : 'Downhill pole reads'}</span>
                <input
                  value={s[k]}
                  inputMode="decimal"
                  placeholder={mark}
                  aria-invalid={bad(s[k]) || undefined}
                  onChange={(e) => set(list.map((x, j) => (j === i ? { ...x, [k]: e.target.value } : x)))}
                  className="w-28 rounded-md border border-limestone-400 bg-limestone-50 px-2 py-1.5 text-base aria-invalid:border-signal-700 dark:border-creek-500 dark:bg-creek-950"
                />
              </label>
            ))}
            {leg ? (
              <span className="cw-num text-sm" data-testid="stage-drop">
                {leg.dropM >= 0 ? 'drop' : 'rise'} {written('smallLength', Math.abs(leg.dropM))} · fall so far{' '}
                {fallText(leg.runningM)}
              </span>
            ) : null}
            {bad(s.upper) || bad(s.lower) ? (
              <span role="alert" className="basis-full text-xs text-signal-700 dark:text-signal-300">
                Read the pole in {units === 'US' ? 'inches' : 'centimetres'}, up from its foot (at most{' '}
                {formatQuantity('length', 5, units)}).
              </span>
            ) : null}
          </li>
        );
      })}
      <li>
        <button type="button" className="cw-link min-h-9" onClick={() => set([...list, { ...EMPTY }])}>
          Add a stage
        </button>
      </li>
    </ol>
  );

  return (
    <section aria-labelledby={`${id}-h`} className="cw-card flex flex-col gap-3 font-sans" data-testid="fall-survey">
      <h2 id={`${id}-h`} className="font-serif text-xl font-semibold">
        Stages from the intake down
      </h2>
      <p className="cw-muted text-sm">
        Start at the intake with the uphill pole’s foot at the water surface. At each stage read the water in the hose
        on both poles, up from each pole’s foot, then leapfrog downhill. A bare number is in{' '}
        {units === 'US' ? 'inches' : 'centimetres'}.
      </p>
      {table(down, setDown, 'down')}
      {survey ? (
        <p className="text-lg" aria-live="polite" data-testid="fall-total">
          Fall <span className="cw-num text-2xl font-semibold">{fallText(survey.fallM)}</span>{' '}
          {survey.fallM > 0 ? (
            <Link
              href={`/plan?fall=${encodeURIComponent(fallText(survey.fallM))}&fallMethod=hose-level`}
              className="cw-link text-sm"
            >
              Plan a site with this fall
            </Link>
          ) : null}
        </p>
      ) : null}
      <h3 className="font-serif text-lg font-semibold">Walking back up (a check)</h3>
      <p className="cw-muted text-sm">
        Survey back to the intake the same way; the two falls should agree within{' '}
        {units === 'US' ? 'an inch or two' : 'a few centimetres'}.
      </p>
      {back.length > 0 ? (
        table(back, setBack, 'back')
      ) : (
        <button type="button" className="cw-link min-h-9 self-start" onClick={() => setBack([{ ...EMPTY }])}>
          Walk back and check
        </button>
      )}
      {survey?.closure ? (
        <p
          data-testid="fall-closure"
          className={
            survey.closure.closes ? 'text-moss-700 dark:text-moss-300' : 'text-signal-700 dark:text-signal-300'
          }
        >
          Walking back gave {fallText(survey.closure.backFallM)},{' '}
          {written('smallLength', Math.abs(survey.closure.misclosureM))}{' '}
          {survey.closure.closes
            ? 'apart: the survey closes.'
            : `apart, more than ${written('smallLength', survey.closure.toleranceM)}: survey again before you buy pipe.`}
        </p>
      ) : null}
    </section>
  );
}
