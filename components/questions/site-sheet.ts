import { calculatorDefs } from '@/components/calculators/defs';
import { initialState, readForm } from '@/components/calculators/kit/state';
import { displayQuantity } from '@/components/calculators/kit/format';
import { NOMINAL_LABELS, SYMPTOM_LABELS, type NominalSize, type Symptom, type UnitSystem } from '@/lib/hydraulics';
import { SERIES_LABELS } from '@/components/calculators/defs/shared';

/** Which calculator input each site-sheet field fills, per calculator (the site sheet is the stall check's form). */
const MAP: Record<string, Record<string, string>> = {
  'stall-check': { fall: 'fall', lift: 'lift', driveLength: 'driveLength', driveSize: 'driveSize', driveMaterial: 'driveMaterial', sourceFlow: 'sourceFlow', pumpSize: 'pumpSize', pumps: 'pumps', driveFlow: 'driveFlow', delivered: 'delivered', bpm: 'bpm', symptoms: 'symptoms' },
  'yield-estimate': { fall: 'fall', lift: 'lift', driveFlow: 'driveFlow', delivered: 'measured' },
  'drive-pipe-check': { fall: 'fall', lift: 'lift', driveLength: 'length', driveSize: 'size', driveMaterial: 'material', driveFlow: 'driveFlow' },
  'delivery-line': { lift: 'lift', deliveryLength: 'length', deliverySize: 'size', deliveryMaterial: 'material', delivered: 'flow' },
  'array-planner': { fall: 'fall', lift: 'lift', pumps: 'pumps', driveFlow: 'driveFlowEach', driveLength: 'driveLength', driveSize: 'driveSize', driveMaterial: 'driveMaterial', deliveryLength: 'deliveryLength', deliverySize: 'deliverySize', deliveryMaterial: 'deliveryMaterial', sourceFlow: 'sourceFlow' },
  'source-flow': {},
  'demand-and-storage': {},
};

/** A calculator's starting inputs from a question's site sheet ("open any calculator prefilled"). */
export function calculatorPropsFromSiteSheet(tool: string, sheet: Record<string, string> | null): Record<string, string> {
  const map = MAP[tool] ?? {};
  const out: Record<string, string> = {};
  for (const [from, to] of Object.entries(map)) if (sheet?.[from]) out[to] = sheet[from];
  return out;
}

const LABELS: Record<string, string> = {
  fall: 'Fall',
  lift: 'Lift',
  driveLength: 'Drive pipe length',
  driveSize: 'Drive pipe size',
  driveMaterial: 'Drive pipe material',
  sourceFlow: 'Source can spare',
  pumpSize: 'Pump size',
  pumps: 'Pumps',
  driveFlow: 'Drive flow (one pump)',
  delivered: 'Delivered',
  bpm: 'Beats per minute',
  deliveryLength: 'Delivery line length',
  deliverySize: 'Delivery line size',
  deliveryMaterial: 'Delivery line material',
  symptoms: 'What it does',
};

/** The site sheet for reading, each measurement in the reader's units. */
export function siteSheetRows(sheet: Record<string, string> | null, units: UnitSystem): { label: string; value: string }[] {
  if (!sheet) return [];
  const def = calculatorDefs['stall-check'];
  const state = initialState(def.fields, sheet, {}, units);
  const rows: { label: string; value: string }[] = [];
  for (const [key, raw] of Object.entries(sheet)) {
    if (!raw) continue;
    const field = def.fields.find((f) => f.prop === key);
    let value = raw;
    if (field?.type === 'quantity') {
      const { values } = readForm([field], state);
      const si = field.name.split('.').reduce<unknown>((o, k) => (o as Record<string, unknown> | undefined)?.[k], values);
      if (typeof si === 'number') value = Object.values(displayQuantity(field.qty, si, units)).join(' ');
    } else if (key === 'driveSize' || key === 'pumpSize' || key === 'deliverySize') {
      value = NOMINAL_LABELS[raw as NominalSize] ?? raw;
    } else if (key === 'driveMaterial' || key === 'deliveryMaterial') {
      value = SERIES_LABELS[raw as keyof typeof SERIES_LABELS] ?? raw;
    } else if (key === 'symptoms') {
      value = raw.split(',').map((s) => SYMPTOM_LABELS[s.trim() as Symptom] ?? s).join(', ');
    }
    rows.push({ label: LABELS[key] ?? key, value });
  }
  return rows;
}
