import Link from 'next/link';
import { Logo } from './Logo';
import { UnitSwitch } from './units/UnitSwitch';
import { AccountMenu } from './account/AccountMenu';

const NAV = [
  { href: '/guides', label: 'Guides' },
  { href: '/calculators', label: 'Calculators' },
  { href: '/questions', label: 'Questions' },
  { href: '/field-log', label: 'Field log' },
];

export function SiteHeader() {
  return (
    <header data-site-header className="bg-creek text-limestone-100 dark:bg-creek-900">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link href="/" className="flex items-center gap-2 text-lg font-semibold tracking-wide no-underline">
          <Logo className="h-7 w-7 text-limestone-100" />
          <span className="font-serif">Clackwater</span>
        </Link>
        <nav aria-label="Main" className="order-3 w-full sm:order-none sm:w-auto">
          <ul className="flex gap-4 overflow-x-auto text-sm font-medium sm:gap-5">
            {NAV.map((item) => (
              <li key={item.href}>
                <Link
                  href={item.href}
                  className="whitespace-nowrap py-1 no-underline hover:text-clay-200 hover:underline"
                >
                  {item.label}
                </Link>
              </li>
            ))}
          </ul>
        </nav>
        <div className="ml-auto flex min-w-0 flex-1 items-center justify-end gap-3 sm:flex-none">
          <UnitSwitch />
          <AccountMenu />
          <form action="/search" method="get" role="search" className="flex min-w-0 flex-1 justify-end sm:flex-none">
            <label htmlFor="site-search" className="sr-only">
              Search Clackwater
            </label>
            <input
              id="site-search"
              name="q"
              type="search"
              placeholder="Search guides, threads, field logs"
              className="w-full min-w-0 rounded-md border border-creek-400 bg-creek-800 px-3 py-1.5 text-sm text-limestone-50 placeholder:text-creek-200 sm:w-72"
            />
          </form>
        </div>
      </div>
    </header>
  );
}
