'use client';

import { useEffect, useId } from 'react';
import type { CalcOutput, SitePlanResults } from '@/lib/hydraulics';
import { formatMessage, shareQuery, visibleFields, VERDICT_WORDS } from '@/lib/calculators';
import { sitePlanner, SURVEY_GROUPS } from '@/lib/calculators/defs/sitePlan';
import { designSections } from '@/lib/plan/design';
import { partRows, planSources } from '@/lib/plan/parts';
import { SourcesDisclosure } from '@/components/calculators/kit/EfficiencySources';
import { useUnits } from '@/components/units/UnitsProvider';
import { Field } from '@/components/calculators/kit/CalculatorCard';
import { LOOK } from '@/components/calculators/kit/VerdictLine';
import { Working } from '@/components/calculators/kit/Working';
import { Warnings } from '@/components/calculators/kit/Warnings';
import { useFormState } from '@/components/calculators/kit/useFormState';
import { PartsList } from './PartsList';
import { SaveSite, type SaveTarget } from './SaveSite';
import { MonthlyChart } from './MonthlyChart';
import { PlanSketch } from './PlanSketch';

/** The drawings' widths on paper, px: a Letter or A4 page's text column holds two of 330 side by side. */
const PRINT_HALF = 330;
const PRINT_WHOLE = 560;

const GROUP_TITLES: Record<keyof typeof SURVEY_GROUPS, string> = {
  ground: '1. The ground',
  water: '2. The water you can take',
  demand: '3. What the water is for',
  site: '4. The site',
};

/**
 * The site planner: the survey on the left (or first, on a phone), the verdict, the design,
 * the parts list and the working beside it, all redrawn as the reader types. The inputs
 * live in the address (Share link) so a plan can be passed on before it is saved.
 */
export function SitePlanner({
  props,
  save = { kind: 'new' },
}: {
  props: Record<string, string | undefined>;
  /** a site's own page saves the next version; /plan saves a new site */
  save?: SaveTarget;
}) {
  const def = sitePlanner;
  const { state, outcome, set } = useFormState(def, props);
  const uid = useId();
  const query = shareQuery(def.fields, state).toString();
  // the address follows the survey, so Back, a bookmark or a copied address brings it back
  useEffect(() => {
    if (save.kind === 'new') window.history.replaceState(null, '', `/plan?${query}`);
  }, [query, save.kind]);

  const shown = new Set(visibleFields(def, state).map((f) => f.name));
  const byName = new Map(def.fields.map((f) => [f.name, f]));

  const failed = outcome.ok ? null : (
    <p
      className="rounded-md border border-signal bg-signal-100 p-3 font-sans text-sm text-creek-900 dark:bg-signal-900 dark:text-signal-100"
      role="status"
    >
      {outcome.general ?? 'Fix the fields marked in amber to see the plan.'}
    </p>
  );
  // On a phone the verdict comes first, above the survey it answers; on a wide screen it
  // heads the right-hand column beside the survey.
  return (
    <div className="cw-plan grid gap-6 lg:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
      <div className="min-w-0 lg:col-start-2 lg:row-start-1" aria-live="polite">
        {outcome.ok ? <PlanVerdict verdict={outcome.output.results.verdict} /> : failed}
      </div>
      <form
        className="flex min-w-0 flex-col gap-5 font-sans lg:col-start-1 lg:row-span-2 lg:row-start-1"
        aria-label="Your survey"
        onSubmit={(e) => e.preventDefault()}
        data-print-hide
      >
        {(Object.keys(SURVEY_GROUPS) as (keyof typeof SURVEY_GROUPS)[]).map((g) => (
          <fieldset key={g} className="cw-card flex flex-col gap-3">
            <legend className="px-1 font-serif text-lg font-semibold">{GROUP_TITLES[g]}</legend>
            {SURVEY_GROUPS[g]
              .filter((n) => shown.has(n))
              .map((n) => {
                const f = byName.get(n)!;
                return (
                  <Field
                    key={n}
                    id={`${uid}-${n}`}
                    field={f}
                    state={state[n]}
                    error={outcome.ok ? undefined : outcome.fieldErrors[n]}
                    onChange={(p) => set(n, p)}
                  />
                );
              })}
          </fieldset>
        ))}
      </form>
      <div className="flex min-w-0 flex-col gap-5 lg:col-start-2 lg:row-start-2" data-testid="plan">
        {outcome.ok ? (
          <Plan results={outcome.output.results} output={outcome.output} query={query} save={save} />
        ) : null}
      </div>
    </div>
  );
}

