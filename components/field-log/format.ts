import { NOMINAL_LABELS, type NominalSize, type QuantityKind, type UnitSystem } from '@/lib/hydraulics';
import { formatQuantity } from '@/lib/calculators/format';
import type { PipeMaterial } from '@/lib/vocabulary';

export const size = (s: string | null) => (s ? (NOMINAL_LABELS[s as NominalSize] ?? s) : '—');
export const MATERIAL_LABELS: Record<PipeMaterial, string> = {
  pvc: 'PVC',
  hdpe: 'HDPE (poly)',
  'galvanized-steel': 'galvanized steel',
  steel: 'steel',
  hose: 'hose',
};
export const material = (m: string | null) => (m ? (MATERIAL_LABELS[m as PipeMaterial] ?? m) : '—');
export const pumpsWords = (count: number, arrangement: string, pumpSize: string) =>
  count === 1 ? `one ${size(pumpSize)} pump` : `${count} × ${size(pumpSize)} pumps, ${arrangement}`;

/** An SI value as a person would write it in the reader's units, e.g. shown('flow', 5.5575e-5, 'metric') → "3.33 L/min". */
export function shown(kind: QuantityKind, si: number, system: UnitSystem): string {
  return formatQuantity(kind, si, system);
}
