import { checkDrivePipe, drivePipeCheckSchema, PIPE_SERIES, type PipeSeries } from '@/lib/hydraulics';
import { defineCalculator } from '../types';
import { pipeFields, resolvePipeRun, yesNo } from '../pipes';

export const drivePipeCheck = defineCalculator(checkDrivePipe, {
  id: 'drive-pipe-check',
  name: 'Drive pipe check',
  line: 'Length for the fall, surge pressure and whether the pipe will stand it.',
  blurb: 'Length for the fall, the pressure wave, and the surge against the pipe’s rating.',
  guide: 'the-drive-pipe',
  schema: drivePipeCheckSchema,
  fields: [
    { type: 'quantity', name: 'fallM', prop: 'fall', label: 'Fall', qty: 'length' },
    ...pipeFields('drivePipe', { length: 'length', size: 'size', series: 'material' }, 'Drive pipe'),
    { type: 'quantity', name: 'liftM', prop: 'lift', label: 'Lift (optional)', qty: 'length' },
    { type: 'quantity', name: 'driveFlowM3s', prop: 'driveFlow', label: 'Measured drive flow (optional)', qty: 'flow' },
  ],
  defaults: { fall: '4 ft', length: '24 ft', size: '1/2', material: 'pvc-sch40' },
  toInput: (v) => ({ ...v, drivePipe: resolvePipeRun(v.drivePipe) }),
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
});

/**
 * The surge on sudden closure with the same size, fall and length in each pipe
 * series, for the chart; `values` are the form's fields as read (SI). A series
 * the engine refuses for this pipe is left out.
 */
export function surgeByMaterial(
  values: Record<string, unknown>,
): { series: PipeSeries; surgePa: number; current: boolean }[] {
  const current = (values.drivePipe as { series?: string } | undefined)?.series;
  return PIPE_SERIES.flatMap((series) => {
    try {
      const out = drivePipeCheck.run({
        ...values,
        drivePipe: resolvePipeRun({ ...(values.drivePipe as Record<string, unknown>), series }),
      });
      return [{ series, surgePa: out.results.surgePa, current: series === current }];
    } catch {
      return [];
    }
  });
}
