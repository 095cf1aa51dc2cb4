'use client';

import useSWR from 'swr';
import { getJson } from '@/components/forms/api';
import { useSession } from 'next-auth/react';
import { RecordSafetyCheck } from './RecordSafetyCheck';
import type { SafetyCheckView, SafetyStatus } from '@/lib/guides/safety';
import { can, sessionActor } from '@/lib/auth/policy';
import { formatDate } from '@/lib/dates';

interface Payload {
  status: SafetyStatus;
  checks: SafetyCheckView[];
}

const day = formatDate;

/**
 * The guide's safety check line. The page itself is static; the checks are read
 * live so a new check, or an edit that makes the last one stale, shows at once.
 */
export function SafetyCheckStatus({ slug }: { slug: string }) {
  const { data, error, isLoading, mutate } = useSWR(`/api/guides/${slug}/safety-checks`, getJson<Payload>, {
    revalidateOnFocus: false,
  });
  const { data: session } = useSession();
  const isExpert = can(sessionActor(session?.user), 'safetyCheck.record');

  if (isLoading) return <p className="cw-muted text-sm">Looking up safety checks…</p>;
  if (error || !data) return <p className="cw-muted text-sm">Safety checks could not be loaded just now.</p>;

  const { status } = data;
  return (
    <div data-testid="safety-check-status" className="font-sans text-sm">
      {status.state === 'checked' ? (
        <p className="flex flex-wrap items-center gap-2">
          <span className="rounded bg-moss px-2 py-0.5 font-semibold text-limestone-50">Safety checked</span>
          <span>
            {`checked by ${status.latest.expert.displayName} on ${day(status.latest.checkedAt)}`}
            {status.latest.verdict === 'needs changes' ? ' — needs changes' : ''}
          </span>
        </p>
      ) : status.state === 'changed' ? (
        <p className="flex flex-wrap items-center gap-2">
          <span className="rounded bg-signal px-2 py-0.5 font-semibold text-creek-950">
            Changed since its last safety check
          </span>
          <span>{`last checked by ${status.latest.expert.displayName} on ${day(status.latest.checkedAt)}, before the latest edit`}</span>
        </p>
      ) : (
        <p className="flex items-center gap-2">
          <span className="rounded border border-creek-300 px-2 py-0.5 font-semibold">Not yet checked</span>
          <span className="cw-muted">No expert has recorded a safety check on this guide yet.</span>
        </p>
      )}
      {data.checks.length > 0 ? (
        <details className="mt-2">
          <summary className="cw-link cursor-pointer">History of safety checks ({data.checks.length})</summary>
          <ol className="mt-2 flex flex-col gap-2">
            {data.checks.map((c) => (
              <li key={c.id} className="border-l-2 border-creek-200 pl-3">
                <span className="font-semibold">{c.verdict === 'sound' ? 'Sound' : 'Needs changes'}</span>
                {` — ${c.expert.displayName}, ${day(c.checkedAt)}`}
                {c.current ? '' : ' (an earlier version)'}
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
