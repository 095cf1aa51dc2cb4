import { fromSI, readableDisplay, type QuantityKind, type UnitSystem } from '@/lib/hydraulics';

/**
 * One unit for a whole chart axis, chosen as formatQuantity would write its largest value
 * (so a curve of small deliveries reads in US gal/h, not 0.4 gal/min), with the conversion.
 */
export function chartUnit(kind: QuantityKind, siValues: number[], units: UnitSystem) {
  const finite = siValues.filter(Number.isFinite);
  const largest = finite.length ? Math.max(...finite.map(Math.abs)) : 1;
  const d = readableDisplay(kind, largest || 1, units);
  return { label: d.label, of: (si: number) => fromSI(si, d.unit, kind) };
}
