import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import 'katex/dist/katex.min.css';
import { listGuides, neighbours, readGuideFile } from '@/lib/guides/content';
import { renderGuide } from '@/components/guides/GuideBody';
import { LevelBadge } from '@/components/guides/LevelBadge';
import { SafetyCheckStatusLazy as SafetyCheckStatus } from '@/components/guides/SafetyCheckStatusLazy';
import { PreloadReadingFont } from '@/components/guides/PreloadReadingFont';
import { formatDate } from '@/lib/dates';

export const dynamicParams = false;

export function generateStaticParams() {
  return listGuides().map((g) => ({ slug: g.slug }));
}

export async function generateMetadata({ params }: { params: Promise<{ slug: string }> }): Promise<Metadata> {
  const guide = readGuideFile((await params).slug);
  return guide ? { title: guide.meta.title, description: guide.meta.summary } : {};
}

export default async function GuidePage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const guide = readGuideFile(slug);
  if (!guide) notFound();
  const { content, headings } = await renderGuide(guide.body);
  const { previous, next } = neighbours(slug);
  const askHref = `/questions/ask?${new URLSearchParams({ tag: guide.meta.tags[0] ?? '', guide: slug })}`;

  return (
    <article className="guide flex flex-col gap-5" data-guide={slug}>
      <PreloadReadingFont />
      <header className="flex flex-col gap-2">
        <nav aria-label="Breadcrumb" data-print-hide className="cw-muted text-sm">
          <Link href="/guides" className="cw-link">
            Guides
          </Link>{' '}
          ›{' '}
          <Link href={`/guides?level=${encodeURIComponent(guide.meta.level)}`} className="cw-link">
            {guide.meta.level}
          </Link>
        </nav>
        <h1 className="font-serif text-3xl font-semibold leading-tight sm:text-4xl">{guide.meta.title}</h1>
        <p className="cw-prose cw-muted">{guide.meta.summary}</p>
        <div className="flex flex-wrap items-center gap-3 text-sm">
          <LevelBadge level={guide.meta.level} />
          <span className="cw-muted">Updated {formatDate(guide.meta.updated)}</span>
          {guide.meta.tags.map((t) => (
            <Link
              key={t}
              href={`/guides?tag=${t}`}
              className="rounded-full border border-creek-300 px-2 py-0.5 text-xs no-underline"
            >
              {t}
            </Link>
          ))}
        </div>
        <SafetyCheckStatus slug={slug} updated={guide.meta.updated} />
      </header>

      <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_14rem]">
        <div className="cw-prose guide-body min-w-0 max-w-none">{content}</div>
        {headings.length > 0 ? (
          <nav aria-label="On this page" data-print-hide className="order-first lg:order-last">
            <details open className="cw-card lg:sticky lg:top-4">
              <summary className="cursor-pointer font-sans text-sm font-semibold">On this page</summary>
              <ol className="mt-2 flex flex-col gap-1 font-sans text-sm">
                {headings.map((h) => (
                  <li key={h.id} className={h.depth === 3 ? 'pl-3' : ''}>
                    <a href={`#${h.id}`} className="cw-link no-underline hover:underline">
                      {h.text}
                    </a>
                  </li>
                ))}
              </ol>
            </details>
          </nav>
        ) : null}
      </div>

      <footer data-print-hide className="flex flex-col gap-4 border-t border-limestone-300 pt-4 dark:border-creek-700">
        <p>
          <Link href={askHref} className="cw-button">
            Ask about this guide
          </Link>
        </p>
        <nav aria-label="Previous and next guides" className="flex justify-between gap-4 text-sm">
          {previous ? (
            <Link href={`/guides/${previous.slug}`} rel="prev" className="cw-link">
              ← {previous.meta.title}
            </Link>
          ) : (
            <span />
          )}
          {next ? (
            <Link href={`/guides/${next.slug}`} rel="next" className="cw-link text-right">
              {next.meta.title} →
            </Link>
          ) : (
            <span />
          )}
        </nav>
      </footer>
    </article>
  );
}
