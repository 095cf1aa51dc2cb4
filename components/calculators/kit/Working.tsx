'use client';

import { useEffect, useState } from 'react';
import type { Step } from '@/lib/hydraulics';
import { formatNumber } from '@/lib/calculators';

type Katex = Pick<typeof import('katex'), 'renderToString'>;

/** "Show the working": each step's formula, the numbers put in, and the answer, in KaTeX (loaded on first open). */
export function Working({ steps }: { steps: Step[] }) {
  const [open, setOpen] = useState(false);
  const [katex, setKatex] = useState<Katex | null>(null);

  useEffect(() => {
    if (open && !katex)
      void import('katex').then((m) => setKatex(() => (m as unknown as { default?: Katex }).default ?? (m as Katex)));
  }, [open, katex]);

  const tex = (s: string, display = false) =>
    katex ? katex.renderToString(s, { throwOnError: false, displayMode: display, output: 'htmlAndMathml' }) : null;

  return (
    <details className="mt-3" onToggle={(e) => setOpen((e.target as HTMLDetailsElement).open)}>
      <summary className="cw-link min-h-6 cursor-pointer py-0.5 font-sans text-sm font-semibold">
        Show the working
      </summary>
      <ol className="mt-2 flex flex-col gap-3" data-testid="working">
        {steps.map((s, i) => (
          <li key={`${i}-${s.title}`} className="border-l-2 border-creek-200 pl-3 dark:border-creek-600">
            <p className="font-sans text-sm font-semibold">
              {i + 1}. {s.title}
            </p>
            {katex ? (
              <>
                <div className="overflow-x-auto" dangerouslySetInnerHTML={{ __html: tex(s.formula, true) ?? '' }} />
                <div className="overflow-x-auto" dangerouslySetInnerHTML={{ __html: tex(s.substituted, true) ?? '' }} />
              </>
            ) : (
              <code className="block overflow-x-auto text-xs">{s.formula}</code>
            )}
            <p className="cw-num font-sans text-sm">
              = {formatNumber(s.result.value)} {s.result.unit}
            </p>
            {s.note ? <p className="cw-muted font-sans text-xs">{s.note}</p> : null}
          </li>
        ))}
      </ol>
    </details>
  );
}
