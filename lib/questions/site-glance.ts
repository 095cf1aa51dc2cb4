/**
 * A question's site at a glance, for the lists: the few numbers a builder reads
 * before the title (fall, lift, flow, pump) and what the pump does, each number in
 * the reader's units as a person would write it. Pure: the list pages call it on
 * the server with the reader's unit preference.
 */
import {
  NOMINAL_LABELS,
  parseQuantity,
  SYMPTOM_LABELS,
  type NominalSize,
  type QuantityKind,
  type Symptom,
  type UnitSystem,
} from '@/lib/hydraulics';
import { formatQuantity } from '@/lib/calculators';

export interface SiteGlance {
  /** short label and value, e.g. { label: 'fall', value: '4 ft' } */
  numbers: { key: string; label: string; value: string }[];
  /** what the pump does, in words ("weak delivery, spits air"), or null */
  symptom: string | null;
}

/** A stored value in the reader's units, or null when it no longer reads (an old sheet). */
function quantity(raw: string | undefined, kind: QuantityKind, units: UnitSystem): string | null {
  if (!raw) return null;
  try {
    return formatQuantity(kind, parseQuantity(raw, kind), units);
  } catch {
    return null;
  }
}

export function siteGlance(sheet: Record<string, string> | null, units: UnitSystem): SiteGlance | null {
  if (!sheet) return null;
  const numbers: SiteGlance['numbers'] = [];
  const add = (key: string, label: string, value: string | null) => {
    if (value) numbers.push({ key, label, value });
  };
  add('fall', 'fall', quantity(sheet.fall, 'length', units));
  add('lift', 'lift', quantity(sheet.lift, 'length', units));
  // what the source can spare says most about the site; a measured drive flow is next best
  const spare = quantity(sheet.sourceFlow, 'flow', units);
  if (spare) add('sourceFlow', 'source spares', spare);
  else add('driveFlow', 'drive flow', quantity(sheet.driveFlow, 'flow', units));
  add('delivered', 'delivers', quantity(sheet.delivered, 'smallFlow', units));
  if (sheet.pumpSize) {
    const size = NOMINAL_LABELS[sheet.pumpSize as NominalSize] ?? sheet.pumpSize;
    const count = Number(sheet.pumps);
    add('pumpSize', 'pump', Number.isInteger(count) && count > 1 ? `${count} × ${size}` : size);
  }
  const symptoms = (sheet.symptoms ?? '')
    .split(',')
    .map((s) => s.trim())
    .filter(Boolean)
    .map((s) => SYMPTOM_LABELS[s as Symptom] ?? s);
  const symptom = symptoms.length ? symptoms.join(', ') : null;
  return numbers.length || symptom ? { numbers, symptom } : null;
}
