'use client';

import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { Step } from '@/lib/hydraulics';
import { workingLines } from '@/lib/calculators/working';
import { useUnits } from '@/components/units/UnitsProvider';

type Katex = Pick<typeof import('katex'), 'renderToString'>;

/**
 * "Show the working" as a field notebook: for each step the rule, the reader's numbers put
 * into it, and what that comes to, in the reader's units. KaTeX loads on first open; a long
 * formula scrolls inside its own strip rather than being cut off on a phone.
 */
export function Working({ steps }: { steps: Step[] }) {
  const { units } = useUnits();
  const [open, setOpen] = useState(false);
  const [katex, setKatex] = useState<Katex | null>(null);
  const lines = useMemo(() => workingLines(steps, units), [steps, units]);

  useEffect(() => {
    if (open && !katex)
      void import('katex').then((m) => setKatex(() => (m as unknown as { default?: Katex }).default ?? (m as Katex)));
  }, [open, katex]);

  const formula = (tex: string, label: string) =>
    katex ? (
      <FormulaStrip
        label={label}
        html={katex.renderToString(tex, { throwOnError: false, displayMode: true, output: 'htmlAndMathml' })}
      />
    ) : (
      <code className="cw-scroll-x block py-1 text-xs" tabIndex={0} role="group" aria-label={label}>
        {tex}
      </code>
    );

  return (
    <details className="mt-3" onToggle={(e) => setOpen((e.target as HTMLDetailsElement).open)}>
      <summary className="cw-link min-h-6 cursor-pointer py-0.5 font-sans text-sm font-semibold">
        Show the working
      </summary>
      <ol
        className="mt-3 flex list-none flex-col gap-0 rounded-md border border-limestone-300 bg-limestone-100 p-0 dark:border-creek-600 dark:bg-creek-950"
        data-testid="working"
      >
        {lines.map((l, i) => (
          <li
            key={`${i}-${l.title}`}
            className="border-b border-dashed border-limestone-300 px-3 py-3 last:border-b-0 dark:border-creek-600"
          >
            <p className="font-serif text-base font-semibold leading-snug">{l.title}</p>
            <dl className="mt-1 grid grid-cols-1 gap-x-3 font-sans text-sm sm:grid-cols-[7rem_minmax(0,1fr)]">
              <dt className="cw-muted pt-1 text-xs uppercase tracking-wide">The rule</dt>
              <dd className="min-w-0">{formula(l.formula, `${l.title}: the rule`)}</dd>
              <dt className="cw-muted pt-1 text-xs uppercase tracking-wide">Your numbers</dt>
              <dd className="min-w-0" data-testid="working-numbers">
                {formula(l.substituted, `${l.title}: your numbers`)}
              </dd>
              <dt className="cw-muted pt-1 text-xs uppercase tracking-wide">Comes to</dt>
              <dd className="min-w-0">
                <span
                  className="cw-num inline-block border-b-2 border-moss-500 text-lg font-semibold"
                  data-testid="working-answer"
                >
                  {l.answer}
                </span>
              </dd>
            </dl>
            {l.note ? <p className="cw-muted mt-2 font-serif text-sm italic">{l.note}</p> : null}
          </li>
        ))}
      </ol>
    </details>
  );
}

/**
 * A formula that scrolls sideways inside the card when it is wider than the phone; while more
 * of it is hidden to the right, that edge fades and shows a chevron, so nobody takes the cut for
 * the end of the equation.
 */
function FormulaStrip({ html, label }: { html: string; label: string }) {
  const ref = useRef<HTMLDivElement>(null);
  const [more, setMore] = useState(false);
  const update = useCallback(() => {
    const el = ref.current;
    if (el) setMore(el.scrollLeft + el.clientWidth < el.scrollWidth - 2);
  }, []);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    update();
    const ro = new ResizeObserver(update);
    ro.observe(el);
    // the formula itself widens when KaTeX's fonts arrive, while its strip keeps its size
    if (el.firstElementChild) ro.observe(el.firstElementChild);
    void document.fonts?.ready.then(update);
    return () => ro.disconnect();
  }, [html, update]);
  return (
    <div className="relative">
      <div
        ref={ref}
        className="cw-scroll-x py-1"
        tabIndex={0}
        role="group"
        aria-label={label}
        onScroll={update}
        dangerouslySetInnerHTML={{ __html: html }}
      />
      {more ? (
        <span
          aria-hidden
          data-testid="working-more"
          className="pointer-events-none absolute inset-y-0 right-0 flex w-10 items-center justify-end bg-linear-to-l from-limestone-100 from-40% to-transparent pr-0.5 font-sans text-lg font-semibold text-clay-600 dark:from-creek-950 dark:text-clay-300"
        >
          ›
        </span>
      ) : null}
    </div>
  );
}
