import {
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
      options: sizeOptions,
      normalize: normalizeSize,
    },
    {
      type: 'select',
      name: `${prefix}.series`,
      prop: props.series,
      label: `${label} material`,
      options: seriesOptions,
      normalize: normalizeSeries,
    },
  ];
}

/** Replaces { nominal, series } with the inside diameter, wall and rating from the schedule tables. */
export function resolvePipeRun(run: unknown, extra: Record<string, unknown> = {}) {
  const r = (run ?? {}) as Record<string, unknown>;
  const { nominal, series, ...rest } = r;
  const spec = resolvePipe(series as PipeSeries, nominal as NominalSize);
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

export const yesNo = (b: boolean) => (b ? 'yes' : 'no');
