import type { Metadata } from 'next';
import { FieldVisit } from '@/components/field-kit/FieldVisit';
import { Caution } from '@/components/Caution';

export const metadata: Metadata = {
  title: 'Trial timer',
  description: 'Bucket trials timed with one hand, the mean flow and its spread, and beats a minute by tapping.',
};

export default function TrialTimerPage() {
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Trial timer</h1>
      <Caution title="At the water">
        Streams rise fast and banks are slippery: do not measure alone or in high water. Keep hands clear of the waste
        valve while it beats, and stand where its spray and the outlet’s water do not undercut your footing.
      </Caution>
      <FieldVisit />
    </div>
  );
}
