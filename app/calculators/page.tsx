import type { Metadata } from 'next';
import { ComingSoon } from '@/components/ComingSoon';

export const metadata: Metadata = { title: 'Calculators' };

export default function CalculatorsPage() {
  return (
    <ComingSoon title="Calculators">
      <p>
        The yield estimate, array planner, drive pipe check, delivery line, source flow, demand and storage calculators
        and the stall check are being built.
      </p>
    </ComingSoon>
  );
}
