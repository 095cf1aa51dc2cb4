import { measureSourceFlow, parseQuantity, EngineInputError, sourceFlowSchema } from '@/lib/hydraulics';
import { defineCalculator, type FormState } from '../types';

const BY_METHOD: Record<string, string[]> = {
  bucket: ['trials'],
  'v-notch': ['notchHeadM', 'angleDeg', 'crestHeightM', 'approachWidthM'],
  float: ['distanceM', 'times', 'widthM', 'meanDepthM', 'coefficient'],
};
/** The engine's own float coefficient (sourceFlow.ts), so a saved float reading recomputes unchanged. */
const FLOAT_COEFFICIENT = 0.85;
const ALL = new Set(Object.values(BY_METHOD).flat());

/** "5 L in 12 s, 5 L in 11.5 s" → [{ volumeM3, timeS }]; the message names the trial that does not read. */
export function parseTrials(text: string) {
  return text
    .split(/[,;\n]+/)
    .map((t) => t.trim())
    .filter(Boolean)
    .map((t, i) => {
      const [, volume, time] = /^(.+?)\s+in\s+(.+)$/i.exec(t) ?? [];
      if (volume === undefined || time === undefined) {
        throw new EngineInputError([
          { field: 'trials', message: `trial ${i + 1} ("${t}") should read like "5 L in 12 s"` },
        ]);
      }
      return { volumeM3: parseQuantity(volume, 'volume', 'trials'), timeS: parseQuantity(time, 'time', 'trials') };
    });
}

function parseTimes(text: string) {
  return text
    .split(/[,;\n]+/)
    .map((t) => t.trim())
    .filter(Boolean)
    .map((t) => parseQuantity(/[a-z]/i.test(t) ? t : `${t} s`, 'time', 'times'));
}

export const sourceFlow = defineCalculator(measureSourceFlow, {
  id: 'source-flow',
  name: 'Source flow',
  line: 'Bucket and stopwatch, V-notch weir or float.',
  blurb: 'What the stream or spring gives, by bucket, V-notch weir or float.',
  guide: 'surveying-fall-and-flow',
  schema: sourceFlowSchema,
  fields: [
    {
      type: 'select',
      name: 'method',
      prop: 'method',
      label: 'Method',
      options: [
        { value: 'bucket', label: 'Bucket and stopwatch' },
        { value: 'v-notch', label: 'V-notch weir' },
        { value: 'float', label: 'Float' },
      ],
    },
    {
      type: 'text',
      name: 'trials',
      prop: 'trials',
      label: 'Trials',
      placeholder: { US: '5 gal in 42 s, 5 gal in 40 s', metric: '10 L in 22 s, 10 L in 21 s' },
      help: 'Each trial as “volume in time”, separated by commas.',
    },
    {
      type: 'quantity',
      name: 'notchHeadM',
      prop: 'head',
      label: 'Head over the notch',
      qty: 'smallLength',
      help: 'Measured upstream, at least four heads back from the notch.',
    },
    { type: 'number', name: 'angleDeg', prop: 'angle', label: 'Notch angle (degrees)' },
    {
      type: 'quantity',
      name: 'crestHeightM',
      prop: 'crestHeight',
      label: 'Notch height above the pool bed (optional)',
      qty: 'length',
      help: {
        US: 'For the check that the pool is deep enough (at least 1.5 ft).',
        metric: 'For the check that the pool is deep enough (at least 0.46 m).',
      },
    },
    {
      type: 'quantity',
      name: 'approachWidthM',
      prop: 'poolWidth',
      label: 'Pool width behind the weir (optional)',
      qty: 'length',
      help: {
        US: 'For the check that the pool is wide enough (at least 3 ft).',
        metric: 'For the check that the pool is wide enough (at least 0.91 m).',
      },
    },
    { type: 'quantity', name: 'distanceM', prop: 'distance', label: 'Float run distance', qty: 'length' },
    { type: 'text', name: 'times', prop: 'time', label: 'Float times', placeholder: '8 s, 9 s, 8.5 s' },
    { type: 'quantity', name: 'widthM', prop: 'width', label: 'Stream width', qty: 'length' },
    { type: 'quantity', name: 'meanDepthM', prop: 'depth', label: 'Mean depth', qty: 'length' },
    {
      type: 'number',
      name: 'coefficient',
      prop: 'floatK',
      label: 'Float coefficient (mean ÷ surface speed)',
      min: 0.5,
      max: 1,
      step: 0.05,
      help: 'About 0.85 in a smooth channel, lower over a rough or shallow bed.',
    },
    {
      type: 'quantity',
      name: 'plannedDrawM3s',
      prop: 'draw',
      label: 'Drive flow you plan to take (optional)',
      qty: 'flow',
    },
  ],
  defaults: {
    method: 'bucket',
    trials: '5 gal in 42 s, 5 gal in 40 s, 5 gal in 44 s',
    angle: '90',
    floatK: String(FLOAT_COEFFICIENT),
  },
  metricDefaults: { trials: '10 L in 22 s, 10 L in 21 s, 10 L in 23 s' },
  visible: (name: string, state: FormState) =>
    !ALL.has(name) || (BY_METHOD[state.method?.text ?? 'bucket'] ?? []).includes(name),
  toInput: (v) => {
    const { trials, times, ...rest } = v;
    if (v.method === 'bucket') return { ...rest, trials: parseTrials(String(trials ?? '')) };
    if (v.method === 'float') return { ...rest, timesS: parseTimes(String(times ?? '')) };
    return rest;
  },
  rows: (r) => [
    { label: 'Flow', value: r.flowM3s, qty: 'flow', emphasis: true },
    { label: 'Per day', value: r.flowPerDayM3PerDay, qty: 'dailyVolume' },
    ...(r.stats && r.stats.n > 1
      ? [
          { label: `Lowest of ${r.stats.n} trials`, value: r.stats.minM3s, qty: 'flow' as const },
          { label: `Highest of ${r.stats.n} trials`, value: r.stats.maxM3s, qty: 'flow' as const },
          { label: 'Coefficient of variation', value: r.stats.cv * 100, unit: '%' },
        ]
      : []),
    ...(r.weir?.usbr90M3s !== undefined
      ? [{ label: 'Cross-check, USBR 90° equation', value: r.weir.usbr90M3s, qty: 'flow' as const }]
      : []),
    ...(r.surfaceVelocityMs !== undefined
      ? [{ label: 'Surface velocity', value: r.surfaceVelocityMs, qty: 'velocity' as const }]
      : []),
    ...(r.planShare !== undefined
      ? [{ label: 'Share of the flow the plan takes', value: r.planShare * 100, unit: '%' }]
      : []),
  ],
});
