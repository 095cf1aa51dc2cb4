'use client';

import { useCallback, useState } from 'react';
import { CalculatorCard } from '@/components/calculators/kit/CalculatorCard';
import { CALCULATOR_LIST, getCalculator, shareQuery, type FormState } from '@/lib/calculators';
import { calculatorPropsFromSiteSheet } from '@/lib/calculators/site-sheet';
import { sendJson } from '@/components/forms/api';

/**
 * Answer, optionally with a worked calculation: pick a calculator, it opens filled
 * from the question's site sheet, adjust it, post. What the form shows is what is
 * posted: a calculator left open goes with the answer (the server recomputes and
 * saves it in the same step), and the form says so beside it; "None" leaves it out.
 */
export function AnswerComposer({
  questionId,
  siteSheet,
  onPosted,
}: {
  questionId: number;
  siteSheet: Record<string, string> | null;
  onPosted: (answerId: number) => void;
}) {
  const [body, setBody] = useState('');
  const [tool, setTool] = useState('');
  const [calc, setCalc] = useState<{ form: FormState; ok: boolean } | null>(null);
  const [error, setError] = useState<{ field?: string; message: string } | null>(null);
  const [posted, setPosted] = useState(false);
  const [busy, setBusy] = useState(false);
  const onOutput = useCallback(
    (state: FormState, output: unknown) => setCalc({ form: state, ok: output !== null }),
    [],
  );
  const def = getCalculator(tool);
  const going = def && calc ? calc : null;

  return (
    <form
      className="cw-card flex flex-col gap-3"
      aria-label="Your answer"
      onSubmit={async (e) => {
        e.preventDefault();
        setError(null);
        setPosted(false);
        if (def && !going?.ok) {
          setError({
            field: 'calculation',
            message: 'The calculation has an input to fix first, or choose “None” to post without it.',
          });
          return;
        }
        setBusy(true);
        const r = await sendJson<{ id: number }>(`/api/questions/${questionId}/answers`, 'POST', {
          body,
          ...(def && going
            ? {
                calculation: { tool: def.id, inputs: Object.fromEntries(shareQuery(def.fields, going.form).entries()) },
              }
            : {}),
        });
        setBusy(false);
        if (r.ok) {
          setBody('');
          setTool('');
          setCalc(null);
          setPosted(true);
          onPosted(r.data.id);
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
        onChange={(e) => {
          setBody(e.target.value);
          setPosted(false);
        }}
        rows={7}
        className="rounded-md border border-limestone-400 bg-limestone-50 p-2 font-serif dark:bg-creek-950"
      />
      <div className="flex flex-col gap-2">
        <label htmlFor="answer-tool" className="text-sm font-medium">
          Add a worked calculation to my answer
        </label>
        <select
          id="answer-tool"
          value={tool}
          onChange={(e) => {
            setTool(e.target.value);
            setCalc(null);
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
            <p className="text-sm font-semibold" data-testid="calculation-attached">
              {going && !going.ok
                ? `The ${def.name.toLowerCase()} has an input to fix: fix it, or choose “None” to leave it out.`
                : `This ${def.name.toLowerCase()} goes in your answer when you post it, with the numbers below. Choose “None” to leave it out.`}
            </p>
            <CalculatorCard
              key={tool}
              def={def}
              props={calculatorPropsFromSiteSheet(def.id, siteSheet)}
              onOutput={onOutput}
              saveLabel="Also keep this calculation on its own page"
            />
          </>
        ) : null}
      </div>
      {error ? (
        <p role="alert" className="text-sm font-semibold text-signal-700 dark:text-signal-300">
          {error.message}
        </p>
      ) : null}
      <button type="submit" className="cw-button self-start" disabled={busy}>
        {def ? 'Post the answer with the calculation' : 'Post the answer'}
      </button>
      <p role="status" className="text-sm font-semibold text-moss-600 dark:text-moss-300" data-testid="answer-posted">
        {posted ? 'Your answer is posted: it is in the thread above, marked “Posted just now”.' : ''}
      </p>
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
