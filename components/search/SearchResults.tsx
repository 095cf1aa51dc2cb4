'use client';

import Link from 'next/link';
import { useCallback, useEffect, useId, useRef, useState } from 'react';
import type { SearchResult, Segment } from '@/lib/search';
import { KIND_FILTERS, KIND_LABEL } from './kinds';
import { sendJson } from '@/components/forms/api';

export interface SearchState {
  q: string;
  kind: string;
  tag: string;
  solved: string;
  level: string;
}

function Marked({ segments }: { segments: Segment[] }) {
  return (
    <>
      {segments.map((s, i) =>
        s.hit ? (
          <mark key={i} className="rounded-sm bg-clay-200 px-0.5 text-clay-700 dark:bg-clay-700/60 dark:text-inherit">
            {s.text}
          </mark>
        ) : (
          <span key={i}>{s.text}</span>
        ),
      )}
    </>
  );
}

const SOLVED_FILTERS = [
  { value: '', label: 'any' },
  { value: 'true', label: 'fixed' },
  { value: 'false', label: 'not fixed yet' },
];

/** One labelled filter of the results. */
function Filter({
  label,
  name,
  value,
  options,
  onChange,
}: {
  label: string;
  name: Exclude<keyof SearchState, 'q'>;
  value: string;
  options: { value: string; label: string }[];
  onChange: (patch: Partial<SearchState>) => void;
}) {
  return (
    <label className="flex items-center gap-1">
      <span className="cw-muted">{label}</span>
      <select
        className="rounded-md border border-limestone-300 bg-limestone-50 px-2 py-1 text-sm dark:border-creek-600 dark:bg-creek-800"
        value={value}
        onChange={(e) => onChange({ [name]: e.target.value })}
        name={name}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </label>
  );
}

function toQuery(s: SearchState) {
  const p = new URLSearchParams();
  if (s.q.trim()) p.set('q', s.q.trim());
  if (s.kind) p.set('kind', s.kind);
  if (s.tag) p.set('tag', s.tag);
  if (s.solved) p.set('solved', s.solved);
  if (s.level) p.set('level', s.level);
  return p.toString();
}

type Status = { kind: 'idle' } | { kind: 'loading' } | { kind: 'error'; message: string };

/**
 * The /search page's box, filters and results: results follow each keystroke
 * (GET /api/search), the arrow keys walk through them and Enter opens one; the address bar
 * keeps the query so a result list can be shared and the back button works.
 */
