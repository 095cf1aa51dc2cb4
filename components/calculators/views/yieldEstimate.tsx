import { DISPLAY_UNITS, fromSI, unitLabel, type YieldEstimateResults } from '@/lib/hydraulics';
import { LineChartCard } from '../charts';
import { EfficiencySources, pumpTypeOf } from '../kit/EfficiencySources';
import type { CalculatorView } from './types';

export const yieldEstimateView: CalculatorView<YieldEstimateResults> = {
  sources: (_r, input) => <EfficiencySources pumpType={pumpTypeOf(input.pumpType)} />,
  chart: (r, units, input) => {
    const lu = DISPLAY_UNITS.length[units];
    const fu = DISPLAY_UNITS.smallFlow[units];
    const lift = Number(input.liftM);
    return (
      <LineChartCard
        ariaLabel="Delivery against lift"
        xLabel={`lift (${unitLabel(lu)})`}
        yLabel={`delivery (${unitLabel(fu)})`}
        points={r.curve.map((p) => ({ x: fromSI(p.liftM, lu, 'length'), y: fromSI(p.deliveryM3s, fu, 'smallFlow') }))}
        mark={
          Number.isFinite(lift)
            ? { x: fromSI(lift, lu, 'length'), y: fromSI(r.deliveredFlowM3s, fu, 'smallFlow') }
            : undefined
        }
      />
    );
  },
};
