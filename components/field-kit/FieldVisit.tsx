'use client';

import { useState } from 'react';
import Link from 'next/link';
import { can } from '@/lib/auth/policy';
import { fromSI } from '@/lib/hydraulics';
import { inputNumber } from '@/lib/calculators';
import { useUnits } from '@/components/units/UnitsProvider';
import { EntryForm } from '@/components/field-log/EntryForm';
import { TrialTimer, type Trial } from './TrialTimer';
import { BeatCounter } from './BeatCounter';
import { useFieldMember } from './useFieldMember';
import { KeepEntryForm } from './KeepEntryForm';

/**
 * The timer's screen: bucket trials and beats, and, for a member, the field log test they
 * make, recorded from the same page so nothing is typed twice and nothing needs a page the
 * phone might not reach.
 */
export function FieldVisit() {
  const { actor, handle, offline } = useFieldMember();
  const { units } = useUnits();
  const [trials, setTrials] = useState<Trial[]>([]);
  const [bpm, setBpm] = useState<number | null>(null);
  const [recording, setRecording] = useState(false);

  // the trials as a member would type them: "5 gal" or "20 L", seconds to the tenth
  const unit = units === 'US' ? 'gal' : 'L';
  const typed = trials.map((t) => ({
    volume: `${inputNumber(fromSI(t.volumeM3, unit, 'volume'))} ${unit}`,
    seconds: String(Math.round(t.timeS * 10) / 10),
  }));

  return (
    <>
      <KeepEntryForm />
      <TrialTimer onTrials={setTrials} />
      <BeatCounter onCount={setBpm} />
      {trials.length > 0 ? (
        <section aria-labelledby="record-h" className="flex flex-col gap-3" data-testid="field-visit-record">
          <h2 id="record-h" className="font-serif text-xl font-semibold">
            Keep these in the field log
          </h2>
          {!can(actor, 'fieldLog.create') ? (
            <p className="cw-card font-sans text-sm">
              <Link href="/sign-in?callbackUrl=/field-kit/timer" className="cw-link">
                Sign in
              </Link>{' '}
              to record these trials as a field log test; the trials stay on this screen.
            </p>
          ) : recording ? (
            <>
              {offline ? (
                <p className="cw-card font-sans text-sm" data-testid="known-offline">
                  No signal: recorded as @{handle}, kept on this phone and sent when the signal is back. If you have
                  been signed out by then, it waits for you to sign in again.
                </p>
              ) : null}
              {/* the form takes the trials timed so far; one timed later is added in the form */}
              <EntryForm initialTrials={typed} initial={bpm !== null ? { bpm: String(Math.round(bpm)) } : {}} />
            </>
          ) : (
            <button
              type="button"
              onClick={() => setRecording(true)}
              className="min-h-9 self-start rounded-md bg-clay-700 px-3 py-1.5 font-sans font-semibold text-limestone-50 hover:bg-clay-800 dark:bg-clay-300 dark:text-creek-950"
            >
              Record {trials.length === 1 ? 'this trial' : `these ${trials.length} trials`} as a field log test
            </button>
          )}
        </section>
      ) : null}
    </>
  );
}
