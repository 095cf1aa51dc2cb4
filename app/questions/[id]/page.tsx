import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import 'katex/dist/katex.min.css';
import { loadThread, type ThreadView } from '@/lib/forum/thread';
import { ForumError } from '@/lib/forum/errors';
import { currentUserInPage } from '@/lib/auth/session';
import { readUnitPreference } from '@/lib/units/server';
import { isDatabaseUnavailable } from '@/lib/db/errors';
import { idParam } from '@/lib/http/guard';
import { siteSheetRows } from '@/components/questions/site-sheet';
import { Thread } from '@/components/questions/Thread';
import { ServiceUnavailable } from '@/components/ServiceUnavailable';
import { Caution } from '@/components/Caution';

type Params = Promise<{ id: string }>;

async function load(id: number, viewer: Awaited<ReturnType<typeof currentUserInPage>>): Promise<ThreadView | null> {
  try {
    return await loadThread(id, viewer);
  } catch (err) {
    if (err instanceof ForumError && err.status === 404) return null;
    throw err;
  }
}

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const id = idParam((await params).id);
  const t = id ? await load(id, null).catch(() => null) : null;
  return t ? { title: t.title, description: t.body.slice(0, 160) } : { title: 'Question' };
}

export default async function QuestionPage({ params }: { params: Params }) {
  const id = idParam((await params).id);
  if (!id) notFound();
  let thread: ThreadView | null;
  let viewer: Awaited<ReturnType<typeof currentUserInPage>>;
  try {
    viewer = await currentUserInPage();
    thread = await load(id, viewer);
  } catch (err) {
    if (isDatabaseUnavailable(err)) return <ServiceUnavailable what="this question" />;
    throw err;
  }
  if (!thread) notFound();
  const units = await readUnitPreference();
  const sheet = siteSheetRows(thread.siteSheet, units);

  return (
    <article className="flex flex-col gap-5">
      <nav aria-label="Breadcrumb" className="cw-muted text-sm">
        <Link href="/questions" className="cw-link">
          Questions
        </Link>
        {thread.tags.map((tag) => (
          <span key={tag.slug}>
            {' · '}
            <Link href={`/tags/${tag.slug}`} className="cw-link">
              {tag.name}
            </Link>
          </span>
        ))}
      </nav>
      <h1 className="font-serif text-3xl font-semibold leading-tight">{thread.title}</h1>
      {thread.fixedAnswerId ? <p className="self-start rounded bg-moss px-2 py-0.5 text-sm font-semibold text-limestone-50">fixed it</p> : null}
      {sheet.length ? (
        <section aria-label="Site sheet" className="cw-card">
          <h2 className="mb-2 text-sm font-semibold uppercase tracking-wide">Site sheet</h2>
          <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm sm:grid-cols-3" data-testid="site-sheet">
            {sheet.map((r) => (
              <div key={r.label}>
                <dt className="cw-muted text-xs">{r.label}</dt>
                <dd className="cw-num">{r.value}</dd>
              </div>
            ))}
          </dl>
          {thread.siteSheet?.fall && thread.siteSheet?.lift && thread.siteSheet?.driveLength ? (
            <p className="mt-2 text-sm">
              <Link href={`/calculators/stall-check?${new URLSearchParams(thread.siteSheet)}`} className="cw-link">
                Run the stall check on this site sheet
              </Link>
            </p>
          ) : null}
          {thread.fieldLogEntryId ? (
            <p className="mt-2 text-sm">
              <Link href={`/field-log/${thread.fieldLogEntryId}`} className="cw-link">
                Filled from field log entry {thread.fieldLogEntryId}
              </Link>
            </p>
          ) : null}
        </section>
      ) : null}
      <Thread initial={thread} viewer={viewer ? { id: viewer.id, handle: viewer.handle, role: viewer.role } : null} />
      <Caution title="Advice from members">
        Answers come from members of the community. Pressure, moving water and drinking water can hurt people: check
        advice against local codes and ask a licensed plumber or engineer where it matters.
      </Caution>
    </article>
  );
}
