'use client';

import Link from 'next/link';
import useSWR from 'swr';
import { getJson } from '@/components/forms/api';
import { useSession } from 'next-auth/react';
import { RecordSafetyCheck } from './RecordSafetyCheck';
import { SafetyBadge } from './SafetyBadge';
import type { SafetyCheckView, SafetyStatus } from '@/lib/guides/safety';
import { can, sessionActor } from '@/lib/auth/policy';
import { formatDate } from '@/lib/dates';

interface Payload {
  status: SafetyStatus;
  checks: SafetyCheckView[];
}

const day = formatDate;

/** The day part of a timestamp or calendar day, to compare days as the reader sees them. */
const dayOf = (d: string) => d.slice(0, 10);

/**
 * The guide's safety check line. The page itself is static; the checks are read
 * live so a new check, or an edit that makes the last one stale, shows at once.
 * `updated` is the guide's own "updated" day, set against the check's date.
 */
export function SafetyCheckStatus({ slug, updated }: { slug: string; updated: string }) {
  const { data, error, isLoading, mutate } = useSWR(`/api/guides/${slug}/safety-checks`, getJson<Payload>, {
    revalidateOnFocus: false,
  });
  const { data: session } = useSession();
  const isExpert = can(sessionActor(session?.user), 'safetyCheck.record');

  if (isLoading) return <p className="cw-muted text-sm">Looking up safety checks…</p>;
  if (error || !data) return <p className="cw-muted text-sm">Safety checks could not be loaded just now.</p>;

  const { status } = data;
  const changesHref = (id?: number) => `/guides/${slug}/changes${id === undefined ? '' : `?check=${id}`}`;
  return (
    <div data-testid="safety-check-status" className="font-sans text-sm">
      <p className="flex flex-wrap items-center gap-2">
        <SafetyBadge state={status.state} />
        {status.state === 'checked' ? (
          <span>{`checked by ${status.latest.expert.displayName} on ${day(status.latest.checkedAt)}`}</span>
        ) : status.state === 'needs changes' ? (
          <span>
            {`checked by ${status.latest.expert.displayName} on ${day(status.latest.checkedAt)}, who asked for changes to this text`}
          </span>
        ) : status.state === 'changed' ? (
          <span data-testid="safety-check-dates">
            {`last checked by ${status.latest.expert.displayName} on ${day(status.latest.checkedAt)} (${verdictWords(status.latest.verdict)})`}
            {status.latest.checkedVersionUpdated
              ? `, on the version updated ${day(status.latest.checkedVersionUpdated)}`
              : ''}
            {dayOf(updated) > dayOf(status.latest.checkedAt)
              ? `. This version was updated ${day(updated)}, after that check.`
              : '. The text has changed since that check.'}
          </span>
        ) : (
          <span className="cw-muted">No expert has recorded a safety check on this guide yet.</span>
        )}
      </p>
      {status.state === 'needs changes' && status.latest.notes ? (
        <p className="mt-1">{`What the expert asked for: ${status.latest.notes}`}</p>
      ) : null}
      {status.state === 'changed' && status.latest.hasText ? (
        <p className="mt-1">
          <Link href={changesHref()} className="cw-link">
            See what changed since that check
          </Link>
        </p>
      ) : null}
      {data.checks.length > 0 ? (
        <details className="mt-2">
          <summary className="cw-link cursor-pointer">History of safety checks ({data.checks.length})</summary>
          <ol className="mt-2 flex flex-col gap-2">
            {data.checks.map((c) => (
              <li key={c.id} className="border-l-2 border-creek-200 pl-3">
                <span className="font-semibold">{c.verdict === 'sound' ? 'Sound' : 'Needs changes'}</span>
                {` — ${c.expert.displayName}, ${day(c.checkedAt)}`}
                {c.current ? '' : ' (an earlier version'}
                {!c.current && c.hasText ? (
                  <>
                    {': '}
                    <Link href={changesHref(c.id)} className="cw-link">
                      what changed since
                    </Link>
                  </>
                ) : null}
                {c.current ? '' : ')'}
                {c.notes ? <p className="cw-muted mt-1">{c.notes}</p> : null}
              </li>
            ))}
          </ol>
        </details>
      ) : null}
      {isExpert ? <RecordSafetyCheck slug={slug} onRecorded={() => mutate()} /> : null}
    </div>
  );
}

function verdictWords(v: SafetyCheckView['verdict']): string {
  return v === 'sound' ? 'sound' : 'needs changes';
}
