import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { Caution } from '@/components/Caution';
import { EntryForm } from '@/components/field-log/EntryForm';

export const metadata: Metadata = { title: 'Record a test' };
export const dynamic = 'force-dynamic';

export default async function NewFieldLogEntryPage() {
  const user = await currentUserInPage();
  const state: 'signed-out' | 'refused' | 'form' = !user
    ? 'signed-out'
    : can(user, 'fieldLog.create')
      ? 'form'
      : 'refused';
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Record a test</h1>
      <p className="cw-prose cw-muted max-w-prose">
        One test of one installation. The engine works out both efficiencies and what the yield estimate would have
        predicted.
      </p>
      <Caution title="Measuring safely">
        Keep hands clear of a beating waste valve, stop the pump before opening any fitting, and follow local codes and
        licensed practice where the water is for drinking.
      </Caution>
      {state === 'signed-out' ? (
        <p className="cw-card max-w-prose font-sans">
          <Link href="/sign-in?callbackUrl=/field-log/new" className="cw-link">
            Sign in to record a test
          </Link>
          ; reading the field log needs no account.
        </p>
      ) : state === 'refused' ? (
        <p className="cw-card max-w-prose font-sans">{REFUSAL['fieldLog.create']}</p>
      ) : (
        <EntryForm />
      )}
    </div>
  );
}
