import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { auditFilterSchema } from '@/lib/validation/moderation';
import { listAudit } from '@/lib/moderation/audit';
import { Refused } from '@/components/account/Refused';
import { AUDIT_ACTION_WORDS } from '@/components/moderation/words';
import { inputClass, labelClass } from '@/components/forms/api';
import { formatDateTime } from '@/lib/dates';

export const metadata: Metadata = { title: 'Audit log' };
export const dynamic = 'force-dynamic';

type Search = Promise<Record<string, string | string[] | undefined>>;
type AuditPage = Awaited<ReturnType<typeof listAudit>>;
type AuditItem = AuditPage['items'][number];

const FIELDS = ['action', 'actor', 'from', 'to', 'page'] as const;

/** The query as typed: one value per field, blanks dropped (an empty GET form field means "any"). */
function readQuery(raw: Record<string, string | string[] | undefined>) {
  const out: Partial<Record<(typeof FIELDS)[number], string>> = {};
  for (const f of FIELDS) {
    const v = raw[f];
    const s = (Array.isArray(v) ? v[0] : v)?.trim();
    if (s) out[f] = s;
  }
  return out;
}

function Target({ item }: { item: AuditItem }) {
  const details = (item.details ?? {}) as { questionId?: unknown };
  const label = item.targetType === 'member' ? `member #${item.targetId}` : `${item.targetType} #${item.targetId}`;
  return typeof details.questionId === 'number' ? (
    <Link href={`/questions/${details.questionId}`} className="cw-link">
      {label}
    </Link>
  ) : (
    <>{label}</>
  );
}

/** The audit log: every moderation action with who, when and why. Read-only, admins only. */
/** A cell: a table cell from sm up, a labelled line of a card below it. */
const CELL =
  'px-3 py-2 max-sm:flex max-sm:gap-2 max-sm:p-0 max-sm:before:w-16 max-sm:before:shrink-0 max-sm:before:font-semibold max-sm:before:content-[attr(data-label)]';

export default async function AuditPage({ searchParams }: { searchParams: Search }) {
  const query = readQuery(await searchParams);
  const parsed = auditFilterSchema.safeParse(query);
  const filter = parsed.success ? parsed.data : {};
  const problem = parsed.success ? null : (parsed.error.issues[0]?.message ?? 'These filters could not be read.');

  let data: AuditPage | null = null;
  let signedIn = false;
  const user = await currentUserInPage();
  signedIn = user !== null;
  if (user && can(user, 'audit.read')) data = await listAudit(filter);

  if (!data) {
    return <Refused title="Audit log" message={REFUSAL['audit.read']} signedIn={signedIn} signInTo="/admin/audit" />;
  }

  const totalPages = Math.max(1, Math.ceil(data.total / data.perPage));
  const pageLink = (page: number) => `/admin/audit?${new URLSearchParams({ ...query, page: String(page) })}`;

  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Audit log</h1>
      <form
        method="get"
        action="/admin/audit"
        role="search"
        aria-label="Filter the audit log"
        className="cw-card flex flex-wrap items-end gap-4"
      >
        <div>
          <label htmlFor="audit-action" className={labelClass}>
            Action
          </label>
          <select id="audit-action" name="action" defaultValue={query.action ?? ''} className={inputClass}>
            <option value="">any action</option>
            {Object.entries(AUDIT_ACTION_WORDS).map(([value, words]) => (
              <option key={value} value={value}>
                {words}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="audit-actor" className={labelClass}>
            Moderator handle
          </label>
          <input id="audit-actor" name="actor" defaultValue={query.actor ?? ''} maxLength={40} className={inputClass} />
        </div>
        <div>
          <label htmlFor="audit-from" className={labelClass}>
            From
          </label>
          <input id="audit-from" name="from" type="date" defaultValue={query.from ?? ''} className={inputClass} />
        </div>
        <div>
          <label htmlFor="audit-to" className={labelClass}>
            To
          </label>
          <input id="audit-to" name="to" type="date" defaultValue={query.to ?? ''} className={inputClass} />
        </div>
        <button type="submit" className="cw-button">
          Show
        </button>
      </form>
      {problem ? (
        <p role="alert" className="font-sans text-sm font-semibold text-clay-600 dark:text-clay-300">
          {problem} Showing the whole log instead.
        </p>
      ) : null}
      <p className="cw-muted font-sans text-sm">
        {data.total === 0
          ? 'Nothing recorded matches. Widen the dates or clear a filter; moderators’ and admins’ actions appear here as they happen.'
          : `${data.total} ${data.total === 1 ? 'entry' : 'entries'}, newest first · page ${data.page} of ${totalPages}. Times are UTC.`}
      </p>
      {data.items.length ? (
        // Below the sm breakpoint each row is a card with its labels beside the values, so
        // Target and Reason are never scrolled off-screen; the explicit roles keep the table's
        // semantics for screen readers once CSS stops displaying it as one.
        <div className="sm:overflow-x-auto sm:rounded-lg sm:border sm:border-limestone-300 sm:bg-limestone-50 sm:shadow-sm sm:dark:border-creek-600 sm:dark:bg-creek-900">
          <table role="table" className="w-full font-sans text-sm max-sm:block">
            <caption className="sr-only">Moderation actions</caption>
            <thead className="max-sm:sr-only">
              <tr role="row" className="border-b border-limestone-300 text-left dark:border-creek-600">
                {['When', 'Who', 'Action', 'Target', 'Reason'].map((h) => (
                  <th key={h} scope="col" role="columnheader" className="px-3 py-2">
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody className="max-sm:flex max-sm:flex-col max-sm:gap-3">
              {data.items.map((item) => (
                <tr
                  key={item.id}
                  role="row"
                  className="border-b border-limestone-200 align-top last:border-0 dark:border-creek-700 max-sm:flex max-sm:flex-col max-sm:gap-1 max-sm:rounded-lg max-sm:border max-sm:border-limestone-300 max-sm:bg-limestone-50 max-sm:p-4 max-sm:shadow-sm max-sm:last:border max-sm:dark:border-creek-600 max-sm:dark:bg-creek-900"
                >
                  <td role="cell" data-label="When" className={CELL}>
                    <span className="cw-num whitespace-nowrap">{formatDateTime(item.at)}</span>
                  </td>
                  <td role="cell" data-label="Who" className={CELL}>
                    {item.actor ? (
                      <Link href={`/people/${item.actor.handle}`} className="cw-link">
                        {item.actor.displayName}
                      </Link>
                    ) : (
                      <span className="cw-muted">Clackwater (automatic)</span>
                    )}
                  </td>
                  <td role="cell" data-label="Action" className={CELL}>
                    {AUDIT_ACTION_WORDS[item.action] ?? item.action}
                  </td>
                  <td role="cell" data-label="Target" className={`${CELL} sm:whitespace-nowrap`}>
                    <Target item={item} />
                  </td>
                  <td role="cell" data-label="Reason" className={CELL}>
                    {item.reason}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      {totalPages > 1 ? (
        <nav aria-label="Pages" className="flex gap-4 font-sans text-sm">
          {data.page > 1 ? (
            <Link href={pageLink(data.page - 1)} className="cw-link">
              ← Newer
            </Link>
          ) : null}
          {data.page < totalPages ? (
            <Link href={pageLink(data.page + 1)} className="cw-link">
              Older →
            </Link>
          ) : null}
        </nav>
      ) : null}
    </div>
  );
}
