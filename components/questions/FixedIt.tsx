'use client';

import { useId, useState } from 'react';
import useSWR from 'swr';
import type { ThreadView } from '@/lib/questions/thread';
import { fixedItSchema, WHAT_FIXED_IT_MAX, WHAT_FIXED_IT_MIN } from '@/lib/validation/question';
import { FieldError, getJson, inputClass, labelClass, sendJson, type FormError } from '@/components/forms/api';
import { StateDrop } from './StateDrop';
import { useViewer } from './Thread';
import { useUnits } from '@/components/units/UnitsProvider';
import { withReadings } from '@/lib/units/in-text';

/**
 * The line a fixed thread opens with: the asker's words for what fixed it, linked to
 * the answer. It shares the thread's SWR entry, so a new choice shows here at once.
 */
export function WhatFixedIt({ initial }: { initial: ThreadView }) {
  const viewer = useViewer();
  const { units } = useUnits();
  const { data } = useSWR<ThreadView>(viewer ? `/api/questions/${initial.id}` : null, getJson<ThreadView>, {
    fallbackData: initial,
    revalidateOnMount: false,
    revalidateOnFocus: false,
  });
  const t = data ?? initial;
  const answer = t.answers.find((a) => a.id === t.fixedAnswerId);
  if (!answer) return null;
  return (
    <section
      aria-label="What fixed it"
      data-testid="what-fixed-it"
      className="flex gap-3 rounded-lg bg-moss-100 px-4 py-3 text-creek-900 dark:bg-moss-700 dark:text-limestone-100"
    >
      <StateDrop kind="fixed" className="mt-1 h-5 w-5 text-moss-600 dark:text-moss-300" />
      <div className="flex flex-col gap-1">
        <p className="text-xs font-semibold uppercase tracking-wide text-moss-700 dark:text-moss-100">What fixed it</p>
        {t.whatFixedIt ? (
          <p className="font-serif text-lg leading-snug" data-member-words>
            {withReadings(t.whatFixedIt, units)}
          </p>
        ) : null}
        <p className="text-sm">
          {t.whatFixedIt ? `— ${t.author.displayName}, who asked. ` : `${t.author.displayName}, who asked, chose `}
          <a href={`#answer-${answer.id}`} className="font-semibold underline underline-offset-2">
            {t.whatFixedIt ? 'Read' : 'the'} answer by {answer.author.displayName}
          </a>
        </p>
      </div>
    </section>
  );
}

/**
 * The asker's control on each answer: choose it as what fixed it, writing the one line
 * the thread will open with; change that line; or take the choice back.
 */
export function ChooseFix({
  questionId,
  answerId,
  fixed,
  line,
  onChange,
}: {
  questionId: number;
  answerId: number;
  fixed: boolean;
  line: string | null;
  onChange: () => void;
}) {
  const [open, setOpen] = useState(false);
  const [text, setText] = useState(line ?? '');
  const [error, setError] = useState<FormError | null>(null);
  const [busy, setBusy] = useState(false);
  const id = useId();
  const url = `/api/questions/${questionId}/fixed`;

  const send = async (body: { answerId: number | null; whatFixedIt?: string }) => {
    // the handler's own schema, so the form refuses what the server would, in the same words
    const checked = fixedItSchema.safeParse(body);
    if (!checked.success) {
      const issue = checked.error.issues[0]!;
      return setError({ field: issue.path.join('.'), message: issue.message });
    }
    setBusy(true);
    const res = await sendJson(url, 'PUT', body);
    setBusy(false);
    if (!res.ok) return setError(res.error);
    setError(null);
    setOpen(false);
    onChange();
  };
  const small = 'rounded-md border px-3 py-0.5 text-xs font-semibold';

  if (!open) {
    return (
      <span className="flex flex-wrap gap-2">
        <button
          type="button"
          className={`${small} border-moss-600 text-moss-700 hover:bg-moss-100 dark:border-moss-300 dark:text-moss-100 dark:hover:bg-moss-700`}
          onClick={() => {
            setText(line ?? '');
            setOpen(true);
          }}
        >
          {fixed ? 'Change what fixed it' : 'This fixed it'}
        </button>
        {fixed ? (
          <button
            type="button"
            className={`${small} border-limestone-400 dark:border-creek-500`}
            disabled={busy}
            onClick={() => void send({ answerId: null })}
          >
            Not the fix after all
          </button>
        ) : null}
        <FieldError error={error} />
      </span>
    );
  }
  return (
    <form
      aria-label="What fixed it"
      className="flex w-full flex-col gap-2 rounded-md bg-moss-100 p-3 dark:bg-moss-700"
      onSubmit={(e) => {
        e.preventDefault();
        void send({ answerId, whatFixedIt: text });
      }}
    >
      <label htmlFor={`${id}-line`} className={labelClass}>
        What fixed it, in one line
      </label>
      <p id={`${id}-hint`} className="text-xs">
        The thread will open with it, for the next builder with the same trouble ({WHAT_FIXED_IT_MIN}–
        {WHAT_FIXED_IT_MAX} characters), e.g. “Lowered the intake a foot below the dry-week level”.
      </p>
      <input
        id={`${id}-line`}
        className={inputClass}
        value={text}
        maxLength={WHAT_FIXED_IT_MAX}
        aria-describedby={`${id}-hint ${id}-error`}
        aria-invalid={error?.field === 'whatFixedIt' || undefined}
        onChange={(e) => setText(e.target.value)}
        autoFocus
      />
      <FieldError error={error} field="whatFixedIt" id={`${id}-error`} />
      <FieldError error={error?.field === 'whatFixedIt' ? null : error} field={error?.field} />
      <div className="flex flex-wrap gap-2">
        <button type="submit" className="cw-button" disabled={busy}>
          {busy ? 'Saving…' : 'Save what fixed it'}
        </button>
        <button type="button" className="cw-link text-sm" onClick={() => setOpen(false)}>
          Cancel
        </button>
      </div>
    </form>
  );
}
