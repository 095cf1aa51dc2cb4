import {
  defaultSeriesFor,
  EngineInputError,
  METRIC_ODS_MM,
  METRIC_SERIES,
  resolveMetricPipe,
  type MetricOd,
  type MetricSeries,
  NOMINAL_LABELS,
  NOMINAL_SIZES,
  PIPE_SERIES,
  parseNominalSize,
  resolvePipe,
  type FittingKind,
  type NominalSize,
  type PipeSeries,
} from '@/lib/hydraulics';
import type { FieldDef } from './types';

export const SERIES_LABELS: Record<PipeSeries, string> = {
  'steel-sch40': 'Steel, schedule 40',
  'steel-sch80': 'Steel, schedule 80',
  'pvc-sch40': 'PVC, schedule 40',
  'pvc-sch80': 'PVC, schedule 80',
  'hdpe-dr9': 'HDPE, DR 9',
  'hdpe-dr11': 'HDPE, DR 11',
  'hdpe-dr17': 'HDPE, DR 17',
};

export const sizeOptions = NOMINAL_SIZES.map((s) => ({ value: s, label: NOMINAL_LABELS[s] }));
export const seriesOptions = PIPE_SERIES.map((s) => ({ value: s, label: SERIES_LABELS[s] }));

export const METRIC_SERIES_LABELS: Record<MetricSeries, string> = {
  'pe100-sdr9': 'PE100, SDR 9 (ISO 4427)',
  'pe100-sdr11': 'PE100, SDR 11 (ISO 4427)',
  'pe100-sdr17': 'PE100, SDR 17 (ISO 4427)',
  'pe80-sdr9': 'PE80, SDR 9 (ISO 4427)',
  'pe80-sdr11': 'PE80, SDR 11 (ISO 4427)',
  'pe80-sdr17': 'PE80, SDR 17 (ISO 4427)',
  'pvcu-sdr13.6': 'PVC-U, SDR 13.6 (EN 1452)',
  'pvcu-sdr17': 'PVC-U, SDR 17 (EN 1452)',
  'pvcu-sdr21': 'PVC-U, SDR 21 (EN 1452)',
};
const isMetricSeries = (s: unknown): s is MetricSeries => (METRIC_SERIES as readonly unknown[]).includes(s);
/** A metric pipe's size as a form holds it: its outside diameter, "32mm". */
const metricSize = (od: MetricOd) => `${od}mm`;

/** The pickers of a calculator's pipe runs: the US nominal sizes and series, then the metric ones. */
export const pipeSizeOptions = [
  ...sizeOptions,
  ...METRIC_ODS_MM.map((od) => ({ value: metricSize(od), label: `${od} mm OD` })),
];
export const pipeSeriesOptions = [
  ...seriesOptions,
  ...METRIC_SERIES.map((s) => ({ value: s, label: METRIC_SERIES_LABELS[s] })),
];
export const normalizePipeSize = (raw: string) => {
  const mm = /^\s*(\d+)\s*mm\b/i.exec(raw);
  return mm ? `${mm[1]}mm` : normalizeSize(raw);
};

/**
 * What a pipe picker starts from for a metric reader, when the MDX or share link
 * names no pipe: the ISO 4427 / EN 1452 series of the same material and the
 * metric pipe nearest the US default's bore. A form that names its pipe (every
 * saved form does) keeps it.
 */
export function metricPipeDefault(series: string, size: string): { series: string; size: string } | undefined {
  if (!(PIPE_SERIES as readonly string[]).includes(series)) return undefined;
  const us = resolvePipe(series as PipeSeries, size as NominalSize);
  const metric = defaultSeriesFor('metric', us.material);
  if (!isMetricSeries(metric)) return undefined;
  let best: MetricOd | undefined;
  for (const od of METRIC_ODS_MM) {
    const p = resolveMetricPipe(metric, od);
    if (!p) continue;
    const b = best === undefined ? undefined : resolveMetricPipe(metric, best);
    if (!b || Math.abs(p.insideDiameterM - us.insideDiameterM) < Math.abs(b.insideDiameterM - us.insideDiameterM))
      best = od;
  }
  return best === undefined ? undefined : { series: metric, size: metricSize(best) };
}

