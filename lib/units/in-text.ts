/**
 * Quantities written inside text (a title, a post's words, a typed site sheet) put into a
 * reader's units, for the places the server writes text for one reader: search snippets,
 * e-mails, field log titles. "1.5 m fall" reads "4.92 ft fall" to a US reader and stays as
 * typed for a metric one. An inch size that names a pipe or pump ("1-1/4 inch", "a 1 inch
 * pump") is a nominal size, not a measurement, and stays; "0.622 in" or "14 inches below"
 * is measured and is converted. Pure, no framework.
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
  in: { unit: 'in', kind: 'smallLength', system: 'US' },
  inch: { unit: 'in', kind: 'smallLength', system: 'US' },
  inches: { unit: 'in', kind: 'smallLength', system: 'US' },
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
  'ml/min': { unit: 'mL/min', kind: 'smallFlow', system: 'metric' },
  ml: { unit: 'mL', kind: 'volume', system: 'metric' },
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

/** "2 in parallel", "1 in 10", "3 in the tank": "in" after a number as a preposition, not inches. */
const IN_AS_WORD = /^\s+(?:parallel|series|stages?|a|an|the|each|every|all|one|two|three|\d)\b/i;
/** What an inch size names when it is a nominal size: "a 1 inch pump", "2 in homemade pumps", "size 1 in". */
const SIZE_AFTER = /^[\s-]+(?:[a-z]+\s+)?(?:pumps?|pipes?|drive|delivery|line|fittings?|valves?|hose|ram)\b/i;
const SIZE_BEFORE = /\bsize:?\s*$/i;

interface Found {
  /** the quantity as written */
  whole: string;
  /** where it starts in the text */
  at: number;
  /** its reading in the reader's units, or undefined where it stays as written */
  reading: string | undefined;
}

/** Each quantity of the other system in `text`, read in `units`. */
function readings(text: string, units: UnitSystem, visit: (f: Found) => string): string {
  return text.replace(
    QUANTITY,
    (whole, int: string, frac: string | undefined, _gap: string, word: string, at: number, all: string) => {
      const w = WORDS[word.toLowerCase().replace(/\s+/g, ' ')];
      if (!w || w.system === units) return whole;
      const after = all.slice(at + whole.length);
      if (w.unit === 'in') {
        if (word.toLowerCase() === 'in' && IN_AS_WORD.test(after)) return whole;
        // a whole number of inches before "pump" or "pipe" names a size (a decimal is measured)
        if (!frac && (SIZE_AFTER.test(after) || SIZE_BEFORE.test(all.slice(Math.max(0, at - 12), at)))) return whole;
      }
      const value = Number(`${int.replace(/,/g, '')}${frac ?? ''}`);
      let reading: string | undefined;
      try {
        if (Number.isFinite(value)) {
          const si = toSI(value, w.unit, w.kind);
          // 288 inches reads 7.32 m, not 7,320 mm
          reading = formatQuantity(w.kind === 'smallLength' && si >= 1 ? 'length' : w.kind, si, units);
        }
      } catch {
        reading = undefined;
      }
      return visit({ whole, at, reading });
    },
  );
}

/**
 * The text with every quantity written in the other system put into `units`, rounded as a
 * person writes it; quantities already in the reader's system stay exactly as typed.
 * @example
 * quantitiesInUnits('1.5 m fall, 16.6 m lift', 'US')  // → '4.92 ft fall, 54.5 ft lift'
 */
export function quantitiesInUnits(text: string, units: UnitSystem): string {
  if (!text) return text;
  return readings(text, units, (f) => f.reading ?? f.whole);
}

/**
 * A member's words kept as written, each quantity of the other system followed by its
 * reading in the reader's units in brackets: for the places their words are quoted (a
 * field log entry's notes, the line saying what fixed it), where we never rewrite them.
 * @example
 * withReadings('stroke 9 mm, one washer', 'US')  // → 'stroke 9 mm (0.354 in), one washer'
 */
export function withReadings(text: string, units: UnitSystem): string {
  if (!text) return text;
  return readings(text, units, (f) => (f.reading ? `${f.whole} (${f.reading})` : f.whole));
}
