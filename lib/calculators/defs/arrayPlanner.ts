import { ARRAY_LIMITS, arrayPlannerSchema, planArray } from '@/lib/hydraulics';
import { defineCalculator, type FormState } from '../types';
import { pipeFields, resolvePipeRun, yesNo } from '../pipes';
import { PUMP_TYPE_OPTIONS } from '../options';

const STAGED_ONLY = new Set([
  'staged.upperFallM',
  'staged.upperLiftM',
  'staged.upperDriveFlowM3s',
  'staged.upperDeliveryLine.lengthM',
  'staged.upperDeliveryLine.nominal',
  'staged.upperDeliveryLine.series',
]);

/**
 * Identical pumps side by side, each on its own drive pipe, into one delivery line;
 * optionally feeding a tank that drives an upper pump. The first pump's drive pipe
 * may carry extra 90° elbows, which cost that pump delivery.
 */
export const arrayPlanner = defineCalculator(planArray, {
  id: 'array-planner',
  name: 'Array planner',
  line: 'Several pumps in parallel, or in stages to reach higher.',
  blurb: 'Pumps in parallel add flow, not height; pumps in stages add height.',
  guide: 'pumps-in-parallel-and-in-stages',
  schema: arrayPlannerSchema,
  fields: [
    {
      type: 'select',
      name: 'mode',
      prop: 'mode',
      label: 'Arrangement',
      options: [
        { value: 'parallel', label: 'In parallel into one delivery line' },
        { value: 'staged', label: 'In stages: lower pumps fill a tank that drives an upper pump' },
      ],
    },
    {
      type: 'number',
      name: 'pumpCount',
      prop: 'pumps',
      label: 'Pumps (lower pumps when staged)',
      min: 1,
      max: 20,
      step: 1,
    },
    { type: 'quantity', name: 'fallM', prop: 'fall', label: 'Fall', qty: 'length' },
    { type: 'quantity', name: 'liftM', prop: 'lift', label: 'Lift (to the tank, when staged)', qty: 'length' },
    {
      type: 'quantity',
      name: 'driveFlowEach',
      prop: 'driveFlowEach',
      label: 'Drive flow of each pump (optional)',
      qty: 'flow',
      help: 'Leave empty to estimate it from the fall and the drive pipe.',
    },
    {
      type: 'select',
      name: 'pumpType',
      prop: 'pumpType',
      label: 'Kind of pump',
      options: PUMP_TYPE_OPTIONS,
    },
    {
      type: 'number',
      name: 'efficiency',
      prop: 'efficiency',
      label: 'Efficiency of each pump (optional)',
      percent: true,
      help: 'Leave empty to use the typical value for each pump’s lift ratio; type your pumps’ own, as 0.3 or 30 %, once you have measured it.',
    },
    ...pipeFields(
      'drivePipe',
      { length: 'driveLength', size: 'driveSize', series: 'driveMaterial' },
      'Each drive pipe',
    ),
    {
      type: 'number',
      name: 'extraElbows',
      prop: 'extraElbows',
      label: 'Extra 90° elbows on the first drive pipe',
      min: 0,
      max: 10,
      step: 1,
    },
    ...pipeFields(
      'deliveryLine',
      { length: 'deliveryLength', size: 'deliverySize', series: 'deliveryMaterial' },
      'Delivery line',
    ),
    {
      type: 'quantity',
      name: 'sourceSpareFlowM3s',
      prop: 'sourceFlow',
      label: 'Flow the source can spare (optional)',
      qty: 'flow',
    },
    {
      type: 'quantity',
      name: 'staged.upperFallM',
      prop: 'upperFall',
      label: 'Upper pump: fall from the tank',
      qty: 'length',
      help: 'Empty: the same as the lower fall.',
    },
    { type: 'quantity', name: 'staged.upperLiftM', prop: 'upperLift', label: 'Upper pump: lift', qty: 'length' },
    {
      type: 'quantity',
      name: 'staged.upperDriveFlowM3s',
      prop: 'upperDriveFlow',
      label: 'Upper pump: drive flow (optional)',
      qty: 'flow',
      help: 'Empty: estimated from its fall and drive pipe.',
    },
    ...pipeFields(
      'staged.upperDeliveryLine',
      { length: 'upperDeliveryLength', size: 'upperDeliverySize', series: 'upperDeliveryMaterial' },
      'Upper pump: delivery line',
    ).map((f) =>
      f.type === 'quantity' ? { ...f, label: `${f.label} (optional)`, help: 'Empty: its friction is left out.' } : f,
    ),
  ],
  defaults: {
    mode: 'parallel',
    pumps: '2',
    fall: '4 ft',
    lift: '29 ft',
    driveLength: '24 ft',
    driveSize: '1/2',
    driveMaterial: 'pvc-sch40',
    extraElbows: '0',
    deliveryLength: '150 ft',
    deliverySize: '3/4',
    deliveryMaterial: 'hdpe-dr11',
    upperLift: '65 ft',
    pumpType: 'homemade',
    upperDeliverySize: '3/4',
    upperDeliveryMaterial: 'hdpe-dr11',
  },
  visible: (name: string, state: FormState) => !STAGED_ONLY.has(name) || state.mode?.text === 'staged',
  toInput: (v) => {
    const count = Math.max(1, Math.round(Number(v.pumpCount ?? 1)));
    const elbows = Math.max(0, Math.round(Number(v.extraElbows ?? 0)));
    const pumpType = typeof v.pumpType === 'string' ? v.pumpType : 'homemade';
    const efficiency = v.efficiency !== undefined ? { efficiency: v.efficiency } : {};
    const pump = (i: number) => ({
      label: `Pump ${i + 1}`,
      pumpType,
      ...efficiency,
      ...(v.driveFlowEach !== undefined ? { driveFlowM3s: v.driveFlowEach } : {}),
      drivePipe: resolvePipeRun(
        v.drivePipe,
        {
          fittings: i === 0 && elbows > 0 ? [{ kind: 'elbow-90-threaded', count: elbows }] : [],
        },
        'drivePipe.nominal',
      ),
    });
    const staged = v.mode === 'staged' ? (v.staged as Record<string, unknown> | undefined) : undefined;
    const upperLine = staged?.upperDeliveryLine as Record<string, unknown> | undefined;
    return {
      fallM: v.fallM,
      liftM: v.liftM,
      pumps: Array.from({ length: count }, (_, i) => pump(i)),
      deliveryLine: resolvePipeRun(v.deliveryLine, {}, 'deliveryLine.nominal'),
      ...(v.sourceSpareFlowM3s !== undefined ? { sourceSpareFlowM3s: v.sourceSpareFlowM3s } : {}),
      ...(staged
        ? {
            staged: {
              upperFallM: staged.upperFallM ?? v.fallM,
              upperLiftM: staged.upperLiftM,
              upperPump: {
                label: 'Upper pump',
                pumpType,
                ...efficiency,
                ...(staged.upperDriveFlowM3s !== undefined ? { driveFlowM3s: staged.upperDriveFlowM3s } : {}),
                drivePipe: resolvePipeRun(v.drivePipe, {}, 'drivePipe.nominal'),
              },
              ...(upperLine?.lengthM !== undefined
                ? { upperDeliveryLine: resolvePipeRun(upperLine, {}, 'staged.upperDeliveryLine.nominal') }
                : {}),
            },
          }
        : {}),
    };
  },
  rows: (r) => [
    { label: 'Combined delivery', value: r.combinedDeliveryM3s, qty: 'smallFlow', emphasis: true },
    { label: 'Per day', value: r.combinedPerDayM3PerDay, qty: 'dailyVolume', emphasis: !r.staged },
    { label: 'Against the first pump alone', value: r.gainOverFirstPump, unit: '×' },
    { label: 'Total drive flow', value: r.totalDriveFlowM3s, qty: 'flow' },
    ...(r.sourceShare !== undefined
      ? [{ label: 'Share of the spare source flow', value: r.sourceShare * 100, unit: '%' }]
      : []),
    {
      label: 'Friction in the shared delivery line',
      value: r.deliveryFrictionHeadM + r.deliveryMinorHeadM,
      qty: 'length' as const,
    },
    { label: 'Highest lift (any number of pumps)', value: r.maxLiftM, qty: 'length' },
    ...(r.staged
      ? [
          {
            label: 'At the top, per day',
            value: r.staged.topYieldPerDayM3PerDay,
            qty: 'dailyVolume' as const,
            emphasis: true,
          },
          { label: 'Upper pump runs around the clock', value: yesNo(r.staged.runsAroundTheClock) },
          { label: 'Share of the day the upper pump runs', value: r.staged.dutyFraction * 100, unit: '%' },
          {
            label: 'Lower pumps needed to run it all day',
            value:
              r.staged.lowerPumpsNeeded > 0
                ? String(r.staged.lowerPumpsNeeded)
                : `more than ${ARRAY_LIMITS.lowerCopies}`,
          },
        ]
      : []),
  ],
});
