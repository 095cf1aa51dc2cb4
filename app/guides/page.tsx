import type { Metadata } from 'next';
import { ComingSoon } from '@/components/ComingSoon';

export const metadata: Metadata = { title: 'Guides' };

export default function GuidesPage() {
  return (
    <ComingSoon title="Guides">
      <p>Field guides — from how one beat of a ram works to tuning the waste valve — are being written.</p>
    </ComingSoon>
  );
}
