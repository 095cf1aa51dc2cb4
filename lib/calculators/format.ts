import { toDisplay, unitLabel, type QuantityKind, type UnitSystem } from '@/lib/hydraulics';

const sig3 = new Intl.NumberFormat('en', { maximumSignificantDigits: 3 });
const sig4 = new Intl.NumberFormat('en', { maximumSignificantDigits: 4, useGrouping: false });

/** A result for reading: three significant figures, grouped thousands. */
export function formatNumber(x: number): string {
  if (!Number.isFinite(x)) return '—';
  if (x !== 0 && Math.abs(x) < 1e-4) return x.toExponential(2);
  return sig3.format(x);
}

/** A value to put back in an input box: four significant figures, no grouping. */
export function inputNumber(x: number): string {
  return Number.isFinite(x) ? sig4.format(x) : '';
}

/** An SI quantity in the reader's units, e.g. { value: '1.22', unit: 'm' }. */
export function displayQuantity(qty: QuantityKind, si: number, units: UnitSystem): { value: string; unit: string } {
  const d = toDisplay(qty, si, units);
  return { value: formatNumber(d.value), unit: d.label };
}

export { unitLabel };
