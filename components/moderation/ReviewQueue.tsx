'use client';

import { useEffect, useId, useState } from 'react';
import Link from 'next/link';
import useSWR from 'swr';
import { getJson } from '@/components/forms/api';
import { FLAG_REASON_WORDS, type FlagReason } from './words';
import { ReviewItem, type ReviewItemView } from './ReviewItem';
import type { Role } from '@/lib/auth/policy';

const REASONS = Object.keys(FLAG_REASON_WORDS) as FlagReason[];
const AGES = [
  { value: '', label: 'any age' },
  { value: '24', label: 'older than 24 h' },
  { value: '168', label: 'older than 7 days' },
];

/**
 * The review queue: flagged posts, unsafe advice first and then oldest flag first, each read in context with its
 * flags and history and an action panel. After an action the list reloads, so a
 * settled post drops out.
 */
export function ReviewQueue({ viewer }: { viewer: { id: number; handle: string; role: Role } }) {
  const id = useId();
  const [reason, setReason] = useState<FlagReason | ''>('');
  const [age, setAge] = useState('');
  const [lastDone, setLastDone] = useState<string | null>(null);
  const query = new URLSearchParams({
    ...(reason ? { reason } : {}),
    ...(age ? { olderThanHours: age } : {}),
  }).toString();
  const { data, error, isLoading, mutate } = useSWR(
    `/api/review${query ? `?${query}` : ''}`,
    getJson<{ items: ReviewItemView[] }>,
    { revalidateOnFocus: false },
  );

  // a thread's "act on it in the review queue" link names the item; the list arrives after the page
  const loaded = !!data;
  useEffect(() => {
    if (!loaded || !window.location.hash) return;
    const target = document.getElementById(window.location.hash.slice(1));
    target?.scrollIntoView({ block: 'start' });
    target?.focus({ preventScroll: true });
  }, [loaded]);

  return (
    <div className="flex flex-col gap-4">
      <form
        role="search"
        aria-label="Filter the review queue"
        className="flex flex-wrap gap-4 font-sans text-sm"
        onSubmit={(e) => e.preventDefault()}
      >
        <span className="flex flex-col">
          <label htmlFor={`${id}-reason`} className="font-semibold">
            Flag reason
          </label>
          <select
            id={`${id}-reason`}
            value={reason}
            onChange={(e) => setReason(e.target.value as FlagReason | '')}
            className="mt-1 rounded-md border border-limestone-400 bg-limestone-50 px-2 py-1 dark:bg-creek-950"
          >
            <option value="">any reason</option>
            {REASONS.map((r) => (
              <option key={r} value={r}>
                {FLAG_REASON_WORDS[r]}
              </option>
            ))}
          </select>
        </span>
        <span className="flex flex-col">
          <label htmlFor={`${id}-age`} className="font-semibold">
            Flag age
          </label>
          <select
            id={`${id}-age`}
            value={age}
            onChange={(e) => setAge(e.target.value)}
            className="mt-1 rounded-md border border-limestone-400 bg-limestone-50 px-2 py-1 dark:bg-creek-950"
          >
            {AGES.map((a) => (
              <option key={a.value} value={a.value}>
                {a.label}
              </option>
            ))}
          </select>
        </span>
      </form>

      {lastDone ? (
        <p role="status" className="font-sans text-sm font-semibold text-moss-600 dark:text-moss-300">
          {lastDone}
        </p>
      ) : null}

      {error ? (
        <p role="alert" className="cw-card font-sans text-sm">
          {(error as Error).message}
        </p>
      ) : isLoading || !data ? (
        <p className="cw-muted font-sans text-sm">Loading the review queue…</p>
      ) : data.items.length === 0 ? (
        <div className="cw-card flex flex-col gap-2 font-sans text-sm" data-testid="review-empty">
          {reason || age ? (
            <p>
              Nothing waiting matches these filters.{' '}
              <button
                type="button"
                className="cw-link"
                onClick={() => {
                  setReason('');
                  setAge('');
                }}
              >
                Show every flag
              </button>{' '}
              to see the rest of the queue.
            </p>
          ) : (
            <p>
              Nothing is waiting: every flag has been dealt with. New flags appear here as members send them; check{' '}
              <Link href="/review/experts" className="cw-link">
                expert applications
              </Link>{' '}
              and the suspended accounts below while it is quiet.
            </p>
          )}
        </div>
      ) : (
        <>
          <p className="cw-muted font-sans text-sm">
            {data.items.length === 1 ? '1 post waiting' : `${data.items.length} posts waiting`}, unsafe advice first,
            then oldest flag first.
          </p>
          <ol className="flex flex-col gap-4">
            {data.items.map((item) => (
              <li key={`${item.appeal ? `appeal-${item.appeal.id}` : 'flags'}:${item.post.type}:${item.post.id}`}>
                <ReviewItem
                  item={item}
                  viewer={viewer}
                  onDone={(message) => {
                    setLastDone(message);
                    void mutate();
                  }}
                />
              </li>
            ))}
          </ol>
        </>
      )}
    </div>
  );
}
