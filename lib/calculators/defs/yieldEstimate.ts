import { estimateYield, yieldEstimateSchema } from '@/lib/hydraulics';
import { PUMP_TYPE_OPTIONS } from '../options';
import { defineCalculator } from '../types';

export const yieldEstimate = defineCalculator(estimateYield, {
  id: 'yield-estimate',
  name: 'Yield estimate',
  line: 'How much a ram delivers at your fall and lift, and what it uses.',
  blurb: 'How much a ram delivers at your fall and lift.',
  guide: 'will-a-ram-meet-my-demand',
  schema: yieldEstimateSchema,
  fields: [
    {
      type: 'quantity',
      name: 'fallM',
      prop: 'fall',
      label: 'Fall (supply head)',
      qty: 'length',
      help: 'From the intake’s water surface down to the pump.',
    },
    {
      type: 'quantity',
      name: 'liftM',
      prop: 'lift',
      label: 'Lift (delivery head)',
      qty: 'length',
      help: 'From the pump up to where the delivery pipe empties.',
    },
    {
      type: 'quantity',
      name: 'driveFlowM3s',
      prop: 'driveFlow',
      label: 'Drive flow',
      qty: 'flow',
      help: 'Water the pump uses: what comes out of the waste valve plus what it delivers.',
    },
    {
      type: 'number',
      name: 'efficiency',
      prop: 'efficiency',
      label: 'Efficiency (optional)',
      percent: true,
      help: 'Leave empty to use the typical value for this lift ratio, shown in the box; type your pump’s own, as 0.3 or 30 %, once you have measured it.',
    },
    {
      type: 'select',
      name: 'pumpType',
      prop: 'pumpType',
      label: 'Pump',
      options: PUMP_TYPE_OPTIONS,
    },
    {
      type: 'quantity',
      name: 'measuredDeliveredFlowM3s',
      prop: 'measured',
      label: 'Measured delivery (optional)',
      qty: 'smallFlow',
      help: 'From a cup and a stopwatch, to work out your pump’s own efficiency.',
    },
  ],
  defaults: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min', pumpType: 'homemade' },
  efficiencyBand: (r) => ({ typical: r.band.typical, low: r.band.low, high: r.band.high }),
  rows: (r) => [
    { label: 'Delivered', value: r.deliveredFlowM3s, qty: 'smallFlow', emphasis: true },
    { label: 'Per day', value: r.deliveredPerDayM3PerDay, qty: 'dailyVolume', emphasis: true },
    { label: 'Waste flow', value: r.wasteFlowM3s, qty: 'flow' },
    { label: 'Lift ratio h/H', value: r.liftRatio },
    { label: `Efficiency used (${r.efficiencySource})`, value: r.efficiencyUsed * 100, unit: '%' },
    {
      label: 'Typical band at this ratio',
      value: `${Math.round(r.band.low * 100)}–${Math.round(r.band.high * 100)}`,
      unit: '%',
    },
    ...(r.measured
      ? [
          { label: 'Measured efficiency, D’Aubuisson q·h/(Q·H)', value: r.measured.dAubuisson * 100, unit: '%' },
          { label: 'Measured efficiency, Rankine q·(h−H)/((Q−q)·H)', value: r.measured.rankine * 100, unit: '%' },
        ]
      : []),
    { label: 'Power in / out', value: `${r.powerInW.toFixed(2)} / ${r.powerOutW.toFixed(2)}`, unit: 'W' },
    { label: 'Highest lift expected at this fall', value: r.maxLiftM, qty: 'length' },
  ],
});
