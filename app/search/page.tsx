import type { Metadata } from 'next';
import { searchQuerySchema } from '@/lib/validation/search';
import { search, SearchUnavailableError, type SearchResult } from '@/lib/search';
import { GUIDE_LEVELS } from '@/lib/guides/frontmatter';
import { listGuides } from '@/lib/guides/content';
import { currentUserInPage } from '@/lib/auth/session';
import { can } from '@/lib/auth/policy';
import { initModels } from '@/models';
import { readUnitPreference } from '@/lib/units/server';
import { SearchResults, type SearchState } from '@/components/search/SearchResults';

export const metadata: Metadata = { title: 'Search', robots: { index: false } };

/** /search: drawn with its first results on the server (works without scripts), then live. */
export default async function SearchPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[]>>;
}) {
  const sp = await searchParams;
  const raw = Object.fromEntries(Object.entries(sp).map(([k, v]) => [k, Array.isArray(v) ? v[v.length - 1] : v]));
  const parsed = searchQuerySchema.safeParse({ ...raw, limit: '20', offset: '0' });
  const problem = parsed.success ? null : parsed.error.issues[0]?.message;
  const query = parsed.success
    ? parsed.data
    : searchQuerySchema.parse({ q: typeof raw.q === 'string' ? raw.q.slice(0, 200) : '' });

  let result: SearchResult | null = null;
  let unavailable: string | null = null;
  let tags: { slug: string; name: string }[] = [];
  const viewer = await currentUserInPage();
  tags = (await initModels().Tag.findAll({ attributes: ['slug', 'name'], order: [['name', 'ASC']] })).map((t) => ({
    slug: t.slug,
    name: t.name,
  }));
  if (query.q) {
    const { q, kind, ...rest } = query;
    const units = await readUnitPreference();
    result = await search({ q, kinds: kind, ...rest }, { seeHidden: can(viewer, 'moderation.seeHidden'), units }).catch(
      (err) => {
        if (err instanceof SearchUnavailableError) {
          unavailable = err.message;
          return null;
        }
        throw err;
      },
    );
  }
  const initial: SearchState = {
    q: query.q,
    kind: query.kind.join(','),
    tag: query.tag ?? '',
    solved: query.solved === undefined ? '' : String(query.solved),
    level: query.level ?? '',
  };
  const suggestions = listGuides()
    .slice(0, 5)
    .map((g) => ({ href: `/guides/${g.slug}`, title: g.meta.title }));

  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Search</h1>
      <p className="cw-muted max-w-prose text-sm">
        Guides, questions, answers and field logs. Sizes match however they are written (¾&quot;, 0.75 in, 19 mm, DN20),
        and so do the trade’s other names (supply head for fall, impulse valve for waste valve).
      </p>
      {unavailable ? (
        <p role="alert" className="cw-card text-sm">
          {unavailable}
        </p>
      ) : null}
      {problem ? (
        <p role="alert" className="cw-card text-sm">
          {problem}
        </p>
      ) : null}
      <SearchResults
        initial={initial}
        initialResult={result}
        tags={tags}
        levels={GUIDE_LEVELS}
        suggestions={suggestions}
      />
    </div>
  );
}
