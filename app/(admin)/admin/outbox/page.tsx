import type { Metadata } from 'next';
import { currentUserInPage } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { outboxView } from '@/lib/mail/outbox';
import { MAIL_STATUSES, type MailStatus } from '@/models/MailMessage';
import { Refused } from '@/components/account/Refused';
import { RetryButton } from './RetryButton';
import { formatDateTime } from '@/lib/dates';

export const metadata: Metadata = { title: 'E-mail outbox' };
export const dynamic = 'force-dynamic';

const STATUS_WORDS: Record<MailStatus, string> = {
  pending: 'waiting',
  sending: 'being sent',
  sent: 'sent',
  failed: 'failed',
};

/** The outbox for admins: counts by status, then failed messages with the SMTP error, then the newest. */
export default async function OutboxPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const sp = await searchParams;
  const status = MAIL_STATUSES.find((s) => s === sp.status) ?? null;
  let signedIn = false;
  let data: Awaited<ReturnType<typeof outboxView>> | null = null;
  const user = await currentUserInPage();
  signedIn = user !== null;
  if (user && can(user, 'mail.outbox')) {
    data = await outboxView(status);
  }
  if (!data)
    return (
      <Refused title="E-mail outbox" message={REFUSAL['mail.outbox']} signedIn={signedIn} signInTo="/admin/outbox" />
    );

  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">E-mail outbox</h1>
      <p className="cw-muted max-w-2xl font-sans text-sm">
        Every message is written here with the event that causes it and sent by the worker, with longer waits after each
        failure. A message still refused after its last attempt shows as failed, with what the mail server said.
      </p>
      <nav aria-label="Outbox by status" className="flex flex-wrap gap-3 font-sans text-sm">
        <a href="/admin/outbox" className={status ? 'cw-link' : 'font-semibold'}>
          all
        </a>
        {MAIL_STATUSES.map((s) => (
          <a key={s} href={`/admin/outbox?status=${s}`} className={status === s ? 'font-semibold' : 'cw-link'}>
            {STATUS_WORDS[s]} ({data.counts[s] ?? 0})
          </a>
        ))}
      </nav>
      {data.rows.length === 0 ? (
        <div className="cw-card flex flex-col gap-1 font-sans">
          <p>No messages{status ? ` ${STATUS_WORDS[status]}` : ''}.</p>
          <p className="cw-muted text-sm">
            {status === 'failed'
              ? 'Nothing to send again: every message either went out or is still being tried.'
              : status
                ? 'Choose “all” above to see every message.'
                : 'Messages appear here as soon as something needs one sent: a sign-up, a reset, a notice, a digest.'}
          </p>
        </div>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full border-collapse font-sans text-sm">
            <thead>
              <tr className="border-b border-limestone-400 text-left dark:border-creek-500">
                <th className="p-2">Queued (UTC)</th>
                <th className="p-2">To</th>
                <th className="p-2">What</th>
                <th className="p-2">Status</th>
                <th className="p-2">Attempts</th>
                <th className="p-2">Server said</th>
              </tr>
            </thead>
            <tbody>
              {data.rows.map((m) => (
                <tr
                  key={m.id}
                  className="border-b border-limestone-300 align-top dark:border-creek-600"
                  data-outbox-status={m.status}
                >
                  <td className="p-2 whitespace-nowrap">{formatDateTime(m.createdAt)}</td>
                  <td className="p-2">{m.toAddress}</td>
                  <td className="p-2">
                    <span className="cw-muted">{m.kind}</span>
                    <br />
                    {m.subject}
                  </td>
                  <td className="p-2">
                    {STATUS_WORDS[m.status as MailStatus]}
                    {m.status === 'sent' && m.sentAt ? (
                      <span className="cw-muted"> {formatDateTime(m.sentAt)}</span>
                    ) : null}
                    {m.status === 'pending' && m.attempts > 0 ? (
                      <span className="cw-muted"> — next try {formatDateTime(m.nextAttemptAt)}</span>
                    ) : null}
                  </td>
                  <td className="p-2">{m.attempts}</td>
                  <td className="p-2">
                    {m.lastError ? <code className="break-all">{m.lastError}</code> : null}
                    {m.status === 'failed' ? <RetryButton id={m.id} /> : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