export function SearchResults({
  initial,
  initialResult,
  tags,
  levels,
  suggestions,
}: {
  initial: SearchState;
  initialResult: SearchResult | null;
  tags: { slug: string; name: string }[];
  levels: readonly string[];
  suggestions: { href: string; title: string }[];
}) {
  const [state, setState] = useState(initial);
  const [result, setResult] = useState<SearchResult | null>(initialResult);
  const [status, setStatus] = useState<Status>({ kind: 'idle' });
  const listRef = useRef<HTMLOListElement>(null);
  const pending = useRef<{ timer?: ReturnType<typeof setTimeout>; ctl?: AbortController }>({});
  const id = useId();

  /** Each change of the box or a filter: new address, then (after a short pause) new results. */
  const run = useCallback((next: SearchState) => {
    const query = toQuery(next);
    window.history.replaceState(null, '', query ? `/search?${query}` : '/search');
    clearTimeout(pending.current.timer);
    pending.current.ctl?.abort();
    if (!next.q.trim()) {
      setResult(null);
      setStatus({ kind: 'idle' });
      return;
    }
    const ctl = new AbortController();
    pending.current.ctl = ctl;
    setStatus({ kind: 'loading' });
    pending.current.timer = setTimeout(async () => {
      const r = await sendJson<SearchResult>(`/api/search?${query}&limit=20`, 'GET', undefined, { signal: ctl.signal });
      if (ctl.signal.aborted) return;
      if (!r.ok) {
        setStatus({
          kind: 'error',
          message:
            r.status === 0 ? 'Search is not answering just now. Check your connection and try again.' : r.error.message,
        });
        return;
      }
      setResult(r.data);
      setStatus({ kind: 'idle' });
    }, 120);
  }, []);

  useEffect(
    () => () => {
      clearTimeout(pending.current.timer);
      pending.current.ctl?.abort();
    },
    [],
  );

  const items = result?.items ?? [];
  const boxRef = useRef<HTMLInputElement>(null);

  /**
   * The arrow keys walk from the box into the results and between them; each result
   * is a plain link, so Enter opens it as any link opens and nothing is nested in it.
   */
  const onKeyDown = (e: React.KeyboardEvent) => {
    if (e.key !== 'ArrowDown' && e.key !== 'ArrowUp' && e.key !== 'Escape') return;
    const links = Array.from(listRef.current?.querySelectorAll<HTMLAnchorElement>('a[data-result]') ?? []);
    if (!links.length) return;
    const at = links.indexOf(document.activeElement as HTMLAnchorElement);
    if (e.key === 'Escape') {
      if (at >= 0) boxRef.current?.focus();
      return;
    }
    e.preventDefault();
    if (e.key === 'ArrowDown') links[Math.min(links.length - 1, at + 1)]?.focus();
    else if (at <= 0) boxRef.current?.focus();
    else links[at - 1]?.focus();
  };

  const set = (patch: Partial<SearchState>) => {
    const next = { ...state, ...patch };
    setState(next);
    run(next);
  };

  return (
    <div className="flex flex-col gap-4" onKeyDown={onKeyDown}>
      <form
        role="search"
        action="/search"
        method="get"
        onSubmit={(e) => e.preventDefault()}
        className="flex flex-col gap-3"
      >
        <label htmlFor={`${id}-q`} className="sr-only">
          Search
        </label>
        <input
          id={`${id}-q`}
          ref={boxRef}
          name="q"
          type="search"
          autoFocus
          autoComplete="off"
          value={state.q}
          onChange={(e) => set({ q: e.target.value })}
          placeholder="A symptom, a size, a part: “1-inch pump stops when the creek drops”"
          aria-describedby={`${id}-count`}
          className="w-full rounded-md border border-creek-300 bg-white px-3 py-2 text-base dark:border-creek-500 dark:bg-creek-900"
        />
        <fieldset className="flex flex-wrap items-center gap-3 text-sm">
          <legend className="sr-only">Filters</legend>
          <Filter label="Show" name="kind" value={state.kind} onChange={set} options={KIND_FILTERS} />
          <Filter
            label="Tag"
            name="tag"
            value={state.tag}
            onChange={set}
            options={[{ value: '', label: 'any' }, ...tags.map((t) => ({ value: t.slug, label: t.name }))]}
          />
          <Filter label="Threads" name="solved" value={state.solved} onChange={set} options={SOLVED_FILTERS} />
          <Filter
            label="Guide level"
            name="level"
            value={state.level}
            onChange={set}
            options={[{ value: '', label: 'any' }, ...levels.map((l) => ({ value: l, label: l }))]}
          />
        </fieldset>
      </form>

      <p id={`${id}-count`} className="font-sans text-sm" aria-live="polite">
        {status.kind === 'loading' ? (
          <span className="cw-muted">Searching…</span>
        ) : status.kind === 'error' || !result || !state.q.trim() || !items.length ? null : (
          <>
            <span className="font-semibold">{result.total === 1 ? '1 result' : `${result.total} results`}</span>
            <span className="cw-muted">. The down arrow takes you through them from the box; Enter opens one.</span>
          </>
        )}
      </p>
      {status.kind === 'error' ? (
        <p role="alert" className="cw-card border-signal-500 text-sm">
          {status.message}
        </p>
      ) : null}

      {!state.q.trim() ? (
        <section className="cw-card flex flex-col gap-2" aria-label="Where to start">
          <p>Type what you see at the pump, a pipe size in any units, or a part’s name. Results appear as you type.</p>
          <p className="cw-muted text-sm">Start with a guide:</p>
          <ul className="flex flex-col gap-1">
            {suggestions.map((s) => (
              <li key={s.href}>
                <Link className="cw-link" href={s.href}>
                  {s.title}
                </Link>
              </li>
            ))}
          </ul>
        </section>
      ) : result && items.length === 0 && status.kind === 'idle' ? (
        <section className="cw-card flex flex-col gap-2" aria-label="No results">
          <p>
            Nothing matched “{state.q.trim()}”
            {state.kind || state.tag || state.solved || state.level ? ' with these filters' : ''}.
          </p>
          <p className="text-sm">
            Try fewer words or another spelling of a size, read{' '}
            {suggestions.slice(0, 2).map((s, i) => (
              <span key={s.href}>
                {i ? ' or ' : ''}
                <Link className="cw-link" href={s.href}>
                  {s.title}
                </Link>
              </span>
            ))}
            , or{' '}
            <Link className="cw-link" href="/questions/ask">
              ask the community
            </Link>{' '}
            with your measurements.
          </p>
        </section>
      ) : (
        <ol ref={listRef} id={`${id}-results`} aria-label="Results" className="flex flex-col gap-2">
          {items.map((item, i) => (
            <li key={item.id} data-index={i}>
              <Link
                href={item.url}
                data-result
                aria-labelledby={`${id}-k${i} ${id}-t${i}`}
                aria-describedby={item.snippet.length ? `${id}-s${i}` : undefined}
                className="cw-card flex flex-col gap-1 no-underline hover:border-clay-400 focus-visible:border-clay-500 dark:hover:border-clay-300"
              >
                <span className="flex flex-wrap items-baseline gap-x-2 font-sans text-xs uppercase tracking-wide">
                  <span id={`${id}-k${i}`} className="font-semibold text-creek-500 dark:text-creek-200">
                    {KIND_LABEL[item.kind]}
                  </span>
                  {item.solved ? <span className="text-moss-700 dark:text-moss-300">fixed</span> : null}
                  {item.level ? <span className="cw-muted normal-case">{item.level}</span> : null}
                  {item.hidden ? <span className="text-signal-700">hidden: moderators only</span> : null}
                </span>
                <span
                  id={`${id}-t${i}`}
                  className="font-serif text-lg font-semibold text-clay-600 underline-offset-2 dark:text-clay-300"
                >
                  <Marked segments={item.title} />
                </span>
                {item.snippet.length ? (
                  <span id={`${id}-s${i}`} className="text-sm text-creek dark:text-limestone-200">
                    <Marked segments={item.snippet} />
                  </span>
                ) : null}
                {item.tags.length ? <span className="cw-muted font-sans text-xs">{item.tags.join(' · ')}</span> : null}
              </Link>
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
