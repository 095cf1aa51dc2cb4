import { checkDeliveryLine, deliveryLineSchema, NOMINAL_LABELS } from '@/lib/hydraulics';
import { defineCalculator } from '../types';
import { pipeFields, resolvePipeRun, SERIES_LABELS, yesNo } from '../pipes';

export const deliveryLine = defineCalculator(checkDeliveryLine, {
  id: 'delivery-line',
  name: 'Delivery line',
  line: 'Friction up to the tank and the smallest pipe that will do.',
  blurb: 'Friction and pressure in the pipe up to the tank, and the smallest pipe that will do.',
  guide: 'the-delivery-line',
  schema: deliveryLineSchema,
  fields: [
    { type: 'quantity', name: 'flowM3s', prop: 'flow', label: 'Delivered flow', qty: 'flow' },
    { type: 'quantity', name: 'liftM', prop: 'lift', label: 'Lift', qty: 'length' },
    ...pipeFields('line', { length: 'length', size: 'size', series: 'material' }, 'Delivery line'),
    {
      type: 'quantity',
      name: 'targetLossM',
      prop: 'targetLoss',
      label: 'Most friction loss you accept (optional)',
      qty: 'length',
      help: 'Empty: a tenth of the lift.',
    },
  ],
  defaults: { flow: '0.5 L/min', lift: '29 ft', length: '150 ft', size: '3/4', material: 'hdpe-dr11' },
  toInput: (v) => ({ ...v, line: resolvePipeRun(v.line, {}, 'line.nominal') }),
  rows: (r) => [
    { label: 'Total head at the pump', value: r.totalHeadM, qty: 'length', emphasis: true },
    { label: 'Pressure at the pump', value: r.pumpPressurePa, qty: 'pressure', emphasis: true },
    { label: 'Friction (Darcy-Weisbach, Colebrook)', value: r.frictionHeadM, qty: 'length' },
    { label: 'Friction (Hazen-Williams)', value: r.hazenWilliamsHeadM, qty: 'length' },
    { label: 'Fittings', value: r.minorHeadM, qty: 'length' },
    { label: 'Velocity', value: r.velocityMs, qty: 'velocity' },
    { label: `Reynolds number (${r.regime})`, value: r.reynolds },
    {
      label: 'Friction factor f (Colebrook / Swamee-Jain)',
      value: `${r.frictionFactor.toFixed(4)} / ${r.frictionFactorSwameeJain.toFixed(4)}`,
    },
    { label: 'Within the loss you accept', value: yesNo(r.withinTarget) },
    {
      label: 'Smallest pipe within it',
      value: r.smallestPipe
        ? `${NOMINAL_LABELS[r.smallestPipe.nominal]} ${SERIES_LABELS[r.smallestPipe.series]}`
        : 'none from ½" to 4"',
    },
  ],
});

/**
 * Friction and fittings loss in the reader's pipe from a third of their flow to
 * three times it (21 points), for the chart; `values` are the form's fields as
 * read (SI). Flows past the engine's range are left out.
 */
export function lossAgainstFlow(values: Record<string, unknown>): { flowM3s: number; lossM: number }[] {
  const q0 = Number(values.flowM3s);
  const points = [];
  for (let i = 0; i <= 20; i++) {
    const q = q0 * (1 / 3 + (i / 20) * (3 - 1 / 3));
    try {
      const out = deliveryLine.run({ ...values, flowM3s: q, line: resolvePipeRun(values.line) });
      points.push({ flowM3s: q, lossM: out.results.frictionHeadM + out.results.minorHeadM });
    } catch {
      /* past the engine's range */
    }
  }
  return points;
}
