'use client';

import { useRef } from 'react';

function SearchIcon({ className }: { className: string }) {
  return (
    <svg viewBox="0 0 20 20" className={className} aria-hidden="true" focusable="false">
      <circle cx="8.5" cy="8.5" r="5.5" fill="none" stroke="currentColor" strokeWidth="2" />
      <path d="M12.7 12.7 17 17" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
    </svg>
  );
}

const FIELD =
  'w-full min-w-0 rounded-md border border-creek-200 bg-creek-800 py-2 pr-3 pl-9 text-sm text-limestone-50 placeholder:text-creek-200 dark:bg-creek-950';

/**
 * The header's search: a field on wide screens; on a phone a labelled button that
 * opens the same field under the header (a <details>, so it opens without scripts
 * too). Both send a plain GET to /search, which carries on live.
 */
export function HeaderSearch() {
  const phoneBox = useRef<HTMLInputElement>(null);
  return (
    <>
      <form action="/search" method="get" role="search" className="relative hidden w-full lg:block">
        <label htmlFor="site-search" className="sr-only">
          Search Clackwater
        </label>
        <SearchIcon className="pointer-events-none absolute top-1/2 left-3 h-4 w-4 -translate-y-1/2 text-creek-200" />
        <input id="site-search" name="q" type="search" placeholder="Search Clackwater" className={FIELD} />
      </form>
      <details
        className="group lg:hidden"
        onToggle={(e) => {
          if (e.currentTarget.open) phoneBox.current?.focus();
        }}
      >
        <summary
          title="Search"
          className="flex min-h-10 min-w-10 cursor-pointer list-none items-center justify-center gap-1.5 rounded-md border border-creek-200 px-2.5 text-sm font-medium group-open:bg-creek-600 hover:bg-creek-600 [&::-webkit-details-marker]:hidden"
        >
          <SearchIcon className="h-4 w-4 shrink-0" />
          {/* the word shows where the row has room for it; a screen reader always hears it */}
          <span className="sr-only min-[430px]:not-sr-only">Search</span>
        </summary>
        <form
          action="/search"
          method="get"
          role="search"
          className="absolute inset-x-0 top-full z-30 flex gap-2 border-t border-creek-600 bg-creek px-4 py-3 shadow-lg dark:bg-creek-900"
        >
          <label htmlFor="site-search-phone" className="sr-only">
            Search Clackwater
          </label>
          <div className="relative min-w-0 flex-1">
            <SearchIcon className="pointer-events-none absolute top-1/2 left-3 h-4 w-4 -translate-y-1/2 text-creek-200" />
            <input
              ref={phoneBox}
              id="site-search-phone"
              name="q"
              type="search"
              placeholder="A symptom, a size, a part"
              className={`${FIELD} text-base`}
            />
          </div>
          <button type="submit" className="cw-button px-3 py-2 text-sm">
            Search
          </button>
        </form>
      </details>
    </>
  );
}
