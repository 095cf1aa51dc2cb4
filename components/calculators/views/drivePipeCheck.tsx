import type { DrivePipeCheckResults } from '@/lib/hydraulics';
import { surgeByMaterial } from '@/lib/calculators/defs/drivePipeCheck';
import { BarChartCard, chartUnit } from '../charts';
import type { CalculatorView } from './types';

export const drivePipeCheckView: CalculatorView<DrivePipeCheckResults> = {
  extra: (r) => (
    <ul className="flex flex-col gap-1 text-xs">
      {r.guides.map((g) => (
        <li key={g.id} className={g.within ? '' : 'font-semibold text-signal-700 dark:text-signal-300'}>
          {`${g.ratio} ${g.min}–${g.max}: yours ${g.value.toFixed(0)} ${g.within ? '(within)' : '(outside)'}`}
        </li>
      ))}
      {r.joint && (!r.joint.allowed || r.joint.ratingPa !== r.pressureRatingPa) ? (
        <li>{`Joints: ${r.joint.note}`}</li>
      ) : null}
    </ul>
  ),
  // the rules' and ratings' sources go behind the card's Sources, so "from memory" is not on its face
  sources: (r) => (
    <>
      {r.guides.map((g) => (
        <li key={g.id}>{`Drive pipe ${g.ratio} ${g.min}–${g.max}: ${g.source}.`}</li>
      ))}
      {r.joint ? <li>{`Joints: ${r.joint.source}.`}</li> : null}
      {r.fatigue ? <li>{`Fatigue life: ${r.fatigue.source}.`}</li> : null}
    </>
  ),
  // Surge against pipe material: the same size, fall and length in each series.
  chart: (_r, units, input) => {
    const series = surgeByMaterial(input);
    const pu = chartUnit(
      'pressure',
      series.map((b) => b.surgePa),
      units,
    );
    const bars = series.map((b) => ({
      name: b.label.replace('schedule ', 'sch ').replace(/ \((ISO 4427|EN 1452)\)/, ''),
      value: pu.of(b.surgePa),
      highlight: b.current,
    }));
    return <BarChartCard title="Surge against pipe material" axis={{ name: 'surge', unit: pu.label }} bars={bars} />;
  },
};
