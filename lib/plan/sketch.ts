/**
 * The words on the site sketch: each part of the installation with its numbers in the
 * reader's units, from what planSite returned. Pipe and pump sizes keep their inch
 * names in both systems (they are sold under them). Pure, no framework.
 */
import { NOMINAL_LABELS, type PipeSeries, type SitePlanResults, type UnitSystem } from '@/lib/hydraulics';
import { formatQuantity } from '@/lib/calculators/format';
import type { LabelText, SketchOptions } from './sketchLayout';

/** A pipe series in few words, for a label on a phone (the design's cards spell it out). */
const SERIES_SHORT: Record<PipeSeries, [material: string, rating: string]> = {
  'steel-sch40': ['steel', 'sch 40'],
  'steel-sch80': ['steel', 'sch 80'],
  'pvc-sch40': ['PVC', 'sch 40'],
  'pvc-sch80': ['PVC', 'sch 80'],
  'hdpe-dr9': ['HDPE', 'DR 9'],
  'hdpe-dr11': ['HDPE', 'DR 11'],
  'hdpe-dr17': ['HDPE', 'DR 17'],
};

/** What to draw: a standpipe, a stage tank, how many pumps. Null when the plan has no pump to draw. */
export function sketchOptions(r: SitePlanResults): SketchOptions | null {
  const set = r.pump.pumps;
  if (!set || !r.stages.length) return null;
  return { standpipe: Boolean(r.supply?.standpipe), staged: Boolean(r.pump.upper), pumps: set.count };
}

const reserve = (days: number) => (days === 1 ? '1 day’s reserve' : `${days} days’ reserve`);

/** The labels, in the order they are placed (the ones that matter most find room first). */
export function sketchTexts(r: SitePlanResults, units: UnitSystem): LabelText[] {
  const q = (kind: Parameters<typeof formatQuantity>[0], si: number) => formatQuantity(kind, si, units);
  const set = r.pump.pumps;
  const lower = r.stages[0];
  if (!set || !lower) return [];
  const pipe = (p: { nominal: keyof typeof NOMINAL_LABELS; series: PipeSeries; lengthM: number }, lead = '') => {
    const [material, rating] = SERIES_SHORT[p.series];
    return [`${lead}${NOMINAL_LABELS[p.nominal]} ${material} pipe`, rating, `${q('length', p.lengthM)} long`];
  };
  const pumps = (n: number, size: keyof typeof NOMINAL_LABELS) =>
    `${n} × ${NOMINAL_LABELS[size]} pump${n > 1 ? 's' : ''}`;
  const staged = r.pump.upper;
  const out: LabelText[] = [
    { id: 'fall', title: 'Fall', value: [q('length', r.survey.fallM)] },
    { id: 'lift', title: 'Lift', value: [q('length', r.survey.liftM)] },
    {
      id: 'pumps',
      title: staged ? 'Lower pumps' : set.count > 1 ? 'Pumps' : 'Pump',
      value: [pumps(set.count, set.size), ...(set.count > 1 && !staged ? ['side by side'] : [])],
    },
    { id: 'drive', title: 'Drive pipe', value: pipe(lower.drivePipe) },
    { id: 'delivery', title: staged ? 'Delivery to the stage tank' : 'Delivery line', value: pipe(lower.deliveryLine) },
    {
      id: 'tank',
      title: 'Storage tank',
      value: r.storage
        ? [q('volume', r.storage.reserveTankM3), reserve(r.survey.reserveDays)]
        : ['sized once the pumps deliver'],
    },
    { id: 'source', title: 'Source', value: [q('flow', r.survey.spareFlowM3s), 'to spare'] },
  ];
  const sp = r.supply?.standpipe ? r.supply.supplyPipe : null;
  if (r.supply?.standpipe)
    out.push({
      id: 'supply',
      title: 'Standpipe',
      value: sp ? pipe(sp, 'fed by a ') : ['at the head of the drive pipe'],
    });
  if (staged)
    out.push({
      id: 'stage',
      title: 'Stage tank',
      value: [`${q('length', staged.tankHeightM)} above the lower pumps`, `upper ${pumps(staged.count, staged.size)}`],
    });
  return out;
}

/** The sketch in one sentence, for a screen reader. */
export function sketchSummary(texts: LabelText[]): string {
  return `Site sketch, not to scale: ${texts.map((t) => `${t.title.toLowerCase()} ${t.value.join(', ')}`).join('; ')}.`;
}
