'use client';

import { useRef, useState } from 'react';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { NOMINAL_LABELS, NOMINAL_SIZES } from '@/lib/hydraulics/pipes';
import { PIPE_MATERIAL_CHOICES } from '@/lib/validation/field-log';
import { PUMP_TYPES } from '@/lib/vocabulary';
import { FieldError, inputClass, labelClass, sendJson, type FormError } from '@/components/forms/api';
import { OutboxPanel } from '@/components/offline/OutboxPanel';
import { enqueue } from '@/lib/offline/outbox';
import { sendKeptPhotos, withPhotoIds, type KeptPhoto } from '@/lib/offline/photos';
import { KeptPhotos } from './KeptPhotos';
import { MATERIAL_LABELS } from './format';
import { formatDate, isoDay } from '@/lib/dates';
import { useUnits } from '@/components/units/UnitsProvider';
import type { UnitSystem } from '@/lib/hydraulics';

export type Trial = { volume: string; seconds: string };

/** Hints show an example in the reader's own units; any unit typed is accepted. */
const TEXT_FIELDS: { name: string; label: string; hint: Record<UnitSystem, string> }[] = [
  {
    name: 'fall',
    label: 'Fall',
    hint: {
      US: 'intake water surface down to the pump, e.g. “4 ft”',
      metric: 'intake water surface down to the pump, e.g. “1.2 m”',
    },
  },
  {
    name: 'lift',
    label: 'Lift',
    hint: { US: 'pump up to the delivery outlet, e.g. “29 ft”', metric: 'pump up to the delivery outlet, e.g. “9 m”' },
  },
  { name: 'driveLength', label: 'Drive pipe length', hint: { US: 'e.g. “30 ft”', metric: 'e.g. “9 m”' } },
  {
    name: 'deliveryLength',
    label: 'Delivery line length',
    hint: { US: 'optional, e.g. “200 ft”', metric: 'optional, e.g. “60 m”' },
  },
  { name: 'driveFlow', label: 'Drive flow (all pumps)', hint: { US: 'e.g. “8 gal/min”', metric: 'e.g. “30 L/min”' } },
];

/** What a bare number in a trial's volume box means, in the reader's units. */
const BARE_VOLUME: Record<UnitSystem, { unit: string; words: string; example: string }> = {
  US: { unit: 'gal', words: 'US gallons', example: '“0.5 gal”' },
  metric: { unit: 'L', words: 'litres', example: '“1.5 L”' },
};

/** °F typed by a US reader, as the °C the field log keeps. */
const toCelsius = (t: number | undefined, units: UnitSystem) =>
  t === undefined || units === 'metric' ? t : Math.round((((t - 32) * 5) / 9) * 10) / 10;

/**
 * Records one test: the installation, the drive flow and each bucket trial. Opened from
 * a site, it records the test on that site, the installation filled in from its plan.
 */
