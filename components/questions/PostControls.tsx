'use client';

import { useState } from 'react';
import { MemberText } from '@/components/posts/MemberText';
import { RevisionDiff } from '@/components/posts/RevisionDiff';
import { sendJson } from '@/components/forms/api';
import type { PostType } from '@/lib/vocabulary';
import { formatDateTime } from '@/lib/dates';

/** "Helpful": one per member, never on one's own post; the count moves at once and settles on the server's. */
export function HelpfulButton({
  postType,
  postId,
  count,
  marked,
  disabled,
  onChanged,
}: {
  postType: PostType;
  postId: number;
  count: number;
  marked: boolean;
  disabled: boolean;
  onChanged: (optimistic: { count: number; marked: boolean }, settle: Promise<unknown>) => void;
}) {
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="inline-flex items-center gap-2">
      <button
        type="button"
        disabled={disabled}
        aria-pressed={marked}
        className={`rounded-full border px-3 py-0.5 text-xs font-semibold ${marked ? 'border-moss bg-moss text-limestone-50' : 'border-creek-300 hover:border-moss'} disabled:opacity-60`}
        onClick={() => {
          setError(null);
          const settle = sendJson('/api/helpful', marked ? 'DELETE' : 'POST', { postType, postId }).then((r) => {
            if (!r.ok) setError(r.error.message);
          });
          onChanged({ count: count + (marked ? -1 : 1), marked: !marked }, settle);
        }}
      >
        helpful · <span className="cw-num">{count}</span>
      </button>
      {error ? (
        <span role="alert" className="text-xs text-signal-700 dark:text-signal-300">
          {error}
        </span>
      ) : null}
    </span>
  );
}

/** Edits a post's text in place; the server keeps every earlier version. */
export function EditBody({
  url,
  initial,
  onSaved,
  extra,
}: {
  url: string;
  initial: string;
  onSaved: () => void;
  extra?: Record<string, unknown>;
}) {
  const [open, setOpen] = useState(false);
  const [text, setText] = useState(initial);
  const [error, setError] = useState<string | null>(null);
  if (!open)
    return (
      <button type="button" className="cw-link text-xs" onClick={() => setOpen(true)}>
        Edit
      </button>
    );
  return (
    <form
      className="mt-2 flex w-full flex-col gap-2"
      onSubmit={async (e) => {
        e.preventDefault();
        const r = await sendJson(url, 'PUT', { ...extra, body: text });
        if (r.ok) {
          setOpen(false);
          onSaved();
        } else setError(r.error.message);
      }}
    >
      <label className="text-xs font-semibold" htmlFor={`${url}-edit`}>
        Edit the text
      </label>
      <textarea
        id={`${url}-edit`}
        value={text}
        onChange={(e) => setText(e.target.value)}
        rows={6}
        className="rounded-md border border-limestone-400 bg-limestone-50 p-2 font-serif dark:bg-creek-950"
      />
      {error ? (
        <p role="alert" className="text-xs text-signal-700 dark:text-signal-300">
          {error}
        </p>
      ) : null}
      <span className="flex gap-2">
        <button type="submit" className="cw-button text-sm">
          Save the edit
        </button>
        <button type="button" className="cw-link text-sm" onClick={() => setOpen(false)}>
          Cancel
        </button>
      </span>
    </form>
  );
}

/** Every version of a post, each with what changed from the one before. */
export function RevisionHistory({
  questionId,
  postType,
  postId,
}: {
  questionId: number;
  postType: string;
  postId: number;
}) {
  const [revisions, setRevisions] = useState<{ id: number; body: string; editor: string; at: string }[] | null>(null);
  return (
    <details
      className="text-xs"
      onToggle={async (e) => {
        if ((e.target as HTMLDetailsElement).open && !revisions) {
          const r = await sendJson<{ revisions: { id: number; body: string; editor: string; at: string }[] }>(
            `/api/questions/${questionId}/revisions?postType=${postType}&postId=${postId}`,
            'GET',
          );
          setRevisions(r.ok ? r.data.revisions : []);
        }
      }}
    >
      <summary className="cw-link cursor-pointer">Edited: see the history</summary>
      <ol className="mt-2 flex flex-col gap-3">
        {(revisions ?? []).map((rev, i, all) => (
          <li key={rev.id} className="border-l-2 border-creek-200 pl-2">
            <p className="cw-muted">
              {i === 0 ? 'First posted' : 'Edited'} by {rev.editor}, {formatDateTime(rev.at)}
            </p>
            {i === 0 ? <MemberText>{rev.body}</MemberText> : <RevisionDiff before={all[i - 1].body} after={rev.body} />}
          </li>
        ))}
      </ol>
    </details>
  );
}
