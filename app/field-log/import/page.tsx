import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { CSV_COLUMNS, CSV_COMPUTED_COLUMNS, MAX_IMPORT_ROWS } from '@/lib/field-log/csv';
import { ImportForm } from '@/components/field-log/ImportForm';

export const metadata: Metadata = { title: 'Import field log CSV' };
export const dynamic = 'force-dynamic';

export default async function ImportPage() {
  const signedIn: boolean = (await currentUserInPage()) !== null;
  return (
    <div className="flex flex-col gap-4">
      <p className="font-sans text-sm">
        <Link href="/field-log" className="cw-link">
          Field log
        </Link>
      </p>
      <h1 className="font-serif text-3xl font-semibold">Import tests from CSV</h1>
      <p className="cw-prose max-w-prose">
        One test a row, with a header row naming the columns below (units are in the names). Up to {MAX_IMPORT_ROWS}{' '}
        rows at a time; the rows become your entries. An export from the field log imports as it is.
      </p>
      {signedIn ? (
        <ImportForm />
      ) : (
        <p className="cw-card max-w-prose font-sans">
          <Link href="/sign-in?callbackUrl=/field-log/import" className="cw-link">
            Sign in to import
          </Link>
          .
        </p>
      )}
      <section aria-labelledby="columns-heading" className="font-sans">
        <h2 id="columns-heading" className="mb-2 font-serif text-xl font-semibold">
          Columns
        </h2>
        <table className="w-full max-w-3xl border-collapse text-sm">
          <thead>
            <tr className="border-b border-limestone-400 text-left">
              <th className="px-2 py-1">Column</th>
              <th className="px-2 py-1">Holds</th>
              <th className="px-2 py-1">Required</th>
            </tr>
          </thead>
          <tbody>
            {CSV_COLUMNS.map(([name, what, required]) => (
              <tr key={name} className="border-b border-limestone-300 dark:border-creek-600">
                <td className="px-2 py-1 font-mono">{name}</td>
                <td className="px-2 py-1">{what}</td>
                <td className="px-2 py-1">{required ? 'yes' : 'no'}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="cw-muted mt-2 text-sm">
          Exports also carry {CSV_COMPUTED_COLUMNS.join(', ')}, worked out by the engine; an import ignores them and
          works them out again.
        </p>
      </section>
    </div>
  );
}
