'use client';

import { useId, useState, type FormEvent } from 'react';
import { FieldError, inputClass, labelClass, sendJson, type FormError } from '@/components/forms/api';
import { ACTION_WORDS, type ModerationAction, type PostType } from './words';
import { isoDay } from '@/lib/dates';
import { applicableActions } from '@/lib/moderation/applicable';

const ACTIONS = Object.keys(ACTION_WORDS) as ModerationAction[];

/** Tomorrow in UTC as YYYY-MM-DD: the earliest day a suspension can end. */
function tomorrow(): string {
  return isoDay(Date.now() + 86_400_000);
}

/**
 * Choose an action (none is chosen for the moderator: a default would be applied by a
 * hurried tap), say why (the author's notice and the audit log both carry the
 * reason, so it is always required), then apply it.
 */
export function ActionPanel({
  post,
  authorName,
  onDone,
}: {
  post: {
    type: PostType;
    id: number;
    tags?: string[];
    hiddenAt: string | null;
    hiddenReason?: string | null;
    deletedAt: string | null;
    lockedAt?: string | null;
  };
  authorName: string;
  onDone: (message: string) => void;
}) {
  const id = useId();
  const choices = applicableActions(ACTIONS, post);
  const [action, setAction] = useState<ModerationAction | ''>('');
  const [reason, setReason] = useState('');
  const [tags, setTags] = useState((post.tags ?? []).join(', '));
  const [until, setUntil] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<FormError | null>(null);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    if (!action) return setError({ field: 'action', message: 'Action: choose what to do with this post.' });
    const why = reason.trim();
    if (why.length < 3)
      return setError({ field: 'reason', message: 'Every action needs a reason (at least 3 characters).' });
    const tagList = tags
      .split(/[\s,]+/)
      .map((t) => t.trim().toLowerCase())
      .filter(Boolean);
    if (action === 'retag' && tagList.length === 0)
      return setError({ field: 'tags', message: 'Give one to five tags.' });
    if (action === 'suspend' && !until)
      return setError({ field: 'until', message: 'Choose the day the suspension ends.' });
    setBusy(true);
    setError(null);
    const out = await sendJson<{ auditId: number }>('/api/review/actions', 'POST', {
      action,
      postType: post.type,
      postId: post.id,
      reason: why,
      ...(action === 'retag' ? { tags: tagList } : {}),
      ...(action === 'suspend' ? { until } : {}),
    });
    setBusy(false);
    if (!out.ok) return setError(out.error);
    setReason('');
    onDone(
      `${ACTION_WORDS[action]}: done for the ${post.type} by ${authorName}. ${authorName} gets a notice with your reason, and the audit log has it.`,
    );
  }

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={`Act on this ${post.type}`}
      className="flex flex-col gap-3 border-t border-limestone-300 pt-3 font-sans dark:border-creek-600"
    >
      <div>
        <label htmlFor={`${id}-action`} className={labelClass}>
          Action
        </label>
        <select
          id={`${id}-action`}
          value={action}
          onChange={(e) => setAction(e.target.value as ModerationAction | '')}
          aria-invalid={error?.field === 'action' || undefined}
          className={inputClass}
        >
          <option value="">Choose an action…</option>
          {choices.map((a) => (
            <option key={a} value={a}>
              {ACTION_WORDS[a]}
            </option>
          ))}
        </select>
        <FieldError error={error} field="action" />
        <FieldError error={error} field="postType" />
      </div>
      <div>
        <label htmlFor={`${id}-reason`} className={labelClass}>
          Reason for this action
        </label>
        <textarea
          id={`${id}-reason`}
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          rows={2}
          minLength={3}
          maxLength={1000}
          required
          aria-describedby={`${id}-reason-help`}
          className={inputClass}
        />
        <p id={`${id}-reason-help`} className="cw-muted mt-1 text-xs">
          {authorName} reads this in their notices; it is kept in the audit log.
        </p>
        <FieldError error={error} field="reason" />
      </div>
      {action === 'retag' ? (
        <div>
          <label htmlFor={`${id}-tags`} className={labelClass}>
            Tags
          </label>
          <input
            id={`${id}-tags`}
            value={tags}
            onChange={(e) => setTags(e.target.value)}
            aria-describedby={`${id}-tags-help`}
            className={inputClass}
          />
          <p id={`${id}-tags-help`} className="cw-muted mt-1 text-xs">
            One to five tag names as in the address, separated by commas (frost, storage).
          </p>
          <FieldError error={error} field="tags" />
        </div>
      ) : null}
      {action === 'suspend' ? (
        <div>
          <label htmlFor={`${id}-until`} className={labelClass}>
            Suspend until
          </label>
          <input
            id={`${id}-until`}
            type="date"
            min={tomorrow()}
            value={until}
            onChange={(e) => setUntil(e.target.value)}
            required
            className={inputClass}
          />
          <FieldError error={error} field="until" />
        </div>
      ) : null}
      <FieldError error={error} />
      <button type="submit" className="cw-button self-start" disabled={busy}>
        Apply
      </button>
    </form>
  );
}
