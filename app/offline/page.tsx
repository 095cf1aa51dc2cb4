import type { Metadata } from 'next';
import Link from 'next/link';

export const metadata: Metadata = { title: 'No signal', robots: { index: false } };

/** What the service worker (app/sw.ts) shows for a page it has no copy of while offline. */
export default function OfflinePage() {
  return (
    <div className="cw-card mx-auto max-w-prose">
      <h1 className="font-serif text-2xl font-semibold">No signal, and no copy of this page</h1>
      <p className="cw-muted mt-2">
        This phone is offline and has not kept this page. Guides, calculators, the planner and the field kit you have
        opened before still work; your sites and account pages need the network.
      </p>
      <p className="mt-4 flex flex-wrap gap-4">
        <Link href="/field-kit" className="cw-link">
          Field kit
        </Link>
        <Link href="/guides" className="cw-link">
          Guides
        </Link>
        <Link href="/calculators" className="cw-link">
          Calculators
        </Link>
      </p>
    </div>
  );
}
