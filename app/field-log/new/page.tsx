import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { Caution } from '@/components/Caution';
import { EntryForm } from '@/components/field-log/EntryForm';
import { loadSite, SiteError } from '@/lib/sites/store';
import { planLayout } from '@/lib/sites/measured';
import { entryPrefill } from '@/lib/sites/prefill';
import { readUnitPreference } from '@/lib/units/server';
import type { Actor } from '@/lib/auth/policy';

export const metadata: Metadata = { title: 'Record a test' };
export const dynamic = 'force-dynamic';

type SP = Promise<Record<string, string | string[] | undefined>>;

/** The member's own site the test is for, with the form filled from its newest plan; why not, when it cannot be. */
async function fromSite(user: Actor, id: string) {
  try {
    const site = await loadSite(user, id);
    if (!site.mine) return { refused: 'Tests go only on your own sites; this one is recorded without a site.' };
    const units = await readUnitPreference();
    return {
      site: { id: site.id, name: site.name, version: site.current.version },
      initial: entryPrefill(site.name, planLayout(site.current.plan), units),
    };
  } catch (err) {
    if (err instanceof SiteError && err.status === 404)
      return { refused: 'No such site of yours; this test is recorded without a site.' };
    throw err;
  }
}

export default async function NewFieldLogEntryPage({ searchParams }: { searchParams: SP }) {
  const user = await currentUserInPage();
  const siteParam = (await searchParams).site;
  const siteId = typeof siteParam === 'string' && siteParam ? siteParam : undefined;
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
          <Link
            href={`/sign-in?callbackUrl=${encodeURIComponent(siteId ? `/field-log/new?site=${siteId}` : '/field-log/new')}`}
            className="cw-link"
          >
            Sign in to record a test
          </Link>
          ; reading the field log needs no account.
        </p>
      ) : state === 'refused' ? (
        <p className="cw-card max-w-prose font-sans">{REFUSAL['fieldLog.create']}</p>
      ) : (
        <SiteEntryForm user={user!} siteId={siteId} />
      )}
    </div>
  );
}

async function SiteEntryForm({ user, siteId }: { user: Actor; siteId?: string }) {
  const linked = siteId ? await fromSite(user, siteId) : null;
  if (!linked || 'refused' in linked)
    return (
      <>
        {linked ? <p className="cw-card max-w-prose font-sans text-sm">{linked.refused}</p> : null}
        <EntryForm />
      </>
    );
  return <EntryForm initial={linked.initial} site={linked.site} />;
}
