import type { DeliveryLineResults } from '@/lib/hydraulics';
import { lossAgainstFlow } from '@/lib/calculators/defs/deliveryLine';
import { chartUnit, LineChartCard } from '../charts';
import type { CalculatorView } from './types';

export const deliveryLineView: CalculatorView<DeliveryLineResults> = {
  // Friction loss against flow in this pipe, from a third of the flow to three times it.
  chart: (r, units, input) => {
    const curve = lossAgainstFlow(input);
    const flow = Number(input.flowM3s);
    const loss = r.frictionHeadM + r.minorHeadM;
    const fu = chartUnit('flow', [...curve.map((p) => p.flowM3s), flow], units);
    const lu = chartUnit('length', [...curve.map((p) => p.lossM), loss], units);
    return (
      <LineChartCard
        title="Friction loss against flow"
        x={{ name: 'flow', unit: fu.label }}
        y={{ name: 'loss', unit: lu.label }}
        points={curve.map((p) => ({ x: fu.of(p.flowM3s), y: lu.of(p.lossM) }))}
        mark={Number.isFinite(flow) ? { x: fu.of(flow), y: lu.of(loss) } : undefined}
      />
    );
  },
};
