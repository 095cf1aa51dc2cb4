/**
 * The plan's design as a reader reads it: one section a part of the installation, each a
 * few lines of label and value in the reader's units, from what planSite returned.
 * Pure, no framework.
 */
import { NOMINAL_LABELS, type SitePlanResults, type UnitSystem } from '@/lib/hydraulics';
import { formatMessage, formatNumber, formatQuantity } from '@/lib/calculators/format';
import { SERIES_LABELS } from '@/lib/calculators/pipes';

export interface DesignLine {
  label: string;
  value: string;
}
export interface DesignSection {
  id: 'pumps' | 'drive' | 'supply' | 'delivery' | 'chamber' | 'storage';
  title: string;
  lines: DesignLine[];
  /** sentences under the lines: why this size, what to avoid */
  notes: string[];
}

const text = (parts: SitePlanResults['pump']['why'], units: UnitSystem) => formatMessage({ message: '', parts }, units);

const ARRANGEMENT: Record<SitePlanResults['pump']['arrangement'], string> = {
  single: 'one pump',
  parallel: 'pumps side by side on one delivery line',
  staged: 'in two stages: pumps on the source fill a tank partway up, pumps there lift the rest',
  none: 'no pump',
};

export function designSections(r: SitePlanResults, units: UnitSystem): DesignSection[] {
  const q = (kind: Parameters<typeof formatQuantity>[0], si: number) => formatQuantity(kind, si, units);
  const pipe = (p: { nominal: keyof typeof NOMINAL_LABELS; series: keyof typeof SERIES_LABELS }) =>
    `${NOMINAL_LABELS[p.nominal]} ${SERIES_LABELS[p.series]}`;
  const out: DesignSection[] = [];
  const p = r.pump;
  const set = p.pumps;
  out.push({
    id: 'pumps',
    title: 'Pumps',
    lines: set
      ? [
          { label: 'Arrangement', value: ARRANGEMENT[p.arrangement] },
          { label: p.upper ? 'On the source' : 'Pumps', value: `${set.count} × ${NOMINAL_LABELS[set.size]}` },
          { label: 'Drive flow each', value: q('flow', set.driveFlowEachM3s) },
          ...(p.upper
            ? [
                { label: 'Upper stage', value: `${p.upper.count} × ${NOMINAL_LABELS[p.upper.size]}` },
                { label: 'Stage tank above the lower pumps', value: q('length', p.upper.tankHeightM) },
              ]
            : []),
          { label: 'Delivered at the top', value: `${q('dailyVolume', p.deliveredM3PerDay)} a day` },
        ]
      : [{ label: 'Arrangement', value: ARRANGEMENT.none }],
    notes: [text(p.why, units), text(p.nextSizeUp, units), text(p.nextSizeDown, units)].filter(Boolean),
  });
  r.stages.forEach((s) => {
    const where = r.stages.length > 1 ? (s.stage === 'source' ? ' (lower stage)' : ' (upper stage)') : '';
    const d = s.drivePipe;
    out.push({
      id: 'drive',
      title: `Drive pipe${where}`,
      lines: [
        { label: 'Pipe', value: pipe(d) },
        { label: 'Length', value: q('length', d.lengthM) },
        { label: 'Length ÷ fall', value: formatNumber(d.lengthToFall) },
        { label: 'Peak pressure at the pump', value: q('pressure', d.peakPressurePa) },
        { label: 'Shut-off pressure (delivery closed)', value: q('pressure', d.shutOffPressurePa) },
        { label: 'Weakest rating', value: `${q('pressure', d.weakestRatingPa)} (${d.weakestIs})` },
      ],
      notes: where ? [] : r.fittingsToAvoid.map((f) => `Avoid ${f}.`),
    });
    const l = s.deliveryLine;
    out.push({
      id: 'delivery',
      title: `Delivery line${where}`,
      lines: [
        { label: 'Pipe', value: pipe(l) },
        { label: 'Length', value: q('length', l.lengthM) },
        { label: 'Friction', value: q('length', l.lossM) },
        { label: 'Pressure at the pump', value: q('pressure', l.pumpPressurePa) },
        { label: 'Pipe rating', value: q('pressure', l.pressureRatingPa) },
      ],
      notes: [],
    });
    out.push({
      id: 'chamber',
      title: `Air chamber and snifter${where}`,
      lines: [
        { label: 'Air chamber volume', value: q('volume', s.airChamberM3) },
        { label: 'Snifter hole', value: q('smallLength', r.snifterHoleM) },
      ],
      notes: [
        'The air chamber evens out the beat so the delivery line carries a steady flow; the snifter lets in a little air each beat to keep it from filling with water.',
      ],
    });
  });
  if (r.supply) {
    const sp = r.supply;
    out.push({
      id: 'supply',
      title: 'Intake and supply',
      lines: [
        { label: 'Standpipe or supply tank', value: sp.standpipe ? 'needed' : 'not needed' },
        ...(sp.supplyPipe
          ? [{ label: 'Supply pipe', value: `${pipe(sp.supplyPipe)}, ${q('length', sp.supplyPipe.lengthM)}` }]
          : []),
        { label: 'Screen open area', value: q('area', sp.screenOpenAreaM2) },
        { label: 'Approach velocity at most', value: q('velocity', sp.approachVelocityMs) },
      ],
      notes: [],
    });
  }
  if (r.storage) {
    out.push({
      id: 'storage',
      title: 'Storage',
      lines: [
        { label: 'Tank for the reserve', value: q('volume', r.storage.reserveTankM3) },
        { label: 'Demand a day', value: q('dailyVolume', r.demandM3PerDay) },
      ],
      notes: [],
    });
  }
  return out;
}
