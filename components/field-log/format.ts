import { NOMINAL_LABELS, toDisplay, type NominalSize, type QuantityKind, type UnitSystem } from '@/lib/hydraulics';
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

/** An SI value in the reader's unit system, e.g. shown('flow', 5.5575e-5, 'metric') → "3.33 L/min". */
export function shown(kind: QuantityKind, si: number, system: UnitSystem): string {
  const d = toDisplay(kind, si, system);
  return `${Number(d.value.toPrecision(3))} ${d.label}`;
}
/** Just the number, for table cells whose header carries the unit. */
export function shownValue(kind: QuantityKind, si: number, system: UnitSystem): string {
  return String(Number(toDisplay(kind, si, system).value.toPrecision(3)));
}
export const unitOf = (kind: QuantityKind, system: UnitSystem) => toDisplay(kind, 1, system).label;
