import {
  NOMINAL_LABELS,
  NOMINAL_SIZES,
  runStallCheck,
  stallCheckSchema,
  SYMPTOM_LABELS,
  SYMPTOMS,
} from '@/lib/hydraulics';
import { defineCalculator } from '../types';
import {
  driveFittingFields,
  driveFittings,
  normalizePipeSize,
  normalizeSeries,
  normalizeSize,
  pipeFields,
  pipeSeriesOptions,
  pipeSizeOptions,
  resolvePipeRun,
} from '../pipes';
import { PUMP_TYPE_OPTIONS } from '../options';

/** Words people and older links use for a symptom → the engine's code. */
const SYMPTOM_ALIASES: Record<string, string> = { 'frost-stopped': 'delivery-stops-in-frost' };
export const normalizeSymptoms = (raw: string) =>
  raw
    .split(',')
    .map((s) => s.trim())
    .map((s) => SYMPTOM_ALIASES[s] ?? s)
    .filter((s) => (SYMPTOMS as readonly string[]).includes(s))
    .join(',');

const triState = [
  { value: '', label: 'not known' },
  { value: 'yes', label: 'yes' },
  { value: 'no', label: 'no' },
];

export const stallCheck = defineCalculator(runStallCheck, {
  id: 'stall-check',
  name: 'Stall check',
  line: 'Why it stopped beating: likely causes from your site sheet.',
  blurb: 'Why a ram stops cycling or delivers less: likely causes, worked from your site sheet.',
  guide: 'when-it-stops-cycling',
  schema: stallCheckSchema,
  fields: [
    {
      type: 'checks',
      name: 'symptoms',
      prop: 'symptoms',
      label: 'What it does',
      options: SYMPTOMS.map((s) => ({ value: s, label: SYMPTOM_LABELS[s] })),
      normalize: normalizeSymptoms,
    },
    { type: 'quantity', name: 'site.fallM', prop: 'fall', label: 'Fall', qty: 'length' },
    { type: 'quantity', name: 'site.liftM', prop: 'lift', label: 'Lift', qty: 'length' },
    {
      type: 'quantity',
      name: 'site.drivePipe.lengthM',
      prop: 'driveLength',
      label: 'Drive pipe length',
      qty: 'length',
    },
    {
      type: 'select',
      name: 'site.drivePipe.nominal',
      prop: 'driveSize',
      label: 'Drive pipe size',
      options: pipeSizeOptions,
      normalize: normalizePipeSize,
      seriesField: 'site.drivePipe.series',
    },
    {
      type: 'select',
      name: 'site.drivePipe.series',
      prop: 'driveMaterial',
      label: 'Drive pipe material',
      options: pipeSeriesOptions,
      normalize: normalizeSeries,
    },
    {
      type: 'select',
      name: 'site.pumpSize',
      prop: 'pumpSize',
      label: 'Pump size',
      options: NOMINAL_SIZES.map((s) => ({ value: s, label: NOMINAL_LABELS[s] })),
      normalize: normalizeSize,
    },
    ...driveFittingFields,
    { type: 'select', name: 'site.pumpType', prop: 'pumpType', label: 'Pump', options: PUMP_TYPE_OPTIONS },
    { type: 'number', name: 'site.pumpCount', prop: 'pumps', label: 'Pumps', min: 1, max: 20, step: 1 },
    {
      type: 'quantity',
      name: 'site.intakeSubmergenceM',
      prop: 'submergence',
      label: 'Water over the drive pipe’s intake (optional)',
      qty: 'smallLength',
      help: 'Too little and the intake draws air.',
    },
    ...pipeFields(
      'site.deliveryLine',
      { length: 'deliveryLength', size: 'deliverySize', series: 'deliveryMaterial' },
      'Delivery line',
    ).map((f) => (f.type === 'quantity' ? { ...f, label: `${f.label} (optional)` } : f)),
    {
      type: 'quantity',
      name: 'site.sourceSpareFlowM3s',
      prop: 'sourceFlow',
      label: 'Flow the source can spare (optional)',
      qty: 'flow',
    },
    {
      type: 'quantity',
      name: 'site.driveFlowM3s',
      prop: 'driveFlow',
      label: 'Measured drive flow of one pump (optional)',
      qty: 'flow',
    },
    {
      type: 'quantity',
      name: 'site.deliveredFlowM3s',
      prop: 'delivered',
      label: 'Measured delivery (optional)',
      qty: 'smallFlow',
    },
    {
      type: 'number',
      name: 'site.beatsPerMinute',
      prop: 'bpm',
      label: 'Beats per minute (optional)',
      min: 1,
      max: 400,
    },
    {
      type: 'select',
      name: 'site.wasteOutletSubmerged',
      prop: 'wasteFlooded',
      label: 'Waste valve outlet under water',
      options: triState,
    },
    { type: 'select', name: 'site.screenAtIntake', prop: 'screen', label: 'Screen at the intake', options: triState },
    { type: 'select', name: 'site.frostRisk', prop: 'frost', label: 'Freezing weather at the site', options: triState },
  ],
  defaults: {
    fall: '4 ft',
    lift: '29 ft',
    driveLength: '24 ft',
    driveSize: '1/2',
    driveMaterial: 'pvc-sch40',
    pumpSize: '1/2',
    pumps: '1',
    elbows: '0',
    valve: 'none',
    pumpType: 'homemade',
    deliverySize: '3/4',
    deliveryMaterial: 'hdpe-dr11',
  },
  toInput: (v) => {
    const site = { ...((v.site ?? {}) as Record<string, unknown>) };
    for (const k of ['wasteOutletSubmerged', 'screenAtIntake', 'frostRisk']) {
      if (site[k] === 'yes') site[k] = true;
      else if (site[k] === 'no') site[k] = false;
      else delete site[k];
    }
    site.drivePipe = resolvePipeRun(
      site.drivePipe,
      { fittings: driveFittings(v.elbows, v.valve) },
      'site.drivePipe.nominal',
    );
    // a delivery line counts only when its length is given; the size and material alone say nothing
    const line = site.deliveryLine as Record<string, unknown> | undefined;
    if (line?.lengthM !== undefined) site.deliveryLine = resolvePipeRun(line, {}, 'site.deliveryLine.nominal');
    else delete site.deliveryLine;
    const symptoms = normalizeSymptoms(((v.symptoms as string[] | undefined) ?? []).join(','));
    return { site, symptoms: symptoms ? symptoms.split(',') : [] };
  },
  rows: (r) => [
    { label: 'Expected delivery', value: r.expectedDeliveryM3s, qty: 'smallFlow' },
    {
      label: `Drive flow of all pumps${r.driveFlowEstimated ? ' (estimated)' : ''}`,
      value: r.totalDriveFlowM3s,
      qty: 'flow',
    },
    { label: 'Lift ratio h/H', value: r.liftRatio },
    { label: 'Drive pipe L/H', value: r.lengthToFall },
    { label: 'Expected beats per minute', value: r.expectedBeatsPerMinute },
  ],
});
