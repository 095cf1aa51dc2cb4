import {
  BEATS_PER_MINUTE_RANGE,
  checkDrivePipe,
  DEFAULT_BEATS_PER_MINUTE,
  drivePipeCheckSchema,
  FATIGUE_DESIGN_LIFE_YEARS,
  METRIC_SERIES,
  PIPE_SERIES,
  type MetricSeries,
  type DrivePipeCheckResults,
  type PipeSeries,
} from '@/lib/hydraulics';
import { defineCalculator, type ResultRow } from '../types';
import {
  driveFittingFields,
  driveFittings,
  METRIC_SERIES_LABELS,
  pipeFields,
  resolvePipeRun,
  SERIES_LABELS,
  yesNo,
} from '../pipes';

/** Past this the fatigue life is shown as "more than": no one plans a drive pipe for longer. */
const FATIGUE_YEARS_SHOWN = 1000;

function fatigueRow(f: NonNullable<DrivePipeCheckResults['fatigue']>): ResultRow {
  const label = `Fatigue life at ${f.beatsPerMinute} beats a minute (PVC)`;
  return f.yearsToFailure > FATIGUE_YEARS_SHOWN
    ? { label, value: `more than ${FATIGUE_YEARS_SHOWN.toLocaleString('en')} years` }
    : { label, value: f.yearsToFailure, unit: 'years', emphasis: f.yearsToFailure < FATIGUE_DESIGN_LIFE_YEARS };
}

export const drivePipeCheck = defineCalculator(checkDrivePipe, {
  id: 'drive-pipe-check',
  name: 'Drive pipe check',
  line: 'Length for the fall, surge pressure and whether the pipe will stand it.',
  blurb: 'Length for the fall, the pressure wave, and the surge against the pipe’s rating.',
  guide: 'the-drive-pipe',
  schema: drivePipeCheckSchema,
  fields: [
    { type: 'quantity', name: 'fallM', prop: 'fall', label: 'Fall', qty: 'length' },
    ...pipeFields('drivePipe', { length: 'length', size: 'size', series: 'material' }, 'Drive pipe'),
    { type: 'quantity', name: 'liftM', prop: 'lift', label: 'Lift (optional)', qty: 'length' },
    { type: 'quantity', name: 'driveFlowM3s', prop: 'driveFlow', label: 'Measured drive flow (optional)', qty: 'flow' },
    ...driveFittingFields,
    {
      type: 'select',
      name: 'joints',
      prop: 'joints',
      label: 'Joints',
      options: [
        { value: 'plain', label: 'Solvent-welded, fused or compression' },
        { value: 'threaded', label: 'Threaded' },
      ],
      help: 'Threaded plastic pipe is rated lower than the pipe itself.',
    },
    {
      type: 'quantity',
      name: 'valveClosureTimeS',
      prop: 'closureTime',
      label: 'Waste valve closing time (optional)',
      qty: 'time',
      help: 'Empty: a sudden closure, the worst case.',
    },
    {
      type: 'number',
      name: 'beatsPerMinute',
      prop: 'bpm',
      label: 'Beats per minute',
      min: BEATS_PER_MINUTE_RANGE.min,
      max: BEATS_PER_MINUTE_RANGE.max,
      step: 1,
      help: `For the fatigue life of a PVC drive pipe; a small ram beats ${BEATS_PER_MINUTE_RANGE.min}–${BEATS_PER_MINUTE_RANGE.max} times a minute (${BEATS_PER_MINUTE_RANGE.source}).`,
    },
  ],
  defaults: {
    fall: '4 ft',
    length: '24 ft',
    size: '1/2',
    material: 'pvc-sch40',
    elbows: '0',
    valve: 'none',
    joints: 'plain',
    bpm: String(DEFAULT_BEATS_PER_MINUTE),
  },
  toInput: (v) => {
    const { elbows, valve, ...rest } = v;
    const run = v.drivePipe as Record<string, unknown> | undefined;
    return {
      ...rest,
      // the series goes to the engine too, so that threaded joints are rated by what the pipe is
      // (the engine rates joints of the US series; metric plastic pipe is never threaded)
      ...((PIPE_SERIES as readonly unknown[]).includes(run?.series) ? { series: run?.series } : {}),
      drivePipe: resolvePipeRun(run, { fittings: driveFittings(elbows, valve) }, 'drivePipe.nominal'),
    };
  },
  rows: (r) => [
    { label: 'Peak pressure at the pump', value: r.peakPressurePa, qty: 'pressure', emphasis: true },
    { label: 'Pipe rating ÷ peak', value: r.ratingMargin, unit: '×', emphasis: true },
    { label: 'Shut-off pressure (delivery closed)', value: r.shutOffPressurePa, qty: 'pressure', emphasis: true },
    {
      label: r.weakestIs === 'threaded joint' ? 'Weakest rating (threaded joints)' : 'Weakest rating (the pipe)',
      value: r.weakestRatingPa,
      qty: 'pressure',
    },
    { label: 'Weakest rating ÷ shut-off pressure', value: r.shutOffMargin, unit: '×', emphasis: true },
    ...(r.fatigue ? [fatigueRow(r.fatigue)] : []),
    { label: 'Length ÷ fall (L/H)', value: r.lengthToFall },
    { label: 'Length ÷ inside diameter (L/D)', value: r.lengthToDiameter },
    { label: 'Full-flow velocity', value: r.fullFlowVelocityMs, qty: 'velocity' },
    { label: 'Pressure-wave speed', value: r.waveSpeedMs, qty: 'velocity' },
    { label: 'Wave round trip 2L/c', value: r.roundTripS * 1000, unit: 'ms' },
    { label: 'Surge on sudden closure', value: r.surgePa, qty: 'pressure' },
    { label: 'Pipe rating', value: r.pressureRatingPa, qty: 'pressure' },
    { label: 'Rigid enough for a drive pipe', value: yesNo(r.rigid) },
  ],
});

/**
 * The surge on sudden closure with the same size, fall and length in each pipe
 * series, for the chart; `values` are the form's fields as read (SI). A series
 * the engine refuses for this pipe is left out.
 */
export function surgeByMaterial(
  values: Record<string, unknown>,
): { series: string; label: string; surgePa: number; current: boolean }[] {
  const run = values.drivePipe as { series?: string; nominal?: string } | undefined;
  const current = run?.series;
  // a metric size is compared across the metric series, a nominal size across the US ones
  const metric = typeof run?.nominal === 'string' && run.nominal.endsWith('mm');
  const series: readonly string[] = metric ? METRIC_SERIES : PIPE_SERIES;
  return series.flatMap((s) => {
    try {
      const out = drivePipeCheck.run({
        ...values,
        drivePipe: resolvePipeRun({ ...(values.drivePipe as Record<string, unknown>), series: s }),
      });
      const label = metric ? METRIC_SERIES_LABELS[s as MetricSeries] : SERIES_LABELS[s as PipeSeries];
      return [{ series: s, label, surgePa: out.results.surgePa, current: s === current }];
    } catch {
      return [];
    }
  });
}
