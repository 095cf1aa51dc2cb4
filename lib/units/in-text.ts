/**
 * Quantities written inside text (a title, a post's words, a typed site sheet) put into a
 * reader's units, for the places the server writes text for one reader: search snippets,
 * e-mails, field log titles. "1.5 m fall" reads "4.92 ft fall" to a US reader and stays as
 * typed for a metric one. Inches are left alone: "1-1/4 inch" is a pipe's name (a nominal
 * size), not a measurement. Pure, no framework.
 */
import { toSI, type QuantityKind, type UnitSystem } from '@/lib/hydraulics';
import { formatQuantity } from '@/lib/calculators/format';

interface UnitWord {
  /** as js-quantities spells it */
  unit: string;
  kind: QuantityKind;
  system: UnitSystem;
}

/** Written forms → unit. Longer forms are tried first (the alternation is sorted by length). */
const WORDS: Record<string, UnitWord> = {
  ft: { unit: 'ft', kind: 'length', system: 'US' },
  feet: { unit: 'ft', kind: 'length', system: 'US' },
  foot: { unit: 'ft', kind: 'length', system: 'US' },
  'ft/s': { unit: 'ft/s', kind: 'velocity', system: 'US' },
  'gal/min': { unit: 'gal/min', kind: 'flow', system: 'US' },
  'us gal/min': { unit: 'gal/min', kind: 'flow', system: 'US' },
  gpm: { unit: 'gal/min', kind: 'flow', system: 'US' },
  'gallons per minute': { unit: 'gal/min', kind: 'flow', system: 'US' },
  'gallons a minute': { unit: 'gal/min', kind: 'flow', system: 'US' },
  'gal/h': { unit: 'gal/h', kind: 'flow', system: 'US' },
  'us gal/h': { unit: 'gal/h', kind: 'flow', system: 'US' },
  gph: { unit: 'gal/h', kind: 'flow', system: 'US' },
  'gallons per hour': { unit: 'gal/h', kind: 'flow', system: 'US' },
  'gallons an hour': { unit: 'gal/h', kind: 'flow', system: 'US' },
  'gal/day': { unit: 'gal/day', kind: 'dailyVolume', system: 'US' },
  'gallons a day': { unit: 'gal/day', kind: 'dailyVolume', system: 'US' },
  'gallons per day': { unit: 'gal/day', kind: 'dailyVolume', system: 'US' },
  psi: { unit: 'psi', kind: 'pressure', system: 'US' },
  gal: { unit: 'gal', kind: 'volume', system: 'US' },
  'us gal': { unit: 'gal', kind: 'volume', system: 'US' },
  gallon: { unit: 'gal', kind: 'volume', system: 'US' },
  gallons: { unit: 'gal', kind: 'volume', system: 'US' },
  m: { unit: 'm', kind: 'length', system: 'metric' },
  metre: { unit: 'm', kind: 'length', system: 'metric' },
  metres: { unit: 'm', kind: 'length', system: 'metric' },
  meter: { unit: 'm', kind: 'length', system: 'metric' },
  meters: { unit: 'm', kind: 'length', system: 'metric' },
  mm: { unit: 'mm', kind: 'smallLength', system: 'metric' },
  cm: { unit: 'cm', kind: 'smallLength', system: 'metric' },
  'm/s': { unit: 'm/s', kind: 'velocity', system: 'metric' },
  'l/min': { unit: 'L/min', kind: 'flow', system: 'metric' },
  'litres per minute': { unit: 'L/min', kind: 'flow', system: 'metric' },
  'liters per minute': { unit: 'L/min', kind: 'flow', system: 'metric' },
  'litres a minute': { unit: 'L/min', kind: 'flow', system: 'metric' },
  'l/s': { unit: 'L/s', kind: 'flow', system: 'metric' },
  'l/h': { unit: 'L/h', kind: 'flow', system: 'metric' },
  'litres an hour': { unit: 'L/h', kind: 'flow', system: 'metric' },
  'litres per hour': { unit: 'L/h', kind: 'flow', system: 'metric' },
  'm³/h': { unit: 'm^3/h', kind: 'flow', system: 'metric' },
  'l/day': { unit: 'L/day', kind: 'dailyVolume', system: 'metric' },
  'litres a day': { unit: 'L/day', kind: 'dailyVolume', system: 'metric' },
  'litres per day': { unit: 'L/day', kind: 'dailyVolume', system: 'metric' },
  l: { unit: 'L', kind: 'volume', system: 'metric' },
  litre: { unit: 'L', kind: 'volume', system: 'metric' },
  litres: { unit: 'L', kind: 'volume', system: 'metric' },
  liter: { unit: 'L', kind: 'volume', system: 'metric' },
  liters: { unit: 'L', kind: 'volume', system: 'metric' },
  kpa: { unit: 'kPa', kind: 'pressure', system: 'metric' },
  bar: { unit: 'bar', kind: 'pressure', system: 'metric' },
};

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&').replace(/ /g, '\\s+');
const ALTERNATION = Object.keys(WORDS)
  .sort((a, b) => b.length - a.length)
  .map(escape)
  .join('|');
/**
 * A number (grouped thousands and decimals allowed, not part of a fraction or a word) with one of
 * the units above after it, the unit not running on into a longer word or unit.
 */
const QUANTITY = new RegExp(
  `(?<![\\w.,/\\-])(\\d{1,3}(?:,\\d{3})+|\\d+)(\\.\\d+)?([ \\u00a0]?)(${ALTERNATION})(?![\\w/²³^])`,
  'gi',
);

/**
 * The text with every quantity written in the other system put into `units`, rounded as a
 * person writes it; quantities already in the reader's system stay exactly as typed.
 * @example
 * quantitiesInUnits('1.5 m fall, 16.6 m lift', 'US')  // → '4.92 ft fall, 54.5 ft lift'
 */
export function quantitiesInUnits(text: string, units: UnitSystem): string {
  if (!text) return text;
  return text.replace(QUANTITY, (whole, int: string, frac: string | undefined, _gap: string, word: string) => {
    const w = WORDS[word.toLowerCase().replace(/\s+/g, ' ')];
    if (!w || w.system === units) return whole;
    const value = Number(`${int.replace(/,/g, '')}${frac ?? ''}`);
    if (!Number.isFinite(value)) return whole;
    try {
      return formatQuantity(w.kind, toSI(value, w.unit, w.kind), units);
    } catch {
      return whole;
    }
  });
}
