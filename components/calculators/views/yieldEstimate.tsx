import type { YieldEstimateResults } from '@/lib/hydraulics';
import { chartUnit, LineChartCard } from '../charts';
import { EfficiencySources, pumpTypeOf } from '../kit/EfficiencySources';
import type { CalculatorView } from './types';

export const yieldEstimateView: CalculatorView<YieldEstimateResults> = {
  sources: (_r, input) => <EfficiencySources pumpType={pumpTypeOf(input.pumpType)} />,
  chart: (r, units, input) => {
    const lift = Number(input.liftM);
    const hasLift = Number.isFinite(lift);
    const lu = chartUnit('length', [...r.curve.map((p) => p.liftM), ...(hasLift ? [lift] : [])], units);
    const fu = chartUnit('smallFlow', [...r.curve.map((p) => p.deliveryM3s), r.deliveredFlowM3s], units);
    return (
      <LineChartCard
        title="Delivery against lift"
        x={{ name: 'lift', unit: lu.label }}
        y={{ name: 'delivery', unit: fu.label }}
        points={r.curve.map((p) => ({ x: lu.of(p.liftM), y: fu.of(p.deliveryM3s) }))}
        mark={hasLift ? { x: lu.of(lift), y: fu.of(r.deliveredFlowM3s) } : undefined}
      />
    );
  },
};
