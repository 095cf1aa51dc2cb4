'use client';

import { useEffect, useId, useMemo, useState } from 'react';
import { UNIT_CHOICES, unitLabel } from '@/lib/hydraulics';
import type { CalcOutput } from '@/lib/hydraulics';
// each from its own file, not the barrel: the barrel's registry would bring every calculator
import { formatNumber, readableQuantity } from '@/lib/calculators/format';
import { shareQuery, type OpenIn } from '@/lib/calculators/state';
import { verdictFor } from '@/lib/calculators/verdict';
import { visibleFields } from '@/lib/calculators/recompute';
import { inUnits, type Calculator, type FieldDef, type FormState } from '@/lib/calculators/types';
import { percentWords, typicalEfficiency, type TypicalEfficiency } from '@/lib/calculators/typical';
import { useUnits } from '@/components/units/UnitsProvider';
import type { CalculatorView } from '../views/types';
import { Working } from './Working';
import { SaveCalculation } from './SaveCalculation';
import { SiteSketch } from './SiteSketch';
import { SourcesDisclosure } from './EfficiencySources';
import { VerdictLine } from './VerdictLine';
import { Warnings } from './Warnings';
import { useFormState } from './useFormState';

/**
 * A live calculator: inputs with unit pickers on one side, a verdict in a sentence
 * and large results with units on the other, warnings in amber, the working in KaTeX, a chart where a curve says
 * more, and a share link that reopens the same inputs.
 */
export function Card({
  def,
  view,
  props = {},
  openIn = 'all',
  onOutput,
  saveLabel,
}: {
  def: Calculator;
  /** its chart and panels (components/calculators/views), passed in so a card brings only its own */
  view: CalculatorView<unknown>;
  props?: Record<string, string | undefined>;
  /** 'defaults' for a share link, whose values open exactly as the sharer typed them */
  openIn?: OpenIn;
  onOutput?: (state: FormState, output: CalcOutput<unknown> | null) => void;
  /** the save button's words where "save" alone could be mistaken for another action (the answer form) */
  saveLabel?: string;
}) {
  const { units, state, outcome, set } = useFormState(def, props, openIn);
  // every id from useId, so the same calculator twice on one page keeps its labels to itself
  const uid = useId();
  const [copied, setCopied] = useState(false);
  // An empty efficiency box stands for the typical value at this site: shown in it, band beside.
  const typical = useMemo(() => typicalEfficiency(def, state, units), [def, state, units]);
  useEffect(() => {
    onOutput?.(state, outcome.ok ? outcome.output : null);
  }, [state, outcome, onOutput]);

  const shareHref = `/calculators/${def.id}?${shareQuery(def.fields, state)}`;

  return (
    <section
      className="cw-card my-6 min-w-0 max-w-full overflow-hidden font-sans not-prose"
      data-calculator={def.id}
      aria-labelledby={`${uid}-title`}
    >
      <header className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`${uid}-title`} className="text-lg font-semibold">
          {def.name}
        </h3>
        <p className="cw-muted text-xs">{def.blurb}</p>
      </header>
      <div className="grid gap-6 md:grid-cols-2">
        <form
          className="flex min-w-0 flex-col gap-3"
          onSubmit={(e) => e.preventDefault()}
          aria-label={`${def.name} inputs`}
        >
          <SiteSketch fields={def.fields} state={state} />
          {visibleFields(def, state).map((f) => (
            <Field
              key={f.name}
              id={`${uid}-${f.name}`}
              field={f}
              state={state[f.name]}
              error={outcome.ok ? undefined : outcome.fieldErrors[f.name]}
              typical={typical?.field === f.name ? typical : null}
              onChange={(p) => set(f.name, p)}
            />
          ))}
        </form>
        <div className="min-w-0" aria-live="polite" data-testid={`${def.id}-results`}>
          {outcome.ok ? (
            <Results def={def} view={view} output={outcome.output} units={units} input={outcome.input} uid={uid} />
          ) : (
            <p
              className="rounded-md border border-signal bg-signal-100 p-3 text-sm text-creek-900 dark:bg-signal-900 dark:text-signal-100"
              role="status"
            >
              {outcome.general ?? 'Fix the fields marked in amber to see the result.'}
            </p>
          )}
        </div>
      </div>
      <footer
        data-print-hide
        className="mt-4 flex flex-wrap items-center gap-3 border-t border-limestone-300 pt-3 text-sm dark:border-creek-700"
      >
        <a href={shareHref} className={TARGET} data-testid={`${def.id}-share`}>
          Share link
        </a>
        <button
          type="button"
          className={TARGET}
          onClick={() => {
            void navigator.clipboard
              ?.writeText(new URL(shareHref, window.location.href).toString())
              .then(() => setCopied(true));
          }}
        >
          {copied ? 'Copied' : 'Copy link'}
        </button>
        {outcome.ok ? <SaveCalculation tool={def.id} inputs={shareQuery(def.fields, state)} label={saveLabel} /> : null}
        <a href={`/guides/${def.guide}`} className={`${TARGET} ml-auto`}>
          Read the guide
        </a>
      </footer>
    </section>
  );
}

