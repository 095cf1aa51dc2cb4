import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { currentUserInPage } from '@/lib/auth/session';
import { NOMINAL_SIZES } from '@/lib/hydraulics';
import { ForumError } from '@/lib/questions/errors';
import { fieldLogFilterSchema, PIPE_MATERIAL_CHOICES, type FieldLogFilter } from '@/lib/validation/field-log';
import { filteredEntries, sortAndPage, type EntryView } from '@/lib/field-log/store';
import { Pager } from '@/components/QuestionList';
import { EfficiencyChart } from '@/components/field-log/EfficiencyChart';
import { material, pumpsWords, shown, size } from '@/components/field-log/format';
import { EntryCards } from '@/components/field-log/EntryCards';
import { readUnitPreference } from '@/lib/units/server';
import { inputClass, labelClass } from '@/components/forms/api';
import { formatDate } from '@/lib/dates';

export const metadata: Metadata = {
  title: 'Field log',
  description:
    'Measured ram pump installations: efficiency against lift ratio across the community, with each test’s bucket trials.',
};
export const dynamic = 'force-dynamic';

const columns: { key: FieldLogFilter['sort'] | null; label: string }[] = [
  { key: 'site', label: 'Site' },
  { key: 'testedOn', label: 'Tested' },
  { key: null, label: 'Pumps' },
  { key: null, label: 'Drive pipe' },
  { key: 'liftRatio', label: 'h/H' },
  { key: 'delivered', label: 'Delivered' },
  { key: 'efficiency', label: 'Efficiency' },
];

