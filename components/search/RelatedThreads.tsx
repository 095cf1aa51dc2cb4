'use client';

import Link from 'next/link';
import useSWR from 'swr';
import { getJsonOrNull } from '@/components/forms/api';
import type { SearchResult } from '@/lib/search';

/** Threads about the same trouble, from search: shown under the stall check's likely causes. */
export function RelatedThreads({ query, limit = 3 }: { query: string; limit?: number }) {
  const q = query.trim().slice(0, 200);
  const { data } = useSWR(
    q ? `/api/search?${new URLSearchParams({ q, kind: 'question', limit: String(limit) })}` : null,
    getJsonOrNull<SearchResult>,
    {
      revalidateOnFocus: false,
    },
  );
  const items = data?.items ?? [];
  if (!items.length) return null;
  return (
    <section className="flex flex-col gap-1 text-sm" aria-label="Related threads" data-testid="related-threads">
      <p className="font-semibold">Builders who had this</p>
      <ul className="flex flex-col gap-1">
        {items.map((i) => (
          <li key={i.id}>
            <Link href={i.url} className="cw-link">
              {i.title.map((s) => s.text).join('')}
            </Link>
            {i.solved ? <span className="cw-muted text-xs"> · fixed</span> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