export function EntryForm({
  initial = {},
  initialTrials,
  site,
}: {
  initial?: Record<string, string>;
  /** trials timed already (the trial timer's), as typed: "5 gal", seconds */
  initialTrials?: Trial[];
  site?: { id: string; name: string; version: number };
} = {}) {
  const router = useRouter();
  const { units } = useUnits();
  const [v, setV] = useState<Record<string, string>>({
    siteName: '',
    testedOn: isoDay(new Date()),
    pumpType: 'homemade',
    pumpSize: '1',
    pumpCount: '1',
    arrangement: 'single',
    fall: '',
    lift: '',
    driveLength: '',
    driveSize: '1',
    driveMaterial: 'pvc',
    deliveryLength: '',
    deliverySize: '',
    deliveryMaterial: '',
    driveFlow: '',
    driveFlowMethod: 'measured',
    driveFlowHow: '',
    bpm: '',
    wasteValveSetting: '',
    waterTempC: '',
    notes: '',
    ...initial,
  });
  const [trials, setTrials] = useState<Trial[]>(initialTrials?.length ? initialTrials : [{ volume: '', seconds: '' }]);
  const [photos, setPhotos] = useState<KeptPhoto[]>([]);
  const [error, setError] = useState<FormError | null>(null);
  const [busy, setBusy] = useState(false);
  const [kept, setKept] = useState(false);
  const sendKey = useRef<string | null>(null);
  const set = (k: string) => (e: { target: { value: string } }) => setV((o) => ({ ...o, [k]: e.target.value }));
  const num = (s: string) => (s.trim() === '' ? undefined : Number(s));
  const opt = (s: string) => (s.trim() === '' ? undefined : s);

  async function submit(ev: React.FormEvent) {
    ev.preventDefault();
    setBusy(true);
    const body = {
      ...(site ? { siteId: site.id } : {}),
      siteName: v.siteName,
      testedOn: v.testedOn,
      pumpType: v.pumpType,
      pumpSize: v.pumpSize,
      pumpCount: num(v.pumpCount),
      arrangement: v.arrangement,
      fall: v.fall,
      lift: v.lift,
      driveLength: v.driveLength,
      driveSize: v.driveSize,
      driveMaterial: v.driveMaterial,
      deliveryLength: opt(v.deliveryLength),
      deliverySize: opt(v.deliverySize),
      deliveryMaterial: opt(v.deliveryMaterial),
      driveFlow: v.driveFlow,
      driveFlowMethod: v.driveFlowMethod,
      driveFlowHow: v.driveFlowHow,
      trials: trials.map((t) => ({
        volume: /^\s*[\d.]+\s*$/.test(t.volume) ? `${t.volume.trim()} ${BARE_VOLUME[units].unit}` : t.volume,
        seconds: Number(t.seconds),
      })),
      bpm: num(v.bpm),
      wasteValveSetting: v.wasteValveSetting,
      waterTempC: toCelsius(num(v.waterTempC), units),
      notes: v.notes,
      // the photos are named when sent, by the ids the server gives them (withPhotoIds)
      photoIds: [] as string[],
    };
    // one key for this record, however many times it is sent, so a send cut off after
    // the server wrote it and sent again from the phone's outbox is still one entry
    const key = (sendKey.current ??= crypto.randomUUID());
    let online = navigator.onLine;
    let chosen = photos;
    if (online && chosen.some((p) => !p.uploadedId)) {
      // the photos first, each under its own key; the ids they get stay with them
      const up = await sendKeptPhotos(chosen, fetch, async (now) => void (chosen = now));
      chosen = up.photos;
      setPhotos(chosen);
      if (up.outcome === 'refused') {
        setBusy(false);
        return setError({ field: 'photos', message: up.error.message });
      }
      online = up.outcome === 'sent';
    }
    const out = online
      ? await sendJson<{ id: number; url: string }>('/api/field-log', 'POST', withPhotoIds(body, chosen), {
          headers: { 'Idempotency-Key': key },
        })
      : null;
    setBusy(false);
    if (out?.ok) return router.push(out.data.url);
    if (out && out.status !== 0) return setError(out.error);
    // no signal (or the server out of reach): kept on the phone, sent when it comes back
    await enqueue({
      id: key,
      kind: 'field-log',
      url: '/api/field-log',
      body,
      label: `Field log: ${v.siteName || 'a test'}, ${formatDate(v.testedOn) || v.testedOn}`,
      photos: chosen,
    });
    sendKey.current = null;
    setKept(true);
  }

  if (kept)
    return (
      <div className="flex max-w-3xl flex-col gap-4 font-sans" data-testid="entry-kept">
        <p className="cw-card" role="status">
          No signal: the test is kept on this phone and will be sent when it is back online. Keep this page or the{' '}
          <Link href="/field-kit" className="cw-link">
            field kit
          </Link>{' '}
          open, or tap “Send now” below.
        </p>
        <OutboxPanel />
      </div>
    );

  const text = (name: string, label: string, hint?: string, type = 'text') => (
    <div>
      <label className={labelClass} htmlFor={`fl-${name}`}>
        {label}
      </label>
      <input
        id={`fl-${name}`}
        name={name}
        type={type}
        className={inputClass}
        value={v[name]}
        onChange={set(name)}
        aria-describedby={hint ? `fl-${name}-hint` : undefined}
      />
      {hint ? (
        <p id={`fl-${name}-hint`} className="cw-muted mt-1 text-xs">
          {hint}
        </p>
      ) : null}
      <FieldError error={error} field={name} />
    </div>
  );
  const select = (name: string, label: string, options: readonly { value: string; label: string }[]) => (
    <div>
      <label className={labelClass} htmlFor={`fl-${name}`}>
        {label}
      </label>
      <select id={`fl-${name}`} name={name} className={inputClass} value={v[name]} onChange={set(name)}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <FieldError error={error} field={name} />
    </div>
  );
  const sizes = NOMINAL_SIZES.map((s) => ({ value: s, label: NOMINAL_LABELS[s] }));
  const materials = PIPE_MATERIAL_CHOICES.map((m) => ({ value: m, label: MATERIAL_LABELS[m] }));

  return (
    <form
      onSubmit={submit}
      noValidate
      className="flex max-w-3xl flex-col gap-5 font-sans"
      aria-label="Record a field log test"
    >
      {site ? (
        <p className="cw-card text-sm" data-testid="entry-site">
          Recorded on your site{' '}
          <Link href={`/sites/${site.id}`} className="cw-link font-semibold">
            {site.name}
          </Link>
          . The pumps and pipes are filled in from its plan (version {site.version}): change anything built differently,
          and set the fall and lift to the day’s if the water stands higher or lower.
          <FieldError error={error} field="siteId" />
        </p>
      ) : null}
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 font-serif text-lg font-semibold">The test</legend>
        {text('siteName', 'Site name', 'the same name links tests of one installation')}
        {text('testedOn', 'Date of the test', undefined, 'date')}
        {select(
          'pumpType',
          'Pump type',
          PUMP_TYPES.map((t) => ({ value: t, label: t })),
        )}
        {select('pumpSize', 'Pump size', sizes)}
        {text('pumpCount', 'Number of pumps', undefined, 'number')}
        {select('arrangement', 'Arrangement', [
          { value: 'single', label: 'single pump' },
          { value: 'parallel', label: 'in parallel' },
          { value: 'staged', label: 'staged' },
        ])}
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 font-serif text-lg font-semibold">Heads and pipes</legend>
        {TEXT_FIELDS.slice(0, 3).map((f) => (
          <div key={f.name}>{text(f.name, f.label, f.hint[units])}</div>
        ))}
        {select('driveSize', 'Drive pipe size', sizes)}
        {select('driveMaterial', 'Drive pipe material', materials)}
        {text('deliveryLength', 'Delivery line length', TEXT_FIELDS[3]!.hint[units])}
        {select('deliverySize', 'Delivery line size', [{ value: '', label: 'not recorded' }, ...sizes])}
        {select('deliveryMaterial', 'Delivery line material', [{ value: '', label: 'not recorded' }, ...materials])}
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 font-serif text-lg font-semibold">Drive flow and the pump</legend>
        {text('driveFlow', TEXT_FIELDS[4]!.label, TEXT_FIELDS[4]!.hint[units])}
        {select('driveFlowMethod', 'Drive flow was', [
          { value: 'measured', label: 'measured' },
          { value: 'estimated', label: 'estimated' },
        ])}
        {text('driveFlowHow', 'How', 'e.g. waste and delivery caught in a bucket, timed')}
        {text('bpm', 'Beats per minute', 'optional', 'number')}
        {text('wasteValveSetting', 'Waste valve setting', 'optional, in words')}
        {text('waterTempC', `Water temperature (${units === 'US' ? '°F' : '°C'})`, 'optional', 'number')}
      </fieldset>
      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 font-serif text-lg font-semibold">Bucket trials at the delivery outlet</legend>
        <p className="cw-muted text-sm">
          One row a trial: what the bucket caught and how long it took. A bare number is {BARE_VOLUME[units].words}; a
          unit such as {BARE_VOLUME[units].example} works too.
        </p>
        {trials.map((t, i) => (
          <div key={i} className="flex flex-wrap items-end gap-3" data-trial={i}>
            <label className={labelClass}>
              Trial {i + 1} volume
              <input
                name={`trials.${i}.volume`}
                aria-label={`Trial ${i + 1} volume`}
                className={inputClass}
                value={t.volume}
                onChange={(e) => setTrials((o) => o.map((x, j) => (j === i ? { ...x, volume: e.target.value } : x)))}
              />
            </label>
            <label className={labelClass}>
              seconds
              <input
                name={`trials.${i}.seconds`}
                aria-label={`Trial ${i + 1} seconds`}
                type="number"
                step="0.1"
                className={inputClass}
                value={t.seconds}
                onChange={(e) => setTrials((o) => o.map((x, j) => (j === i ? { ...x, seconds: e.target.value } : x)))}
              />
            </label>
            {trials.length > 1 ? (
              <button
                type="button"
                className="cw-link text-sm"
                onClick={() => setTrials((o) => o.filter((_, j) => j !== i))}
              >
                Remove
              </button>
            ) : null}
            <FieldError error={error} field={`trials.${i}`} />
          </div>
        ))}
        <FieldError error={error} field="trials" />
        <button
          type="button"
          className="cw-link self-start text-sm"
          onClick={() => setTrials((o) => [...o, { volume: '', seconds: '' }])}
        >
          Add a trial
        </button>
      </fieldset>
      <div>
        <label className={labelClass} htmlFor="fl-notes">
          Notes
        </label>
        <textarea id="fl-notes" name="notes" rows={4} className={inputClass} value={v.notes} onChange={set('notes')} />
      </div>
      <section aria-label="Photos" className="flex flex-col gap-2">
        <KeptPhotos photos={photos} onChange={setPhotos} />
        <FieldError error={error} field="photos" />
        <FieldError error={error} field="photoIds" />
      </section>
      <FieldError error={error} />
      <button type="submit" className="cw-button self-start" disabled={busy}>
        Save the test
      </button>
    </form>
  );
}
