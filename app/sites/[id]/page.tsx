import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import 'katex/dist/katex.min.css';
import { currentUserInPage } from '@/lib/auth/session';
import { loadSite, SiteError, type SiteView } from '@/lib/sites/store';
import { formatDate } from '@/lib/dates';
import { SitePlanner } from '@/components/plan/SitePlanner';
import { SiteSettings } from '@/components/plan/SiteSettings';
import { VISIBILITY_WORDS } from '@/components/plan/words';
import { Caution } from '@/components/Caution';
import { SiteQuestions } from '@/components/sites/SiteQuestions';
import { SiteFieldLog } from '@/components/sites/SiteFieldLog';
import { KeepForOffline } from '@/components/sites/KeepForOffline';
import { siteTests } from '@/lib/sites/site-tests';
import { VISITED_LIMIT } from '@/lib/offline/kept';

export const dynamic = 'force-dynamic';
type Params = Promise<{ id: string }>;
type SP = Promise<Record<string, string | string[] | undefined>>;

async function load(id: string, version?: string | string[]): Promise<SiteView> {
  const v = typeof version === 'string' ? Number(version) : undefined;
  if (v !== undefined && !(Number.isInteger(v) && v > 0)) notFound();
  try {
    return await loadSite(await currentUserInPage(), id, v);
  } catch (err) {
    // a private site is nobody else's business: it does not exist for them
    if (err instanceof SiteError && err.status === 404) notFound();
    throw err;
  }
}

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  try {
    const site = await loadSite(await currentUserInPage(), (await params).id);
    // a site shared by link is not for search engines
    return { title: site.name, robots: site.visibility === 'public' ? undefined : { index: false } };
  } catch {
    return { title: 'Site' };
  }
}

export default async function SitePage({ params, searchParams }: { params: Params; searchParams: SP }) {
  const { id } = await params;
  const site = await load(id, (await searchParams).version);
  const newest = site.versions[site.versions.length - 1]?.version;
  const old = site.current.version !== newest;
  const viewer = site.mine ? await currentUserInPage() : null;
  // the newest tests go with the site when the member keeps it for offline
  const recent = viewer ? ((await siteTests(viewer, site.id))?.rows ?? []).slice(-VISITED_LIMIT) : [];
  return (
    <article className="flex flex-col gap-4">
      <header className="flex flex-col gap-1">
        <h1 className="font-serif text-3xl font-semibold">{site.name}</h1>
        <p className="cw-muted font-sans text-sm">
          {site.mine ? 'Your site' : `${site.owner.displayName}’s site`} · version {site.current.version} of{' '}
          {site.versions.length}, saved {formatDate(site.current.createdAt)} ·{' '}
          <span data-testid="site-visibility">{VISIBILITY_WORDS[site.visibility]}</span>
        </p>
        {old ? (
          <p className="font-sans text-sm font-semibold">
            This is an older version.{' '}
            <Link href={`/sites/${site.id}`} className="cw-link">
              See the newest
            </Link>
          </p>
        ) : null}
      </header>
      {site.mine ? <SiteSettings id={site.id} name={site.name} visibility={site.visibility} /> : null}
      {viewer && !old ? (
        <KeepForOffline
          memberId={viewer.id}
          path={`/sites/${site.id}`}
          alsoKeep={recent.map((t) => `/field-log/${t.id}`)}
        />
      ) : null}
      {site.versions.length > 1 ? (
        <nav aria-label="Versions" className="flex flex-wrap gap-3 font-sans text-sm" data-print-hide>
          <span className="cw-muted">Versions:</span>
          {site.versions.map((v) => (
            <Link
              key={v.version}
              href={`/sites/${site.id}?version=${v.version}`}
              className="cw-link inline-flex min-h-6 items-center"
              aria-current={v.version === site.current.version ? 'page' : undefined}
            >
              {v.version} ({formatDate(v.createdAt)})
            </Link>
          ))}
        </nav>
      ) : null}
      <SitePlanner
        props={site.current.survey}
        save={site.mine ? { kind: 'version', siteId: site.id } : { kind: 'new' }}
        key={site.current.version}
      />
      <SiteFieldLog site={site} />
      <SiteQuestions site={site} />
      <Caution title="A plan, not a permit">
        A ram’s pump side and delivery line hold pressure, and moving water can hurt people. Taking water from a stream
        may need a permit, and water for drinking must be tested and treated as your local rules say. Follow local codes
        and ask a licensed plumber or engineer where it matters.
      </Caution>
    </article>
  );
}