function PlanVerdict({ verdict }: { verdict: SitePlanResults['verdict'] }) {
  const { units } = useUnits();
  const look = LOOK[verdict.verdict];
  return (
    <section
      aria-labelledby="plan-verdict"
      className={`rounded-md p-4 font-sans ${look.box}`}
      data-testid="plan-verdict"
      data-verdict={verdict.verdict}
    >
      <h2 id="plan-verdict" className="text-2xl font-semibold">
        <span aria-hidden="true">{look.symbol} </span>
        {VERDICT_WORDS[verdict.verdict]}
      </h2>
      <p className="mt-1">{formatMessage({ message: '', parts: verdict.reason }, units)}</p>
      {verdict.wouldChange.length ? (
        <>
          <h3 className="mt-3 text-sm font-semibold uppercase tracking-wide">What would change it</h3>
          <ul className="mt-1 list-disc pl-5 text-sm">
            {verdict.wouldChange.map((w, i) => (
              <li key={i}>{formatMessage({ message: '', parts: w }, units)}</li>
            ))}
          </ul>
        </>
      ) : null}
    </section>
  );
}

function Plan({
  results: r,
  output,
  query,
  save,
}: {
  results: SitePlanResults;
  output: CalcOutput<SitePlanResults>;
  query: string;
  save: SaveTarget;
}) {
  const { units } = useUnits();
  const sections = designSections(r, units);
  const rows = partRows(r.parts, units);
  return (
    <>
      {output.warnings.length ? (
        <section aria-labelledby="plan-cautions" className="font-sans">
          <h2 id="plan-cautions" className="mb-2 font-serif text-xl font-semibold">
            Cautions
          </h2>
          <Warnings warnings={output.warnings} />
        </section>
      ) : null}

      {/* on paper the sketch and the months stand side by side, each drawn for half the page */}
      <div className={`grid gap-5 ${r.monthly ? 'print:grid-cols-2 print:gap-2' : ''}`}>
        <PlanSketch results={r} printWidth={r.monthly ? PRINT_HALF : PRINT_WHOLE} />
        {r.monthly ? <MonthlyChart monthly={r.monthly} printWidth={PRINT_HALF} /> : null}
      </div>

      <section aria-labelledby="plan-design" className="flex flex-col gap-3 font-sans">
        <h2 id="plan-design" className="font-serif text-xl font-semibold">
          The design
        </h2>
        <div className="grid gap-3 md:grid-cols-2">
          {sections.map((s, i) => (
            <section key={`${s.id}-${i}`} className="cw-card" aria-labelledby={`design-${i}`} data-design={s.id}>
              <h3 id={`design-${i}`} className="mb-2 font-serif text-lg font-semibold">
                {s.title}
              </h3>
              <dl className="flex flex-col gap-1 text-sm">
                {s.lines.map((l) => (
                  <div
                    key={l.label}
                    className="flex justify-between gap-3 border-b border-limestone-300 pb-1 dark:border-creek-600"
                  >
                    <dt className="cw-muted">{l.label}</dt>
                    <dd className="cw-num text-right font-semibold">{l.value}</dd>
                  </div>
                ))}
              </dl>
              {s.notes.length ? (
                <ul className="mt-2 flex list-disc flex-col gap-1 pl-5 text-xs">
                  {s.notes.map((n) => (
                    <li key={n}>{n}</li>
                  ))}
                </ul>
              ) : null}
            </section>
          ))}
        </div>
      </section>

      <PartsList rows={rows} />

      <div className="cw-card font-sans" data-print-hide>
        <h2 className="font-serif text-xl font-semibold">The working</h2>
        <Working steps={output.steps} />
        <SourcesDisclosure lines={planSources(r)} />
      </div>

      <footer className="flex flex-wrap items-center gap-4 font-sans text-sm" data-print-hide>
        <a href={`/plan?${query}`} className="cw-link inline-flex min-h-6 items-center" data-testid="plan-share">
          Share link
        </a>
        <button type="button" className="cw-link inline-flex min-h-6 items-center" onClick={() => window.print()}>
          Print the plan
        </button>
        <SaveSite survey={Object.fromEntries(new URLSearchParams(query))} target={save} />
      </footer>
    </>
  );
}
