import { checkDeliveryLine, DISPLAY_UNITS, fromSI, NOMINAL_LABELS, unitLabel, type DeliveryLineResults } from '@/lib/hydraulics';
import { LineChartCard } from '../charts';
import type { CalculatorDef } from '../kit/types';
import { pipeFields, resolvePipeRun, SERIES_LABELS, yesNo } from './shared';

export const deliveryLineDef: CalculatorDef<DeliveryLineResults> = {
  id: 'delivery-line',
  title: 'Delivery line',
  blurb: 'Friction and pressure in the pipe up to the tank, and the smallest pipe that will do.',
  guide: 'the-delivery-line',
  fields: [
    { type: 'quantity', name: 'flowM3s', prop: 'flow', label: 'Delivered flow', qty: 'flow' },
    { type: 'quantity', name: 'liftM', prop: 'lift', label: 'Lift', qty: 'length' },
    ...pipeFields('line', { length: 'length', size: 'size', series: 'material' }, 'Delivery line'),
    { type: 'quantity', name: 'targetLossM', prop: 'targetLoss', label: 'Most friction loss you accept (optional)', qty: 'length', help: 'Empty: a tenth of the lift.' },
  ],
  defaults: { flow: '0.5 L/min', lift: '29 ft', length: '150 ft', size: '3/4', material: 'hdpe-dr11' },
  toInput: (v) => ({ ...v, line: resolvePipeRun(v.line) }),
  run: (input) => checkDeliveryLine(input as never),
  rows: (r) => [
    { label: 'Total head at the pump', value: r.totalHeadM, qty: 'length', emphasis: true },
    { label: 'Pressure at the pump', value: r.pumpPressurePa, qty: 'pressure', emphasis: true },
    { label: 'Friction (Darcy-Weisbach, Colebrook)', value: r.frictionHeadM, qty: 'length' },
    { label: 'Friction (Hazen-Williams)', value: r.hazenWilliamsHeadM, qty: 'length' },
    { label: 'Fittings', value: r.minorHeadM, qty: 'length' },
    { label: 'Velocity', value: r.velocityMs, qty: 'velocity' },
    { label: `Reynolds number (${r.regime})`, value: r.reynolds },
    { label: 'Friction factor f (Colebrook / Swamee-Jain)', value: `${r.frictionFactor.toFixed(4)} / ${r.frictionFactorSwameeJain.toFixed(4)}` },
    { label: 'Within the loss you accept', value: yesNo(r.withinTarget) },
    {
      label: 'Smallest pipe within it',
      value: r.smallestPipe ? `${NOMINAL_LABELS[r.smallestPipe.nominal]} ${SERIES_LABELS[r.smallestPipe.series]}` : 'none from ½" to 4"',
    },
  ],
  // Friction loss against flow in this pipe, from a third of the flow to three times it.
  chart: (r, units, input) => {
    const q0 = Number(input.flowM3s);
    const fu = DISPLAY_UNITS.flow[units];
    const lu = DISPLAY_UNITS.length[units];
    const points = [];
    for (let i = 0; i <= 20; i++) {
      const q = q0 * (1 / 3 + (i / 20) * (3 - 1 / 3));
      try {
        const out = checkDeliveryLine({ ...(input as Record<string, unknown>), flowM3s: q, line: resolvePipeRun(input.line) } as never);
        points.push({ x: fromSI(q, fu, 'flow'), y: fromSI(out.results.frictionHeadM + out.results.minorHeadM, lu, 'length') });
      } catch {
        /* past the engine's range */
      }
    }
    return (
      <LineChartCard
        ariaLabel="Friction loss against flow"
        xLabel={`flow (${unitLabel(fu)})`}
        yLabel={`loss (${unitLabel(lu)})`}
        points={points}
        mark={{ x: fromSI(q0, fu, 'flow'), y: fromSI(r.frictionHeadM + r.minorHeadM, lu, 'length') }}
      />
    );
  },
};
