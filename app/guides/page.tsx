import type { Metadata } from 'next';
import Link from 'next/link';
import { listGuides } from '@/lib/guides/content';
import { GUIDE_LEVELS } from '@/lib/guides/frontmatter';
import { LevelBadge } from '@/components/guides/LevelBadge';
import { SafetyBadge } from '@/components/guides/SafetyBadge';
import { safetyStatesIfReachable } from '@/lib/guides/safety';

export const metadata: Metadata = {
  title: 'Guides',
  description: 'Field guides from surveying a site to tuning the waste valve, with live calculators.',
};

type SP = Record<string, string | string[] | undefined>;

export default async function GuidesIndex({ searchParams }: { searchParams: Promise<SP> }) {
  const sp = await searchParams;
  const level =
    typeof sp.level === 'string' && (GUIDE_LEVELS as readonly string[]).includes(sp.level) ? sp.level : null;
  const tag = typeof sp.tag === 'string' ? sp.tag : null;
  const all = listGuides();
  const tags = [...new Set(all.flatMap((g) => g.meta.tags))].sort();
  const shown = all.filter((g) => (!level || g.meta.level === level) && (!tag || g.meta.tags.includes(tag)));
  const states = await safetyStatesIfReachable(shown);
  const href = (next: { level?: string | null; tag?: string | null }) => {
    const q = new URLSearchParams();
    const l = next.level === undefined ? level : next.level;
    const t = next.tag === undefined ? tag : next.tag;
    if (l) q.set('level', l);
    if (t) q.set('tag', t);
    const s = q.toString();
    return s ? `/guides?${s}` : '/guides';
  };
  const chip = (active: boolean) =>
    `rounded-full border px-3 py-1 no-underline ${active ? 'border-creek bg-creek text-limestone-50 dark:border-limestone-200 dark:bg-limestone-200 dark:text-creek' : 'border-creek-300 hover:border-clay'}`;

  return (
    <div className="flex flex-col gap-5">
      <div>
        <h1 className="font-serif text-3xl font-semibold">Guides</h1>
        <p className="cw-prose cw-muted mt-2">
          From “is there enough fall here?” to a working, tuned pump. Each guide carries the calculator it discusses,
          set up for the demo site; change the numbers to your own.
        </p>
      </div>
      <nav aria-label="Filter guides" className="flex flex-col gap-2 font-sans text-sm">
        <div className="flex flex-wrap items-center gap-2">
          <span className="cw-muted w-12">Level</span>
          <Link href={href({ level: null })} className={chip(!level)} aria-current={!level ? 'true' : undefined}>
            all
          </Link>
          {GUIDE_LEVELS.map((l) => (
            <Link
              key={l}
              href={href({ level: l })}
              className={chip(level === l)}
              aria-current={level === l ? 'true' : undefined}
            >
              {l}
            </Link>
          ))}
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <span className="cw-muted w-12">Tag</span>
          <Link href={href({ tag: null })} className={chip(!tag)} aria-current={!tag ? 'true' : undefined}>
            all
          </Link>
          {tags.map((t) => (
            <Link
              key={t}
              href={href({ tag: t })}
              className={chip(tag === t)}
              aria-current={tag === t ? 'true' : undefined}
            >
              {t}
            </Link>
          ))}
        </div>
      </nav>
      {states === null ? (
        <p className="cw-muted text-sm">Safety checks could not be looked up just now; the guides read as usual.</p>
      ) : null}
      {shown.length === 0 ? (
        <p className="cw-muted">No guide matches those filters.</p>
      ) : (
        <ol className="grid gap-3 sm:grid-cols-2" data-testid="guide-list">
          {shown.map((g) => (
            <li key={g.slug} className="cw-card flex flex-col gap-2">
              <div className="flex items-center justify-between gap-2">
                <LevelBadge level={g.meta.level} />
                <span className="cw-muted cw-num text-xs">{g.meta.order}</span>
              </div>
              <h2 className="font-serif text-lg font-semibold leading-snug">
                <Link href={`/guides/${g.slug}`} className="no-underline hover:underline">
                  {g.meta.title}
                </Link>
              </h2>
              <p className="cw-muted text-sm">{g.meta.summary}</p>
              {states?.[g.slug] ? (
                <p className="text-xs" data-testid="guide-safety">
                  <SafetyBadge state={states[g.slug]!} />
                </p>
              ) : null}
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
