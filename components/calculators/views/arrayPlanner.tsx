import type { ArrayPlannerResults } from '@/lib/hydraulics';
import { displayQuantity } from '@/lib/calculators/format';
import { EfficiencySources, pumpTypeOf } from '../kit/EfficiencySources';
import type { CalculatorView } from './types';

export const arrayPlannerView: CalculatorView<ArrayPlannerResults> = {
  sources: (_r, input) => <EfficiencySources pumpType={pumpTypeOf(input.pumpType)} />,
  extra: (r, units) => (
    <table className="w-full text-sm">
      <caption className="cw-muted text-left text-xs">Each pump on the shared line</caption>
      <thead>
        <tr className="text-left text-xs">
          <th scope="col">Pump</th>
          <th scope="col">Fittings K</th>
          <th scope="col">Delivers</th>
        </tr>
      </thead>
      <tbody className="cw-num">
        {r.pumps.map((p) => (
          <tr key={p.label}>
            <td>{p.label}</td>
            <td>{p.fittingsK.toFixed(1)}</td>
            <td>
              {p.runs
                ? Object.values(displayQuantity('smallFlow', p.deliveredFlowM3s, units)).join(' ')
                : 'does not run'}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  ),
};
