import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import 'katex/dist/katex.min.css';
import { CALCULATOR_LIST, getCalculator } from '@/lib/calculators';
import { CalculatorById } from '@/components/calculators/Calculators';
import { Caution } from '@/components/Caution';
import { SaveToSite } from '@/components/sites/SaveTarget';
import { currentUserInPage } from '@/lib/auth/session';
import { ownSiteForCalculator } from '@/lib/sites/links';

type Params = Promise<{ tool: string }>;
type SP = Promise<Record<string, string | string[] | undefined>>;

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const entry = getCalculator((await params).tool);
  return entry ? { title: entry.name, description: entry.line } : {};
}

export default async function CalculatorPage({ params, searchParams }: { params: Params; searchParams: SP }) {
  const { tool } = await params;
  const entry = getCalculator(tool);
  if (!entry) notFound();
  const sp = await searchParams;
  // The share link's inputs, as typed (with their units).
  const props = Object.fromEntries(
    Object.entries(sp).filter((e): e is [string, string] => typeof e[1] === 'string' && e[0] !== 'site'),
  );
  // opened from the reader's own site: what they save is linked to it
  const site =
    typeof sp.site === 'string' && /^[0-9A-Za-z]{6,16}$/.test(sp.site)
      ? await ownSiteForCalculator(await currentUserInPage(), sp.site)
      : null;
  const card = <CalculatorById id={tool} props={props} />;
  return (
    <div className="flex flex-col gap-4">
      <nav aria-label="Breadcrumb" className="cw-muted text-sm" data-print-hide>
        <Link href="/calculators" className="cw-link">
          Calculators
        </Link>{' '}
        › {entry.name}
      </nav>
      <h1 className="font-serif text-3xl font-semibold">{entry.name}</h1>
      <p className="cw-prose cw-muted">
        {entry.line}{' '}
        <Link href={`/guides/${entry.guide}`} className="cw-link">
          Read the guide
        </Link>
        .
      </p>
      {site ? (
        <p className="cw-muted font-sans text-sm" data-testid="from-site">
          Opened with the numbers of your site{' '}
          <Link href={`/sites/${site.id}`} className="cw-link">
            {site.name}
          </Link>
          ; a worked calculation you save here is listed on the site.
        </p>
      ) : null}
      {site ? <SaveToSite site={{ id: site.id, name: site.name }}>{card}</SaveToSite> : card}
      <Caution title="Numbers for planning">
        These results come from standard formulas and typical values; real pumps, pipes and streams vary. Pressure and
        moving water can hurt people: follow local codes and ask a licensed plumber or engineer where it matters.
      </Caution>
      <nav aria-label="Other calculators" className="flex flex-wrap gap-3 text-sm" data-print-hide>
        {CALCULATOR_LIST.filter((c) => c.id !== tool).map((c) => (
          <Link key={c.id} href={`/calculators/${c.id}`} className="cw-link">
            {c.name}
          </Link>
        ))}
      </nav>
    </div>
  );
}