export default async function FieldLogPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[]>>;
}) {
  const sp = await searchParams;
  const one = (v: string | string[] | undefined) => (typeof v === 'string' && v !== '' ? v : undefined);
  const parsed = fieldLogFilterSchema.safeParse({
    pumpSize: one(sp.pumpSize),
    material: one(sp.material),
    sort: one(sp.sort),
    dir: one(sp.dir),
    page: one(sp.page),
    perPage: one(sp.perPage),
  });
  if (!parsed.success) notFound();
  const f = parsed.data;

  let entries: EntryView[];
  let viewerId: number | null = null;
  try {
    const viewer = await currentUserInPage();
    viewerId = viewer?.id ?? null;
    entries = await filteredEntries(f, viewer);
  } catch (err) {
    if (err instanceof ForumError) notFound();
    throw err;
  }
  const page = sortAndPage(entries, f);
  const units = await readUnitPreference();
  if (f.page > page.totalPages) notFound();

  const filterQuery: Record<string, string> = {
    ...(f.pumpSize ? { pumpSize: f.pumpSize } : {}),
    ...(f.material ? { material: f.material } : {}),
  };
  const sortQuery = { ...filterQuery, sort: f.sort, dir: f.dir };
  const sortHref = (key: FieldLogFilter['sort']) =>
    `/field-log?${new URLSearchParams({ ...filterQuery, sort: key, dir: f.sort === key && f.dir === 'desc' ? 'asc' : 'desc' })}`;
  const points = entries.map((e) => ({
    id: e.id,
    x: e.performance.liftRatio,
    y: e.performance.dAubuisson,
    site: e.siteName,
    mine: e.authorId === viewerId,
  }));

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="font-serif text-3xl font-semibold">Field log</h1>
        <p className="cw-muted cw-num text-sm">{page.total} measured tests</p>
        <div className="flex gap-2">
          <Link href="/field-log/new" className="cw-button">
            Record a test
          </Link>
          <Link href="/field-log/import" className="cw-link self-center font-sans text-sm">
            Import CSV
          </Link>
        </div>
      </div>
      <p className="cw-prose cw-muted max-w-prose">
        Each point is one test of an installation: the delivery caught in a bucket against a stopwatch, set against the
        drive flow, fall and lift. Compare your pump with others at the same lift ratio, and with the band the
        calculators assume.
      </p>

      <form
        method="get"
        action="/field-log"
        className="flex flex-wrap items-end gap-3 font-sans"
        aria-label="Filter the field log"
      >
        <label className={labelClass}>
          Pump size
          <select name="pumpSize" defaultValue={f.pumpSize ?? ''} className={inputClass}>
            <option value="">all sizes</option>
            {NOMINAL_SIZES.map((s) => (
              <option key={s} value={s}>
                {size(s)}
              </option>
            ))}
          </select>
        </label>
        <label className={labelClass}>
          Drive pipe material
          <select name="material" defaultValue={f.material ?? ''} className={inputClass}>
            <option value="">all materials</option>
            {PIPE_MATERIAL_CHOICES.map((m) => (
              <option key={m} value={m}>
                {material(m)}
              </option>
            ))}
          </select>
        </label>
        <input type="hidden" name="sort" value={f.sort} />
        <input type="hidden" name="dir" value={f.dir} />
        <button type="submit" className="cw-button">
          Show
        </button>
        <a
          href={`/api/field-log/export?${new URLSearchParams(sortQuery)}`}
          className="cw-link self-center text-sm"
          download
        >
          Export this view as CSV
        </a>
      </form>

      <section aria-labelledby="chart-heading" className="cw-card">
        <h2 id="chart-heading" className="mb-2 font-serif text-xl font-semibold">
          Efficiency against lift ratio
        </h2>
        <EfficiencyChart points={points} />
      </section>

      <section aria-labelledby="table-heading">
        <h2 id="table-heading" className="mb-2 font-serif text-xl font-semibold">
          Every test
        </h2>
        <EntryCards
          entries={page.items}
          viewerId={viewerId}
          units={units}
          sorts={columns.flatMap((c) => (c.key ? [{ key: c.key, label: c.label, href: sortHref(c.key) }] : []))}
          sort={f.sort}
          dir={f.dir}
        />
        {/* on a phone the cards above carry every column; the table returns where it fits */}
        <div className="hidden overflow-x-auto sm:block">
          <table className="w-full border-collapse font-sans text-sm" aria-label="Field log entries">
            <thead>
              <tr className="border-b border-limestone-400 text-left dark:border-creek-500">
                {columns.map((c) => (
                  <th
                    key={c.label}
                    scope="col"
                    className="px-2 py-1"
                    aria-sort={c.key && f.sort === c.key ? (f.dir === 'asc' ? 'ascending' : 'descending') : undefined}
                  >
                    {c.key ? (
                      <Link href={sortHref(c.key)} className="cw-link">
                        {c.label}
                        {f.sort === c.key ? (f.dir === 'asc' ? ' ↑' : ' ↓') : ''}
                      </Link>
                    ) : (
                      c.label
                    )}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {page.items.map((e) => (
                <tr key={e.id} className="border-b border-limestone-300 dark:border-creek-600" data-entry-row={e.id}>
                  <td className="px-2 py-1">
                    <Link href={`/field-log/${e.id}`} className="cw-link">
                      {e.siteName}
                    </Link>
                    {e.authorId === viewerId ? <span className="cw-muted"> (yours)</span> : null}
                  </td>
                  <td className="cw-num whitespace-nowrap px-2 py-1">{formatDate(e.testedOn)}</td>
                  <td className="px-2 py-1">{pumpsWords(e.pumpCount, e.arrangement, e.pumpSize)}</td>
                  <td className="px-2 py-1">
                    {shown('length', e.driveLengthM, units)} of {size(e.driveSize)} {material(e.driveMaterial)}
                  </td>
                  <td className="cw-num px-2 py-1">{e.performance.liftRatio.toFixed(1)}</td>
                  <td className="cw-num px-2 py-1">{shown('flow', e.deliveredFlowM3s, units)}</td>
                  <td className="cw-num px-2 py-1">{e.performance.dAubuisson.toFixed(2)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <Pager
          page={page.page}
          totalPages={page.totalPages}
          basePath="/field-log"
          query={{ ...sortQuery, ...(one(sp.perPage) ? { perPage: String(f.perPage) } : {}) }}
          words={['← Previous', 'Next →']}
        />
      </section>
    </div>
  );
}
