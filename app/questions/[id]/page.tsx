import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { cache } from 'react';
import 'katex/dist/katex.min.css';
import { loadThread, type ThreadView } from '@/lib/questions/thread';
import { ForumError } from '@/lib/questions/errors';
import { idParam } from '@/lib/http/guard';
import { SiteSheetCard } from '@/components/questions/SiteSheetCard';
import { Thread } from '@/components/questions/Thread';
import { WhatFixedIt } from '@/components/questions/FixedIt';
import { Caution } from '@/components/Caution';

type Params = Promise<{ id: string }>;

/**
 * The page is the same for every reader, so Next keeps it (ISR): rendered on the first
 * visit, marked stale by every write to the thread (lib/questions/after-write.ts), and
 * re-rendered at least once a minute. It reads no cookie; the reader's units and
 * session are applied in the browser.
 */
export const revalidate = 60;
export const dynamicParams = true;
export function generateStaticParams(): { id: string }[] {
  return [];
}

/** One load per render: the metadata and the page share it. */
const load = cache(async (id: number): Promise<ThreadView | null> => {
  try {
    return await loadThread(id, null);
  } catch (err) {
    if (err instanceof ForumError && err.status === 404) return null;
    throw err;
  }
});

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const id = idParam((await params).id);
  const t = id ? await load(id).catch(() => null) : null;
  return t ? { title: t.title, description: t.body.slice(0, 160) } : { title: 'Question' };
}

export default async function QuestionPage({ params }: { params: Params }) {
  const id = idParam((await params).id);
  if (!id) notFound();
  // With the database down the render fails rather than answering "unavailable": a
  // kept copy of the page goes on being served, and no outage notice is kept in its place.
  const thread = await load(id);
  if (!thread) notFound();

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
      <WhatFixedIt initial={thread} />
      <SiteSheetCard sheet={thread.siteSheet} fieldLogEntryId={thread.fieldLogEntryId} />
      <Thread initial={thread} />
      <Caution title="Advice from members">
        Answers come from members of the community. Pressure, moving water and drinking water can hurt people: check
        advice against local codes and ask a licensed plumber or engineer where it matters.
      </Caution>
    </article>
  );
}
