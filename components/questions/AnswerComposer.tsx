'use client';

import { useCallback, useState } from 'react';
import { CalculatorCard } from '@/components/calculators/kit/CalculatorCard';
import { CALCULATOR_LIST, getCalculator, shareQuery, type FormState } from '@/lib/calculators';
import { calculatorPropsFromSiteSheet } from '@/lib/calculators/site-sheet';
import { sendJson } from '@/components/forms/api';

/**
 * Answer, optionally with a worked calculation: pick a calculator, it opens filled
 * from the question's site sheet, adjust it, attach it. The calculation is saved
 * (the server recomputes it) and linked to the answer.
 */
export function AnswerComposer({
  questionId,
  siteSheet,
  onPosted,
}: {
  questionId: number;
  siteSheet: Record<string, string> | null;
  onPosted: () => void;
}) {
  const [body, setBody] = useState('');
  const [tool, setTool] = useState('');
  const [form, setForm] = useState<FormState | null>(null);
  const [attached, setAttached] = useState<{ id: string; tool: string } | null>(null);
  const [error, setError] = useState<{ field?: string; message: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const onOutput = useCallback((state: FormState) => setForm(state), []);
  const def = getCalculator(tool);

  return (
    <form
      className="cw-card flex flex-col gap-3"
      aria-label="Your answer"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        setError(null);
        const r = await sendJson(`/api/questions/${questionId}/answers`, 'POST', {
          body,
          ...(attached ? { calculationId: attached.id } : {}),
        });
        setBusy(false);
        if (r.ok) {
          setBody('');
          setTool('');
          setAttached(null);
          onPosted();
        } else setError(r.error);
      }}
    >
      <h2 className="font-serif text-xl font-semibold">Your answer</h2>
      <label htmlFor="answer-body" className="text-sm font-medium">
        Answer (Markdown; math between $ signs)
      </label>
      <textarea
        id="answer-body"
        value={body}
        onChange={(e) => setBody(e.target.value)}
        rows={7}
        className="rounded-md border border-limestone-400 bg-limestone-50 p-2 font-serif dark:bg-creek-950"
      />
      {error && (!error.field || error.field === 'body') ? (
        <p role="alert" className="text-sm font-semibold text-signal-700 dark:text-signal-300">
          {error.message}
        </p>
      ) : null}
      <div className="flex flex-col gap-2">
        <label htmlFor="answer-tool" className="text-sm font-medium">
          Add a worked calculation
        </label>
        <select
          id="answer-tool"
          value={tool}
          onChange={(e) => {
            setTool(e.target.value);
            setAttached(null);
          }}
          className="rounded-md border border-limestone-400 bg-limestone-50 p-2 dark:bg-creek-950"
        >
          <option value="">None</option>
          {CALCULATOR_LIST.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </select>
        {def ? (
          <>
            <CalculatorCard
              key={tool}
              def={def}
              props={calculatorPropsFromSiteSheet(def.id, siteSheet)}
              onOutput={onOutput}
            />
            {attached ? (
              <p role="status" className="text-sm text-moss-600 dark:text-moss-300" data-testid="calculation-attached">
                Worked calculation attached. Change it and attach again to replace it.
              </p>
            ) : null}
            <button
              type="button"
              className="cw-button self-start"
              disabled={!form}
              onClick={async () => {
                if (!form) return;
                const r = await sendJson<{ id: string }>('/api/calculations', 'POST', {
                  tool,
                  inputs: Object.fromEntries(shareQuery(def.fields, form).entries()),
                });
                if (r.ok) setAttached({ id: r.data.id, tool });
                else setError(r.error);
              }}
            >
              Attach this calculation
            </button>
          </>
        ) : null}
      </div>
      <button type="submit" className="cw-button self-start" disabled={busy}>
        Post the answer
      </button>
    </form>
  );
}

/** A short reply box under a post. */
export function ReplyComposer({
  questionId,
  answerId,
  replyToId,
  onPosted,
  label = 'Reply',
}: {
  questionId: number;
  answerId?: number | null;
  replyToId?: number;
  onPosted: () => void;
  label?: string;
}) {
  const [open, setOpen] = useState(false);
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const id = `reply-${answerId ?? 'q'}-${replyToId ?? 'top'}`;
  if (!open)
    return (
      <button type="button" className="cw-link text-xs" onClick={() => setOpen(true)}>
        {label}
      </button>
    );
  return (
    <form
      className="mt-2 flex flex-col gap-2"
      onSubmit={async (e) => {
        e.preventDefault();
        const r = await sendJson(`/api/questions/${questionId}/replies`, 'POST', {
          body: text,
          ...(answerId ? { answerId } : {}),
          ...(replyToId ? { replyToId } : {}),
        });
        if (r.ok) {
          setText('');
          setOpen(false);
          onPosted();
        } else setError(r.error.message);
      }}
    >
      <label htmlFor={id} className="text-xs font-semibold">
        Your reply
      </label>
      <textarea
        id={id}
        value={text}
        onChange={(e) => setText(e.target.value)}
        rows={3}
        className="rounded-md border border-limestone-400 bg-limestone-50 p-2 font-serif text-sm dark:bg-creek-950"
      />
      {error ? (
        <p role="alert" className="text-xs text-signal-700 dark:text-signal-300">
          {error}
        </p>
      ) : null}
      <span className="flex gap-2">
        <button type="submit" className="cw-button text-sm">
          Post the reply
        </button>
        <button type="button" className="cw-link text-sm" onClick={() => setOpen(false)}>
          Cancel
        </button>
      </span>
    </form>
  );
}
