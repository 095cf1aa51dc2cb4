import type { Metadata } from 'next';
import Link from 'next/link';
import { FallSurvey } from '@/components/field-kit/FallSurvey';
import { Caution } from '@/components/Caution';

export const metadata: Metadata = {
  title: 'Fall by hose level',
  description: 'Record a hose-level survey stage by stage; the running total is the fall.',
};

export default function FallSurveyPage() {
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Fall by hose level</h1>
      <p className="cw-prose cw-muted">
        How to fill the hose and read the poles is in{' '}
        <Link href="/guides/surveying-fall-and-flow" className="cw-link">
          surveying fall and flow
        </Link>
        .
      </p>
      <Caution title="On the bank">
        Streams rise fast and banks are slippery: survey with someone else and not in high water, and keep off undercut
        banks when you stand the pole at the intake.
      </Caution>
      <FallSurvey />
    </div>
  );
}
