import {
  readableDisplay,
  renderMessage,
  toDisplay,
  unitLabel,
  type MessagePart,
  type QuantityKind,
  type UnitSystem,
} from '@/lib/hydraulics';

const sig3 = new Intl.NumberFormat('en', { maximumSignificantDigits: 3 });
const sig4 = new Intl.NumberFormat('en', { maximumSignificantDigits: 4, useGrouping: false });

/** A result for reading: three significant figures, grouped thousands, never e-notation. */
export function formatNumber(x: number): string {
  if (!Number.isFinite(x)) return '—';
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

/**
 * An SI quantity as a person would write it in the reader's units, unit chosen by size:
 * '30 US gal/h', '2.5 L/min', '8 in'. For results, working and text; inputs keep fixed units.
 */
export function formatQuantity(qty: QuantityKind, si: number, units: UnitSystem): string {
  const { value, unit } = readableQuantity(qty, si, units);
  return unit ? `${value} ${unit}` : value;
}

/** {@link formatQuantity} in two parts, for a result drawn with its unit in smaller type. */
export function readableQuantity(qty: QuantityKind, si: number, units: UnitSystem): { value: string; unit: string } {
  const d = readableDisplay(qty, si, units);
  return { value: formatNumber(d.value), unit: d.label };
}

export { unitLabel };

/** A warning or message from the engine with its numbers in the reader's units; its SI text when it has no parts. */
export function formatMessage(m: { message: string; parts?: readonly MessagePart[] }, units: UnitSystem): string {
  return m.parts ? renderMessage(m.parts, (kind, si) => formatQuantity(kind, si, units)) : m.message;
}
