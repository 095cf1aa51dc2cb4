import Link from 'next/link';
import { Logo } from './Logo';
import { UnitSwitch } from './units/UnitSwitch';
import { AccountMenu } from './account/AccountMenu';
import { HeaderSearch } from './HeaderSearch';

const NAV = [
  { href: '/guides', label: 'Guides' },
  { href: '/calculators', label: 'Calculators' },
  { href: '/questions', label: 'Questions' },
  { href: '/field-log', label: 'Field log' },
];

/**
 * One row on a wide screen: mark, sections, search, units, account. On a phone two
 * rows placed on a grid, so nothing can slide over anything else: mark, units and
 * account above; the sections and the search button below.
 */
export function SiteHeader() {
  return (
    <header data-site-header className="relative bg-creek text-limestone-100 dark:bg-creek-900">
      <div className="mx-auto grid max-w-5xl grid-cols-[1fr_auto_auto] items-center gap-x-2 gap-y-1 px-4 py-2 lg:flex lg:gap-x-5 lg:py-3">
        <Link
          href="/"
          className="col-start-1 row-start-1 flex min-h-10 shrink-0 items-center gap-2 justify-self-start rounded text-lg font-semibold tracking-wide whitespace-nowrap no-underline"
        >
          <Logo className="h-7 w-7 shrink-0 text-limestone-100" />
          <span className="font-serif">Clackwater</span>
        </Link>
        {/* a row of its own on a phone; on a wide screen its two parts join the header's one row */}
        <div className="col-span-3 row-start-2 flex items-center justify-between gap-3 lg:contents">
          <nav aria-label="Main" className="min-w-0 lg:shrink-0">
            <ul className="flex flex-wrap gap-x-3 text-sm font-medium min-[400px]:gap-x-4 lg:flex-nowrap lg:gap-x-5">
              {NAV.map((item) => (
                <li key={item.href}>
                  <Link
                    href={item.href}
                    className="inline-flex min-h-10 items-center rounded whitespace-nowrap no-underline hover:text-clay-200 hover:underline"
                  >
                    {item.label}
                  </Link>
                </li>
              ))}
            </ul>
          </nav>
          <div className="shrink-0 lg:ml-auto lg:min-w-40 lg:flex-1 lg:shrink lg:basis-60 lg:grow-0">
            <HeaderSearch />
          </div>
        </div>
        <div className="col-start-2 row-start-1">
          <UnitSwitch />
        </div>
        <div className="col-start-3 row-start-1 justify-self-end">
          <AccountMenu />
        </div>
      </div>
    </header>
  );
}
