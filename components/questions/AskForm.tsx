'use client';

import { useDeferredValue, useEffect, useId, useMemo, useState, useSyncExternalStore, type ReactNode } from 'react';
import { Controller, useForm, useWatch, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { SYMPTOM_LABELS, SYMPTOMS, unitLabel, type UnitSystem } from '@/lib/hydraulics';
import { askQuestionSchema, SITE_SHEET_FIELDS, type SiteSheetField } from '@/lib/validation/question';
import { CALCULATORS, recompute, seriesOptions, sizeOptions } from '@/lib/calculators';
import { CALCULATOR_VIEWS } from '@/components/calculators/views';
import { inputClass, labelClass, sendJson } from '@/components/forms/api';
import { MemberText } from '@/components/posts/MemberText';
import { PhotoPicker } from '@/components/photos/PhotoPicker';
import { useUnits } from '@/components/units/UnitsProvider';
import {
  clearDraft,
  draftHasContent,
  draftState,
  draftStore,
  loadDraft,
  resetDraftState,
  saveDraft,
  serverDraftState,
  setDraftState,
  subscribeDraftState,
  type AskDraft,
} from './ask-draft';
import { bareNumberUnit, typedUnits, withReaderUnits } from './site-sheet-units';
import { useAskOutbox } from './ask-outbox';
import { OutboxPanel } from '@/components/offline/OutboxPanel';

type AskInput = z.input<typeof askQuestionSchema>;
type AskOutput = z.output<typeof askQuestionSchema>;
type SiteSheet = Partial<Record<SiteSheetField, string>>;

/**
 * The site sheet's boxes, labelled as the trade says them; `hint` shows how to type a value with
 * its unit, with an example in the reader's own units (any unit is accepted).
 */
const MEASUREMENTS: { name: SiteSheetField; label: string; hint: Record<UnitSystem, string> }[] = [
  {
    name: 'fall',
    label: 'Fall',
    hint: {
      US: 'from the intake’s water surface down to the pump, e.g. “4 ft”',
      metric: 'from the intake’s water surface down to the pump, e.g. “1.2 m”',
    },
  },
  {
    name: 'lift',
    label: 'Lift',
    hint: {
      US: 'from the pump up to the tank’s inlet, e.g. “29 ft”',
      metric: 'from the pump up to the tank’s inlet, e.g. “9 m”',
    },
  },
  { name: 'driveLength', label: 'Drive pipe length', hint: { US: 'e.g. “24 ft”', metric: 'e.g. “7.5 m”' } },
  {
    name: 'elbows',
    label: 'Extra elbows on the drive pipe',
    hint: {
      US: 'optional, bends beyond a straight run, e.g. “1”',
      metric: 'optional, bends beyond a straight run, e.g. “1”',
    },
  },
  {
    name: 'sourceFlow',
    label: 'Source flow the source can spare',
    hint: { US: 'in the driest month, e.g. “5 gal/min”', metric: 'in the driest month, e.g. “20 L/min”' },
  },
  {
    name: 'pumps',
    label: 'Pumps',
    hint: { US: 'how many rams share the source', metric: 'how many rams share the source' },
  },
  {
    name: 'driveFlow',
    label: 'Measured drive flow of one pump',
    hint: { US: 'optional, e.g. “4 gal/min”', metric: 'optional, e.g. “15 L/min”' },
  },
  {
    name: 'delivered',
    label: 'Measured delivery',
    hint: { US: 'optional, at the tank, e.g. “30 gal/h”', metric: 'optional, at the tank, e.g. “2 L/min”' },
  },
  {
    name: 'bpm',
    label: 'Beats per minute',
    hint: {
      US: 'optional, count the waste valve for a minute',
      metric: 'optional, count the waste valve for a minute',
    },
  },
  {
    name: 'deliveryLength',
    label: 'Delivery pipe length',
    hint: { US: 'optional, e.g. “300 ft”', metric: 'optional, e.g. “90 m”' },
  },
];
const PUMP_AND_PIPES: { name: SiteSheetField; label: string; options: readonly { value: string; label: string }[] }[] =
  [
    { name: 'driveSize', label: 'Drive pipe size', options: sizeOptions },
    { name: 'driveMaterial', label: 'Drive pipe material', options: seriesOptions },
    { name: 'pumpSize', label: 'Pump size', options: sizeOptions },
    { name: 'deliverySize', label: 'Delivery pipe size', options: sizeOptions },
    { name: 'deliveryMaterial', label: 'Delivery pipe material', options: seriesOptions },
  ];

/** The stall check cannot run without these; until they are typed it only checks what is there. */
const STALL_NEEDS = ['fall', 'lift', 'driveLength', 'driveSize', 'driveMaterial'] as const;
/** The site sheet's names are the stall check card's prop names; the delivery pipe is not one of its inputs. */
const STALL_PROPS = [
  'fall',
  'lift',
  'driveLength',
  'driveSize',
  'driveMaterial',
  'elbows',
  'sourceFlow',
  'pumpSize',
  'pumps',
  'driveFlow',
  'delivered',
  'bpm',
  'symptoms',
] as const;

const blank = (v: string | undefined) => !v || v.trim() === '';

function siteSheetAsStallProps(sheet: SiteSheet): Record<string, string> {
  // '' (not undefined) for an empty box, so the card's defaults never stand in for the member's numbers
  return Object.fromEntries(STALL_PROPS.map((k) => [k, sheet[k]?.trim() ?? '']));
}

type StallView =
  | { kind: 'idle' }
  | { kind: 'needs'; missing: string[] }
  | { kind: 'refused'; field?: string; message: string }
  | { kind: 'causes'; node: ReactNode };

function runStall(sheet: SiteSheet, units: UnitSystem): StallView {
  const typed = siteSheetAsStallProps(sheet);
  // checked as it will be posted: a bare number in the reader's units
  const props = withReaderUnits(typed, units);
  if (blank(props.fall) && blank(props.lift)) return { kind: 'idle' };
  const missing = STALL_NEEDS.filter((k) => blank(props[k]));
  try {
    // With a box still empty, check what the member did type: stand-ins fill the gaps only so the
    // engine can read the rest, and only its complaints about the member's own numbers are shown.
    const probe = missing.length
      ? { ...props, ...Object.fromEntries(missing.map((k) => [k, CALCULATORS['stall-check'].defaults[k] ?? ''])) }
      : props;
    const r = recompute(CALCULATORS['stall-check'], probe);
    if (!r.ok)
      return r.field && (missing as readonly string[]).includes(r.field)
        ? needs(missing)
        : { kind: 'refused', field: r.field, message: r.message };
    if (missing.length) return needs(missing);
    // answered in the units the asker typed, whatever the reader's preference says
    const answerIn = typedUnits(typed, units);
    return { kind: 'causes', node: CALCULATOR_VIEWS['stall-check']?.extra?.(r.output.results, answerIn) };
  } catch {
    return missing.length ? needs(missing) : { kind: 'idle' };
  }
}
const needs = (missing: readonly string[]): StallView => ({
  kind: 'needs',
  missing: missing.map((k) => [...MEASUREMENTS, ...PUMP_AND_PIPES].find((f) => f.name === k)?.label.toLowerCase() ?? k),
});

function FieldMessage({ id, message }: { id: string; message?: string }) {
  return message ? (
    <p id={id} role="alert" className="mt-1 text-sm font-semibold text-clay-600 dark:text-clay-300">
      {message}
    </p>
  ) : null;
}

/** Under a box holding a bare number: the unit it will be read in, and a button to write it in. */
function UnitPrompt({ id, unit, onAdd }: { id: string; unit?: string; onAdd: (unit: string) => void }) {
  if (!unit) return null;
  const shown = unitLabel(unit);
  return (
    <p
      id={id}
      data-testid="unit-prompt"
      className="mt-1 flex flex-wrap items-center gap-2 rounded-md border-l-4 border-signal bg-signal-100 px-2 py-1 text-xs text-signal-900 dark:bg-signal-900 dark:text-signal-100"
    >
      <span>No unit: this will be read in {shown}, your units.</span>
      <button type="button" className="cw-link min-h-6 font-semibold" onClick={() => onAdd(unit)}>
        Add “{shown}”
      </button>
    </p>
  );
}

interface SimilarQuestion {
  id: number | string;
  title: string;
  fixed?: boolean;
}

/** Questions like this one (search on its title, tags, fall and lift); silent when the search fails. */
function useSimilarQuestions(title: string, tags: string[], fall: string, lift: string) {
  const [items, setItems] = useState<SimilarQuestion[]>([]);
  const key = `${tags.join(',')}|${fall.trim()}|${lift.trim()}|${title.trim().replace(/\|/g, ' ')}`;
  useEffect(() => {
    const [t, f, l, title] = key.split('|');
    if (!t && !f && !l && !title) return;
    const q = new URLSearchParams();
    if (title) q.set('title', title);
    if (t) q.set('tags', t);
    if (f) q.set('fall', f);
    if (l) q.set('lift', l);
    const ctl = new AbortController();
    // wait for a pause in typing rather than asking on every keystroke — common practice, no source
    const timer = setTimeout(async () => {
      const r = await sendJson<{ items?: SimilarQuestion[] }>(`/api/questions/similar?${q}`, 'GET', undefined, {
        signal: ctl.signal,
      });
      if (!ctl.signal.aborted) setItems(r.ok && Array.isArray(r.data?.items) ? r.data.items.slice(0, 5) : []);
    }, 400);
    return () => {
      clearTimeout(timer);
      ctl.abort();
    };
  }, [key]);
  return key === '|||' ? [] : items;
}

/** Asking a question: title, what happened (Markdown, previewed), tags, the site sheet, photos. */
export function AskForm({
  tags,
  defaultTag,
  guide,
  fromFieldLog,
  fromSite,
}: {
  tags: { slug: string; name: string }[];
  defaultTag?: string;
  guide?: string;
  /** a field log entry to fill the site sheet from, and to link the question to */
  fromFieldLog?: { id: number; siteSheet: SiteSheet };
  /** the asker's own site: the question is about it, and its plan fills the sheet unless a field log entry does */
  fromSite?: { id: string; siteSheet: SiteSheet };
}) {
  const uid = useId();
  const startSheet = fromFieldLog?.siteSheet ?? fromSite?.siteSheet;
  const { units } = useUnits();
  const id = (name: string) => `${uid}-${name.replace('.', '-')}`;
  const {
    register,
    control,
    handleSubmit,
    setError,
    setValue,
    getValues,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<AskInput, unknown, AskOutput>({
    resolver: zodResolver(askQuestionSchema),
    defaultValues: {
      title: '',
      body: '',
      tags: defaultTag ? [defaultTag] : [],
      siteSheet: Object.fromEntries(SITE_SHEET_FIELDS.map((f) => [f, startSheet?.[f] ?? ''])),
      fieldLogEntryId: fromFieldLog?.id,
      siteId: fromSite?.id,
      photoIds: [],
      guide,
    },
  });
  const body = useDeferredValue(useWatch({ control, name: 'body' }) ?? '');
  const sheet = (useWatch({ control, name: 'siteSheet' }) ?? {}) as SiteSheet;
  const chosenTags = useWatch({ control, name: 'tags' }) ?? [];
  const title = useDeferredValue(useWatch({ control, name: 'title' }) ?? '');
  // keyed on the values, not the object: the engine runs once per change to the site sheet
  const sheetKey = JSON.stringify(STALL_PROPS.map((k) => sheet[k] ?? ''));
  const stall = useMemo(
    () => runStall(Object.fromEntries(STALL_PROPS.map((k, i) => [k, (JSON.parse(sheetKey) as string[])[i]])), units),
    [sheetKey, units],
  );
  const similar = useSimilarQuestions(title, chosenTags, sheet.fall ?? '', sheet.lift ?? '');

  // The draft: restored once after hydration (the server has no storage), then kept on every change.
  const { loaded, status: draft } = useSyncExternalStore(subscribeDraftState, draftState, serverDraftState);
  const draftOf = (v: AskInput): AskDraft => ({
    title: v.title ?? '',
    body: v.body ?? '',
    tags: v.tags ?? [],
    siteSheet: Object.fromEntries(
      Object.entries(v.siteSheet ?? {}).filter((e): e is [string, string] => typeof e[1] === 'string'),
    ),
  });
  useEffect(() => {
    const saved = loadDraft(draftStore());
    if (saved) {
      const now = getValues();
      reset({
        ...now,
        title: saved.title,
        body: saved.body,
        tags: saved.tags,
        siteSheet: { ...now.siteSheet, ...saved.siteSheet },
      });
    }
    setDraftState({ loaded: true, status: saved ? 'restored' : 'none' });
    return resetDraftState;
  }, [getValues, reset]);
  // the form as it opens (a tag from the link, a field log's sheet) is no draft of the member's
  const startKey = useMemo(
    () =>
      JSON.stringify(
        draftOf({
          title: '',
          body: '',
          tags: defaultTag ? [defaultTag] : [],
          siteSheet: Object.fromEntries(SITE_SHEET_FIELDS.map((f) => [f, startSheet?.[f] ?? ''])),
        }),
      ),
    [defaultTag, startSheet],
  );
  const watched = useWatch({ control });
  const draftKey = JSON.stringify(draftOf(watched as AskInput));
  useEffect(() => {
    if (!loaded) return;
    const d = JSON.parse(draftKey) as AskDraft;
    const worth = draftKey !== startKey && draftHasContent(d);
    if (worth) saveDraft(draftStore(), d);
    else clearDraft(draftStore());
    const was = draftState().status;
    setDraftState({ status: worth ? (was === 'none' ? 'kept' : was) : 'none' });
  }, [draftKey, startKey, loaded]);
  function discardDraft() {
    clearDraft(draftStore());
    reset({
      title: '',
      body: '',
      tags: defaultTag ? [defaultTag] : [],
      siteSheet: Object.fromEntries(SITE_SHEET_FIELDS.map((f) => [f, startSheet?.[f] ?? ''])),
      fieldLogEntryId: fromFieldLog?.id,
      siteId: fromSite?.id,
      photoIds: getValues('photoIds') ?? [],
      guide,
    });
    setDraftState({ status: 'none' });
  }

  const outbox = useAskOutbox((sent, error) => {
    const now = getValues();
    reset({ ...now, ...(sent as Partial<AskInput>), siteSheet: { ...now.siteSheet, ...(sent.siteSheet ?? {}) } });
    if (error) showServerError(error);
  });
  function showServerError(error: { field?: string; message: string }) {
    const field = error.field;
    const known =
      field && (['title', 'body', 'tags', 'photoIds', 'guide'].includes(field) || /^siteSheet\.\w+$/.test(field));
    setError(known ? (field as FieldPath<AskInput>) : 'root.server', { message: error.message }, { shouldFocus: true });
  }

  async function onSubmit(values: AskOutput) {
    // a bare number goes out with the unit the form said it would be read in
    const siteSheet = withReaderUnits(
      Object.fromEntries(
        Object.entries(values.siteSheet ?? {}).filter((e): e is [string, string] => !blank(e[1] ?? undefined)),
      ),
      units,
    );
    const out = await outbox.post({
      ...values,
      siteSheet: Object.keys(siteSheet).length ? siteSheet : undefined,
    });
    if (out === null) {
      // no signal: the question is in the outbox now, so the draft has nothing more to keep
      clearDraft(draftStore());
      setDraftState({ loaded: false, status: 'none' });
      return;
    }
    if (out.ok) {
      clearDraft(draftStore());
      setDraftState({ loaded: false, status: 'none' }); // nothing more to keep while the page goes
      window.location.assign(out.data.url ?? `/questions/${out.data.id}`);
      return;
    }
    showServerError(out.error);
  }

  const describe = (name: string, hint?: boolean) =>
    [hint ? `${id(name)}-hint` : '', errorAt(name) ? `${id(name)}-error` : ''].filter(Boolean).join(' ') || undefined;
  const errorAt = (name: string): string | undefined => {
    if (name.startsWith('siteSheet.'))
      return (errors.siteSheet as Record<string, { message?: string } | undefined> | undefined)?.[name.slice(10)]
        ?.message;
    return (errors as Record<string, { message?: string } | undefined>)[name]?.message;
  };

  if (outbox.kept)
    return (
      <div className="flex max-w-3xl flex-col gap-4 font-sans" data-testid="question-kept">
        <p className="cw-card" role="status">
          No signal: your question is kept on this phone and will be posted when it is back online. Keep this page open,
          or tap “Send now” below.
        </p>
        <OutboxPanel />
      </div>
    );

  return (
    <form
      onSubmit={handleSubmit(onSubmit)}
      noValidate
      className="flex flex-col gap-4 font-sans lg:grid lg:grid-cols-[minmax(0,1fr)_20rem] lg:items-start"
    >
      <div className="flex flex-col gap-4">
        {draft === 'restored' ? (
          <p role="status" className="cw-card text-sm" data-testid="draft-restored">
            Your draft is back as you left it.{' '}
            <button type="button" className="cw-link" onClick={discardDraft}>
              Discard this draft
            </button>
          </p>
        ) : null}
        <section className="cw-card flex flex-col gap-4" aria-labelledby={id('q')}>
          <h2 id={id('q')} className="font-serif text-xl font-semibold">
            Your question
          </h2>
          <div>
            <label htmlFor={id('title')} className={labelClass}>
              Title
            </label>
            <input
              id={id('title')}
              {...register('title')}
              maxLength={160}
              aria-invalid={errorAt('title') ? true : undefined}
              aria-describedby={describe('title')}
              className={inputClass}
            />
            <FieldMessage id={`${id('title')}-error`} message={errorAt('title')} />
          </div>
          <div>
            <label htmlFor={id('body')} className={labelClass}>
              What happened
            </label>
            <p id={`${id('body')}-hint`} className="cw-muted text-sm">
              What you built, what it does, what you have tried. Markdown works; math in $…$.
            </p>
            <textarea
              id={id('body')}
              {...register('body')}
              rows={8}
              aria-invalid={errorAt('body') ? true : undefined}
              aria-describedby={describe('body', true)}
              className={`${inputClass} font-serif`}
            />
            <FieldMessage id={`${id('body')}-error`} message={errorAt('body')} />
            {body.trim() ? (
              <section
                aria-labelledby={id('preview')}
                className="mt-2 rounded-md border border-dashed border-limestone-400 p-3 dark:border-creek-500"
              >
                <h3 id={id('preview')} className="cw-muted text-xs font-semibold uppercase tracking-wide">
                  Preview
                </h3>
                <MemberText>{body}</MemberText>
              </section>
            ) : null}
          </div>
          <fieldset aria-describedby={describe('tags')}>
            <legend className={labelClass}>Tags (one to five)</legend>
            <Controller
              control={control}
              name="tags"
              render={({ field }) => (
                <div className="mt-1 flex flex-wrap gap-2">
                  {tags.map((t) => (
                    <label
                      key={t.slug}
                      className="flex items-center gap-2 rounded-full border border-limestone-400 px-3 py-1 text-sm has-[:checked]:border-creek has-[:checked]:bg-creek-100 dark:border-creek-500 dark:has-[:checked]:bg-creek-700"
                    >
                      <input
                        type="checkbox"
                        value={t.slug}
                        checked={field.value?.includes(t.slug) ?? false}
                        onChange={(e) =>
                          field.onChange(
                            e.target.checked
                              ? [...(field.value ?? []), t.slug]
                              : (field.value ?? []).filter((s) => s !== t.slug),
                          )
                        }
                        onBlur={field.onBlur}
                      />
                      {t.name}
                    </label>
                  ))}
                </div>
              )}
            />
            <FieldMessage id={`${id('tags')}-error`} message={errorAt('tags')} />
          </fieldset>
        </section>

        <section className="cw-card flex flex-col gap-4" aria-labelledby={id('sheet')}>
          <div>
            <h2 id={id('sheet')} className="font-serif text-xl font-semibold">
              Site sheet
            </h2>
            <p className="cw-muted text-sm">
              Your measurements, each with its unit. Answerers can rerun them; leave out what you do not know.
            </p>
          </div>
          <div className="grid gap-4 sm:grid-cols-2">
            {MEASUREMENTS.map((m) => {
              const name = `siteSheet.${m.name}` as const;
              return (
                <div key={m.name}>
                  <label htmlFor={id(name)} className={labelClass}>
                    {m.label}
                  </label>
                  <input
                    id={id(name)}
                    {...register(name)}
                    inputMode="text"
                    autoComplete="off"
                    aria-invalid={errorAt(name) ? true : undefined}
                    aria-describedby={describe(name, true)}
                    className={`${inputClass} cw-num`}
                  />
                  <p id={`${id(name)}-hint`} className="cw-muted mt-1 text-xs">
                    {m.hint[units]}
                  </p>
                  <UnitPrompt
                    id={`${id(name)}-unit`}
                    unit={bareNumberUnit(m.name, sheet[m.name], units)}
                    onAdd={(unit) =>
                      setValue(name, `${(sheet[m.name] ?? '').trim()} ${unit}`, {
                        shouldDirty: true,
                        shouldValidate: Boolean(errorAt(name)),
                      })
                    }
                  />
                  <FieldMessage id={`${id(name)}-error`} message={errorAt(name)} />
                </div>
              );
            })}
            {PUMP_AND_PIPES.map((s) => {
              const name = `siteSheet.${s.name}` as const;
              return (
                <div key={s.name}>
                  <label htmlFor={id(name)} className={labelClass}>
                    {s.label}
                  </label>
                  <select
                    id={id(name)}
                    {...register(name)}
                    aria-invalid={errorAt(name) ? true : undefined}
                    aria-describedby={describe(name)}
                    className={inputClass}
                  >
                    <option value="">not known</option>
                    {s.options.map((o) => (
                      <option key={o.value} value={o.value}>
                        {o.label}
                      </option>
                    ))}
                  </select>
                  <FieldMessage id={`${id(name)}-error`} message={errorAt(name)} />
                </div>
              );
            })}
          </div>
          <fieldset aria-describedby={describe('siteSheet.symptoms')}>
            <legend className={labelClass}>What the pump does</legend>
            <Controller
              control={control}
              name="siteSheet.symptoms"
              render={({ field }) => {
                const on = (field.value ?? '').split(',').filter(Boolean);
                return (
                  <div className="mt-1 grid gap-2 sm:grid-cols-2">
                    {SYMPTOMS.map((s) => (
                      <label key={s} className="flex items-center gap-2 text-sm">
                        <input
                          type="checkbox"
                          checked={on.includes(s)}
                          onBlur={field.onBlur}
                          onChange={(e) =>
                            field.onChange((e.target.checked ? [...on, s] : on.filter((x) => x !== s)).join(','))
                          }
                        />
                        {SYMPTOM_LABELS[s]}
                      </label>
                    ))}
                  </div>
                );
              }}
            />
            <FieldMessage id={`${id('siteSheet.symptoms')}-error`} message={errorAt('siteSheet.symptoms')} />
          </fieldset>
        </section>

        <section className="cw-card flex flex-col gap-2" aria-labelledby={id('photos')}>
          <h2 id={id('photos')} className="font-serif text-xl font-semibold">
            Photos
          </h2>
          <p className="cw-muted text-sm">The pump, the waste valve beating, the intake: up to six.</p>
          <PhotoPicker onChange={(ids: string[]) => setValue('photoIds', ids)} />
          <FieldMessage id={`${id('photoIds')}-error`} message={errorAt('photoIds')} />
        </section>
      </div>

      <aside className="flex flex-col gap-4 lg:sticky lg:top-4 lg:col-start-2 lg:row-span-2 lg:row-start-1">
        <section className="cw-card flex flex-col gap-2" aria-labelledby={id('before')} data-testid="before-you-post">
          <h2 id={id('before')} className="font-serif text-lg font-semibold">
            Before you post
          </h2>
          <p className="cw-muted text-sm">The stall check, run on your site sheet as you type.</p>
          <div aria-live="polite" className="flex flex-col gap-2">
            {stall.kind === 'idle' ? (
              <p className="text-sm">Type the fall and the lift to start.</p>
            ) : stall.kind === 'needs' ? (
              <p className="text-sm">Add the {stall.missing.join(', ')} to see the likely causes.</p>
            ) : stall.kind === 'refused' ? (
              <p
                role="alert"
                className="rounded-md border-l-4 border-signal bg-signal-100 p-2 text-sm text-signal-900 dark:bg-signal-900 dark:text-signal-100"
              >
                <span aria-hidden="true">⚠ </span>
                {stall.message}
              </p>
            ) : (
              stall.node
            )}
          </div>
        </section>
        {similar.length ? (
          <section className="cw-card flex flex-col gap-2" aria-labelledby={id('similar')}>
            <h2 id={id('similar')} className="font-serif text-lg font-semibold">
              Similar questions
            </h2>
            <ul className="flex flex-col gap-1 text-sm">
              {similar.map((q) => (
                <li key={q.id}>
                  <a href={`/questions/${q.id}`} className="cw-link">
                    {q.title}
                  </a>
                  {q.fixed ? (
                    <span className="ml-2 rounded-full bg-moss-100 px-2 text-xs text-moss-700 dark:bg-moss-700 dark:text-moss-100">
                      fixed it
                    </span>
                  ) : null}
                </li>
              ))}
            </ul>
          </section>
        ) : null}
      </aside>

      {/* After the stall check and the similar questions on a phone, so both are read before posting;
          under the form on a wide screen, where they sit beside it. */}
      <div className="flex flex-col gap-2 lg:col-start-1">
        {guide ? (
          <p className="cw-muted text-sm">
            Asked from the guide{' '}
            <a href={`/guides/${guide}`} className="cw-link">
              {guide.replace(/-/g, ' ')}
            </a>
            .
          </p>
        ) : null}
        <FieldMessage id={id('server')} message={errors.root?.server?.message} />
        <div className="flex flex-wrap items-center gap-3">
          <button type="submit" className="cw-button" disabled={isSubmitting}>
            {isSubmitting ? 'Posting…' : 'Post my question'}
          </button>
          {draft !== 'none' ? (
            <button type="button" className="cw-link text-sm" onClick={discardDraft}>
              Discard this draft
            </button>
          ) : null}
        </div>
        {draft !== 'none' ? (
          <p className="cw-muted text-xs">Your draft is kept on this device until you post or discard it.</p>
        ) : null}
      </div>
    </form>
  );
}
