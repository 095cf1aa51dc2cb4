import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { cache } from 'react';
import { publicProfile } from '@/lib/accounts/profile';
import type { Role } from '@/models/User';
import { formatDate, formatMonth } from '@/lib/dates';
import { currentUserInPage } from '@/lib/auth/session';
import { sitesOnProfile } from '@/lib/sites/links';
import { VISIBILITY_WORDS } from '@/components/plan/words';
import { CalculationItem } from '@/components/calculations/CalculationItem';
import type { SiteVisibility } from '@/lib/vocabulary';

export const dynamic = 'force-dynamic';

// one query for the metadata and the page of a render
const findPerson = cache(publicProfile);

export async function generateMetadata({ params }: { params: Promise<{ handle: string }> }): Promise<Metadata> {
  const { handle } = await params;
  try {
    const found = await findPerson(handle);
    return { title: found ? found.person.displayName : 'Member not found' };
  } catch {
    return { title: 'Member' };
  }
}

/** The role worth saying out loud on a profile; a plain member has no label. */
const ROLE_LABEL: Record<Role, 'expert' | 'moderator' | null> = {
  expert: 'expert',
  moderator: 'moderator',
  admin: null,
  member: null,
};

export default async function PersonPage({ params }: { params: Promise<{ handle: string }> }) {
  const { handle } = await params;
  const found = await findPerson(handle);
  if (!found) notFound();
  const { person, calculations } = found;
  const { own, sites } = await sitesOnProfile(await currentUserInPage(), person.id);
  const label = ROLE_LABEL[person.role as Role];

  return (
    <div className="flex max-w-3xl flex-col gap-4">
      <header className="flex flex-col gap-1">
        <h1 className="flex flex-wrap items-center gap-3 font-serif text-3xl font-semibold">
          {person.displayName}
          {label ? (
            <span
              data-testid="role-label"
              className={`rounded px-2 py-0.5 font-sans text-sm font-semibold ${label === 'expert' ? 'bg-moss text-limestone-50' : 'bg-creek text-limestone-50 dark:bg-creek-300 dark:text-creek-950'}`}
            >
              {label}
            </span>
          ) : null}
        </h1>
        <p className="cw-muted font-sans text-sm">
          @{person.handle}
          {person.region ? ` · ${person.region}` : ''} · member since {formatMonth(person.createdAt)}
        </p>
      </header>
      {person.bio ? <p className="cw-prose whitespace-pre-line">{person.bio}</p> : null}
      {sites.length || own ? (
        <section aria-labelledby="sites" className="flex flex-col gap-2" data-testid="person-sites">
          <h2 id="sites" className="font-serif text-xl font-semibold">
            {own ? 'Your sites' : 'Sites'}
          </h2>
          {sites.length === 0 ? (
            <p className="cw-muted font-sans text-sm">
              You have not saved a site yet.{' '}
              <Link href="/plan" className="cw-link">
                Plan a site
              </Link>{' '}
              and save it: it is listed here, private until you share it.
            </p>
          ) : (
            <ul className="flex flex-col gap-2 font-sans">
              {sites.map((s) => (
                <li key={s.id} className="cw-card py-3">
                  <Link href={`/sites/${s.id}`} className="cw-link font-semibold">
                    {s.name}
                  </Link>
                  <p className="cw-muted text-sm">
                    {own ? `${VISIBILITY_WORDS[s.visibility as SiteVisibility]} · ` : ''}changed{' '}
                    {formatDate(s.updatedAt)}
                  </p>
                </li>
              ))}
            </ul>
          )}
        </section>
      ) : null}
      <section aria-labelledby="calcs" className="flex flex-col gap-2">
        <h2 id="calcs" className="font-serif text-xl font-semibold">
          Worked calculations
        </h2>
        {calculations.length === 0 ? (
          <p className="cw-muted font-sans text-sm">
            {`${person.displayName} has not saved a worked calculation yet. Any member can save one from a calculator’s results, and it is listed here; `}
            <Link href="/calculators" className="cw-link">
              open the calculators
            </Link>
            .
          </p>
        ) : (
          <ul className="flex flex-col gap-2 font-sans">
            {calculations.map((c) => (
              <CalculationItem key={c.publicId} c={{ ...c, id: c.publicId }} />
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