export const normalizeSize = (raw: string) => parseNominalSize(raw) ?? raw;
export const normalizeSeries = (raw: string) => {
  const r = raw.trim().toLowerCase();
  if ((PIPE_SERIES as readonly string[]).includes(r)) return r;
  if (r === 'steel' || r === 'galvanized' || r === 'galvanised') return 'steel-sch40';
  if (r === 'pvc') return 'pvc-sch40';
  if (r === 'hdpe' || r === 'poly') return 'hdpe-dr11';
  return r;
};

/** Length, nominal size and series of one pipe run, under `prefix` (an engine field such as "drivePipe"). */
export function pipeFields(
  prefix: string,
  props: { length: string; size: string; series: string },
  label: string,
): FieldDef[] {
  return [
    { type: 'quantity', name: `${prefix}.lengthM`, prop: props.length, label: `${label} length`, qty: 'length' },
    {
      type: 'select',
      name: `${prefix}.nominal`,
      prop: props.size,
      label: `${label} size (nominal)`,
      options: pipeSizeOptions,
      normalize: normalizePipeSize,
      seriesField: `${prefix}.series`,
    },
    {
      type: 'select',
      name: `${prefix}.series`,
      prop: props.series,
      label: `${label} material`,
      options: pipeSeriesOptions,
      normalize: normalizeSeries,
    },
  ];
}

/** Replaces { nominal, series } with the inside diameter, wall and rating from the schedule tables. */
export function resolvePipeRun(run: unknown, extra: Record<string, unknown> = {}, field = 'nominal') {
  const r = (run ?? {}) as Record<string, unknown>;
  const { nominal, series, ...rest } = r;
  const spec = resolveSpec(series, nominal, field);
  return {
    ...rest,
    ...extra,
    material: spec.material,
    insideDiameterM: spec.insideDiameterM,
    wallThicknessM: spec.wallThicknessM,
    pressureRatingPa: spec.pressureRatingPa,
  };
}

/**
 * Fittings a drive pipe may carry, as the forms offer them: extra threaded 90°
 * elbows and the valve at its head. Both default to none, the engine's own
 * default, so a form saved before they existed recomputes unchanged.
 */
export const DRIVE_VALVES = {
  none: { label: 'None', kind: undefined },
  gate: { label: 'Gate valve, open', kind: 'gate-valve-open' },
  ball: { label: 'Ball valve, open', kind: 'ball-valve-open' },
} as const satisfies Record<string, { label: string; kind: FittingKind | undefined }>;

export const driveFittingFields: FieldDef[] = [
  {
    type: 'number',
    name: 'elbows',
    prop: 'elbows',
    label: 'Extra 90° elbows on the drive pipe',
    min: 0,
    max: 10,
    step: 1,
  },
  {
    type: 'select',
    name: 'valve',
    prop: 'valve',
    label: 'Valve on the drive pipe',
    options: Object.entries(DRIVE_VALVES).map(([value, v]) => ({ value, label: v.label })),
  },
];

/** The fittings list for the engine from the form's elbow count and valve. */
export function driveFittings(elbows: unknown, valve: unknown): { kind: FittingKind; count: number }[] {
  const n = Math.max(0, Math.round(Number(elbows ?? 0)) || 0);
  const kind = DRIVE_VALVES[(valve as keyof typeof DRIVE_VALVES) ?? 'none']?.kind;
  return [...(n > 0 ? [{ kind: 'elbow-90-threaded' as const, count: n }] : []), ...(kind ? [{ kind, count: 1 }] : [])];
}

/** A US or a metric pipe; a size of the other system is refused naming the size field. */
function resolveSpec(series: unknown, nominal: unknown, field: string) {
  const mm = typeof nominal === 'string' ? /^(\d+)mm$/.exec(nominal) : null;
  if (isMetricSeries(series)) {
    const od = Number(mm?.[1]) as MetricOd;
    const spec = mm ? resolveMetricPipe(series, od) : undefined;
    if (!spec)
      throw new EngineInputError([
        {
          field,
          message: mm
            ? `${METRIC_SERIES_LABELS[series]} is not made in ${od} mm; pick another size`
            : `pick an outside diameter in mm for ${METRIC_SERIES_LABELS[series]}`,
        },
      ]);
    return spec;
  }
  if (mm)
    throw new EngineInputError([
      { field, message: `pick a nominal size in inches for ${String(series)}, or a metric series` },
    ]);
  return resolvePipe(series as PipeSeries, nominal as NominalSize);
}

export const yesNo = (b: boolean) => (b ? 'yes' : 'no');
