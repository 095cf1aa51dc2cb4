import { checkDrivePipe, DISPLAY_UNITS, fromSI, PIPE_SERIES, unitLabel, type DrivePipeCheckResults } from '@/lib/hydraulics';
import { BarChartCard } from '../charts';
import type { CalculatorDef } from '../kit/types';
import { pipeFields, resolvePipeRun, SERIES_LABELS, yesNo } from './shared';

export const drivePipeCheckDef: CalculatorDef<DrivePipeCheckResults> = {
  id: 'drive-pipe-check',
  title: 'Drive pipe check',
  blurb: 'Length for the fall, the pressure wave, and the surge against the pipe’s rating.',
  guide: 'the-drive-pipe',
  fields: [
    { type: 'quantity', name: 'fallM', prop: 'fall', label: 'Fall', qty: 'length' },
    ...pipeFields('drivePipe', { length: 'length', size: 'size', series: 'material' }, 'Drive pipe'),
    { type: 'quantity', name: 'liftM', prop: 'lift', label: 'Lift (optional)', qty: 'length' },
    { type: 'quantity', name: 'driveFlowM3s', prop: 'driveFlow', label: 'Measured drive flow (optional)', qty: 'flow' },
  ],
  defaults: { fall: '4 ft', length: '24 ft', size: '1/2', material: 'pvc-sch40' },
  toInput: (v) => ({ ...v, drivePipe: resolvePipeRun(v.drivePipe) }),
  run: (input) => checkDrivePipe(input as never),
  rows: (r) => [
    { label: 'Peak pressure at the pump', value: r.peakPressurePa, qty: 'pressure', emphasis: true },
    { label: 'Pipe rating ÷ peak', value: r.ratingMargin, unit: '×', emphasis: true },
    { label: 'Length ÷ fall (L/H)', value: r.lengthToFall },
    { label: 'Length ÷ inside diameter (L/D)', value: r.lengthToDiameter },
    { label: 'Full-flow velocity', value: r.fullFlowVelocityMs, qty: 'velocity' },
    { label: 'Pressure-wave speed', value: r.waveSpeedMs, qty: 'velocity' },
    { label: 'Wave round trip 2L/c', value: r.roundTripS * 1000, unit: 'ms' },
    { label: 'Surge on sudden closure', value: r.surgePa, qty: 'pressure' },
    { label: 'Pipe rating', value: r.pressureRatingPa, qty: 'pressure' },
    { label: 'Rigid enough for a drive pipe', value: yesNo(r.rigid) },
  ],
  extra: (r) => (
    <ul className="flex flex-col gap-1 text-xs">
      {r.guides.map((g) => (
        <li key={g.id} className={g.within ? '' : 'font-semibold text-signal-700 dark:text-signal-300'}>
          {`${g.ratio} ${g.min}–${g.max}: yours ${g.value.toFixed(0)} ${g.within ? '(within)' : '(outside)'} — ${g.source}`}
        </li>
      ))}
    </ul>
  ),
  // Surge against pipe material: the same size, fall and length in each series.
  chart: (r, units, input) => {
    const pu = DISPLAY_UNITS.pressure[units];
    const current = (input.drivePipe as { series?: string } | undefined)?.series;
    const bars = PIPE_SERIES.flatMap((series) => {
      try {
        const out = checkDrivePipe({ ...(input as Record<string, unknown>), drivePipe: resolvePipeRun({ ...(input.drivePipe as Record<string, unknown>), series }) } as never);
        return [{ name: SERIES_LABELS[series].replace('schedule ', 'sch '), value: fromSI(out.results.surgePa, pu, 'pressure'), highlight: series === current }];
      } catch {
        return [];
      }
    });
    return <BarChartCard ariaLabel="Surge against pipe material" yLabel={`surge (${unitLabel(pu)})`} bars={bars} />;
  },
};
