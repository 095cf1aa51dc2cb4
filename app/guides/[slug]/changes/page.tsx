import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { readGuideFile } from '@/lib/guides/content';
import { checkedVersion } from '@/lib/guides/safety';
import { formatDate } from '@/lib/dates';
import { GuideChanges } from '@/components/guides/GuideChanges';
import { SafetyBadge } from '@/components/guides/SafetyBadge';

export const dynamic = 'force-dynamic';

type SP = Record<string, string | string[] | undefined>;

export async function generateMetadata({ params }: { params: Promise<{ slug: string }> }): Promise<Metadata> {
  const guide = readGuideFile((await params).slug);
  return guide ? { title: `What changed since its safety check: ${guide.meta.title}` } : {};
}

/** /guides/:slug/changes[?check=id] — the guide now against the text a safety check was made on. */
export default async function GuideChangesPage({
  params,
  searchParams,
}: {
  params: Promise<{ slug: string }>;
  searchParams: Promise<SP>;
}) {
  const { slug } = await params;
  const guide = readGuideFile(slug);
  if (!guide) notFound();
  const raw = (await searchParams).check;
  if (raw !== undefined && (typeof raw !== 'string' || !/^[1-9]\d{0,9}$/.test(raw))) notFound();
  const version = await checkedVersion(guide, raw === undefined ? undefined : Number(raw));
  if (!version) notFound();
  const { check, before, after } = version;

  return (
    <article className="flex flex-col gap-4">
      <nav aria-label="Breadcrumb" className="cw-muted text-sm">
        <Link href="/guides" className="cw-link">
          Guides
        </Link>{' '}
        ›{' '}
        <Link href={`/guides/${slug}`} className="cw-link">
          {guide.meta.title}
        </Link>
      </nav>
      <h1 className="font-serif text-2xl font-semibold leading-tight sm:text-3xl">
        What changed in “{guide.meta.title}” since its safety check
      </h1>
      <div className="flex flex-col gap-1 font-sans text-sm">
        <p>
          <SafetyBadge state={check.current ? (check.verdict === 'sound' ? 'checked' : 'needs changes') : 'changed'} />
        </p>
        <p data-testid="changes-dates">
          {`Checked by ${check.expert.displayName} on ${formatDate(check.checkedAt)} (${check.verdict})`}
          {check.checkedVersionUpdated ? `, on the version updated ${formatDate(check.checkedVersionUpdated)}` : ''}
          {`; the guide now is the version updated ${formatDate(guide.meta.updated)}.`}
        </p>
        {check.notes ? <p className="cw-muted">{`The expert’s notes: ${check.notes}`}</p> : null}
        <p className="cw-muted">
          Added words are highlighted, removed words struck through; long unchanged stretches are cut to […].
        </p>
      </div>
      <GuideChanges before={before} after={after} />
      <p>
        <Link href={`/guides/${slug}`} className="cw-link">
          Back to the guide
        </Link>
      </p>
    </article>
  );
}
