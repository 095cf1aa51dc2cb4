import type { Metadata } from 'next';
import Link from 'next/link';
import { OutboxPanel } from '@/components/offline/OutboxPanel';
import { KeepEntryForm } from '@/components/field-kit/KeepEntryForm';

export const metadata: Metadata = {
  title: 'Field kit',
  description: 'Tools for the creek: a one-handed trial timer, a beat counter and a hose-level fall survey.',
};

const TOOLS = [
  {
    href: '/field-kit/timer',
    title: 'Trial timer',
    text: 'Bucket trials at the outlet or the source, one hand, the mean and spread as you go; and beats a minute by tapping.',
  },
  {
    href: '/field-kit/fall',
    title: 'Fall by hose level',
    text: 'Stage by stage from the intake to the pump, the running total as the fall, and a check walking back.',
  },
  {
    href: '/field-log/new',
    title: 'Record a test',
    text: 'A field log test with its photos; with no signal it waits on this phone and is sent once you are back.',
  },
  {
    href: '/plan',
    title: 'Plan a site',
    text: 'The survey in, a verdict, a design and a parts list out.',
  },
] as const;

export default function FieldKitPage() {
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Field kit</h1>
      <p className="cw-prose cw-muted">What to take to the water: the measuring is done there, with wet hands.</p>
      <ul className="grid gap-3 sm:grid-cols-2">
        {TOOLS.map((t) => (
          <li key={t.href} className="cw-card flex flex-col gap-1 font-sans">
            <Link href={t.href} className="cw-link inline-flex min-h-6 items-center font-serif text-xl font-semibold">
              {t.title}
            </Link>
            <p className="text-sm">{t.text}</p>
          </li>
        ))}
      </ul>
      <OutboxPanel />
      <KeepEntryForm />
    </div>
  );
}
