import { DISPLAY_UNITS, fromSI, unitLabel, type DeliveryLineResults } from '@/lib/hydraulics';
import { lossAgainstFlow } from '@/lib/calculators';
import { LineChartCard } from '../charts';
import type { CalculatorView } from './types';

export const deliveryLineView: CalculatorView<DeliveryLineResults> = {
  // Friction loss against flow in this pipe, from a third of the flow to three times it.
  chart: (r, units, input) => {
    const fu = DISPLAY_UNITS.flow[units];
    const lu = DISPLAY_UNITS.length[units];
    const points = lossAgainstFlow(input).map((p) => ({
      x: fromSI(p.flowM3s, fu, 'flow'),
      y: fromSI(p.lossM, lu, 'length'),
    }));
    return (
      <LineChartCard
        ariaLabel="Friction loss against flow"
        xLabel={`flow (${unitLabel(fu)})`}
        yLabel={`loss (${unitLabel(lu)})`}
        points={points}
        mark={{ x: fromSI(Number(input.flowM3s), fu, 'flow'), y: fromSI(r.frictionHeadM + r.minorHeadM, lu, 'length') }}
      />
    );
  },
};
