import Link from 'next/link';

export function SiteFooter() {
  return (
    <footer
      data-site-footer
      className="mt-16 border-t border-limestone-300 bg-limestone-200 text-sm dark:border-creek-700 dark:bg-creek-900"
    >
      <div className="mx-auto flex max-w-5xl flex-col gap-3 px-4 py-6 sm:flex-row sm:items-center sm:justify-between">
        <p className="cw-muted max-w-prose">
          Water in motion, stored pressure and untreated water can hurt people. Read the{' '}
          <Link href="/safety" className="cw-link">
            safety notice
          </Link>{' '}
          and follow local codes and licensed practice.
        </p>
        <p className="cw-muted">Clackwater — lifting water with falling water.</p>
      </div>
    </footer>
  );
}
