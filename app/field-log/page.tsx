import type { Metadata } from 'next';
import { ComingSoon } from '@/components/ComingSoon';

export const metadata: Metadata = { title: 'Field log' };

export default function FieldLogPage() {
  return (
    <ComingSoon title="Field log">
      <p>Measured installations — fall, lift, drive flow and what came out of the delivery pipe — will be logged here.</p>
    </ComingSoon>
  );
}