/** Footer links and buttons: at least 24 × 24 px to touch (WCAG 2.2, 2.5.8). */
const TARGET = 'cw-link inline-flex min-h-6 min-w-6 items-center';

/** Rows the engine cannot vouch for: a dashed clay edge, and none of the calm fill a trusted result sits in. */
const BEYOND_ROWS = 'rounded-md border-2 border-dashed border-clay-700 p-2 dark:border-clay-300 [&>div]:bg-transparent';

export function Field({
  id,
  field,
  state,
  error,
  typical = null,
  onChange,
}: {
  id: string;
  field: FieldDef;
  state: { text: string; unit?: string } | undefined;
  error?: string;
  typical?: TypicalEfficiency | null;
  onChange: (p: Partial<{ text: string; unit: string }>) => void;
}) {
  const { units } = useUnits();
  const s = state ?? { text: '' };
  const describedBy =
    [typical ? `${id}-typical` : null, field.help ? `${id}-help` : null, error ? `${id}-error` : null]
      .filter(Boolean)
      .join(' ') || undefined;
  const box = `w-full min-w-0 flex-1 rounded-md border bg-limestone-50 px-2 py-1.5 cw-num dark:bg-creek-950 ${error ? 'border-signal ring-1 ring-signal' : 'border-limestone-400 dark:border-creek-500'}`;
  return (
    <div className="flex flex-col gap-1">
      {field.type === 'checks' ? (
        <span className="text-sm font-medium">{field.label}</span>
      ) : (
        <label htmlFor={id} className="text-sm font-medium">
          {field.label}
        </label>
      )}
      <div className="flex gap-2">
        {field.type === 'checks' ? (
          <div
            id={id}
            role="group"
            aria-label={field.label}
            className="flex flex-wrap gap-x-4 gap-y-1"
            aria-describedby={describedBy}
          >
            {field.options.map((o) => {
              const chosen = s.text
                .split(',')
                .map((x) => x.trim())
                .filter(Boolean);
              const on = chosen.includes(o.value);
              return (
                <label key={o.value} className="flex min-h-6 items-center gap-1.5 text-sm">
                  <input
                    type="checkbox"
                    checked={on}
                    onChange={() =>
                      onChange({ text: (on ? chosen.filter((c) => c !== o.value) : [...chosen, o.value]).join(',') })
                    }
                    className="h-6 w-6 shrink-0 accent-clay"
                  />
                  {o.label}
                </label>
              );
            })}
          </div>
        ) : field.type === 'select' ? (
          <select
            id={id}
            value={s.text}
            onChange={(e) => onChange({ text: e.target.value })}
            className={box}
            aria-describedby={describedBy}
          >
            {field.options.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        ) : (
          <input
            id={id}
            value={s.text}
            inputMode={field.type === 'text' ? 'text' : 'decimal'}
            autoComplete="off"
            onChange={(e) => onChange({ text: e.target.value })}
            className={box}
            aria-invalid={error ? true : undefined}
            aria-describedby={describedBy}
            placeholder={
              field.type === 'text'
                ? inUnits(field.placeholder, units)
                : typical
                  ? percentWords(typical.typical)
                  : undefined
            }
          />
        )}
        {field.type === 'quantity' ? (
          <select
            aria-label={`${field.label} unit`}
            value={s.unit}
            onChange={(e) => onChange({ unit: e.target.value })}
            className="rounded-md border border-limestone-400 bg-limestone-50 px-1 py-1.5 text-sm dark:border-creek-500 dark:bg-creek-950"
          >
            {(field.units ?? UNIT_CHOICES[field.qty]).map((u) => (
              <option key={u} value={u}>
                {unitLabel(u)}
              </option>
            ))}
          </select>
        ) : null}
      </div>
      {typical ? (
        <p id={`${id}-typical`} className="text-xs" data-testid="efficiency-typical">
          {`Typical at this lift ratio: ${percentWords(typical.typical)}, in a band of ${percentWords(typical.low, true)} to ${percentWords(typical.high, true)}.`}
        </p>
      ) : null}
      {field.help ? (
        <p id={`${id}-help`} className="cw-muted text-xs">
          {inUnits(field.help, units)}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="text-xs font-semibold text-signal-700 dark:text-signal-300" role="alert">
          {field.label}: {error}
        </p>
      ) : null}
    </div>
  );
}

function Results({
  def,
  view,
  output,
  units,
  input,
  uid,
}: {
  def: Calculator;
  view: CalculatorView<unknown>;
  output: CalcOutput<unknown>;
  units: 'US' | 'metric';
  input: Record<string, unknown>;
  uid: string;
}) {
  const rows = def.rows(output.results);
  const verdict = verdictFor(def.id, output, units);
  // nothing to judge yet: ask for what is needed rather than show zeros beside a warning
  if (verdict.level === 'ask') return <VerdictLine verdict={verdict} id={`${uid}-verdict`} />;
  return (
    <div className="flex flex-col gap-3">
      <VerdictLine verdict={verdict} id={`${uid}-verdict`} />
      <dl
        className={`grid grid-cols-1 gap-2 ${verdict.beyondRange ? BEYOND_ROWS : ''}`}
        aria-describedby={verdict.beyondRange ? `${uid}-verdict` : undefined}
      >
        {rows.map((r) => {
          const v =
            typeof r.value === 'string'
              ? { value: r.value, unit: r.unit ?? '' }
              : r.qty
                ? readableQuantity(r.qty, r.value, units)
                : { value: formatNumber(r.value), unit: r.unit ?? '' };
          return (
            <div key={r.label} className={r.emphasis ? 'rounded-md bg-creek-50 p-2 dark:bg-creek-800' : ''}>
              <dt className="cw-muted text-xs uppercase tracking-wide">{r.label}</dt>
              <dd className={`cw-num ${r.emphasis ? 'text-3xl font-semibold' : 'text-lg'}`} data-result={r.label}>
                {v.value} <span className="text-sm font-normal">{v.unit}</span>
              </dd>
            </div>
          );
        })}
      </dl>
      <Warnings warnings={output.warnings} label="Warnings" />
      {view.extra ? view.extra(output.results, units) : null}
      {view.chart ? <div className="min-w-0">{view.chart(output.results, units, input)}</div> : null}
      <Working steps={output.steps} />
      <SourcesDisclosure lines={verdict.sources}>
        {view.sources ? view.sources(output.results, input) : null}
      </SourcesDisclosure>
    </div>
  );
}
