/**
 * Units at the edges. The engine computes in SI; this module turns what a
 * person types ("4 ft", "2 gpm", "500 mL/min", "40 psi", "¾\"") into SI and
 * SI back into display units for a US or metric reader.
 *
 * Unit library: js-quantities, chosen over convert-units because it parses
 * compound units such as "gal/min", "L/s", "psi" and "cup/min" straight from
 * strings, so inputs like "4 ft" or "2 gpm" are parsed directly, and because
 * it reduces every unit to base units we can check.
 *
 * js-quantities 1.8 defines the US gallon (0.0037854118 m³), US cup
 * (0.000236588238 m³) and psi (6894.76 Pa) as the US units, but rounded.
 * NIST SP 811 (2008), Appendix B, and NIST Handbook 44 (Appendix C) give the
 * exact definitions: 1 US gallon = 231 in³ (= 3.785411784 L), 1 US cup =
 * 1/16 gallon = 14.4375 in³ (= 236.5882365 mL), 1 lbf = 1 lb × standard
 * gravity = 0.45359237 kg × 9.80665 m/s², so 1 psi = 1 lbf/in² =
 * 6894.757… Pa. We therefore re-express those units through js-quantities'
 * own exact base units (inch = 0.0254 m, pound = 0.45359237 kg, gee =
 * 9.80665 m/s², all exact in js-quantities) rather than trusting the
 * rounded factors — no hand-written factor table.
 */
import Qty from 'js-quantities';
import { EngineInputError } from './errors';

export type QuantityKind =
  | 'length'
  | 'smallLength'
  | 'flow'
  | 'smallFlow'
  | 'area'
  | 'volume'
  | 'dailyVolume'
  | 'pressure'
  | 'velocity'
  | 'time'
  | 'power'
  | 'modulus'
  | 'temperature'
  | 'dimensionless';

export type UnitSystem = 'US' | 'metric';

/** The SI unit each kind is stored in (what schemas and results use). Temperature stays in °C. */
export const SI_UNIT: Record<QuantityKind, string> = {
  length: 'm',
  smallLength: 'm',
  flow: 'm^3/s',
  smallFlow: 'm^3/s',
  area: 'm^2',
  volume: 'm^3',
  dailyVolume: 'm^3/day',
  pressure: 'Pa',
  velocity: 'm/s',
  time: 's',
  power: 'W',
  modulus: 'Pa',
  temperature: 'tempC',
  dimensionless: '',
};

/** Display unit per kind and system. */
export const DISPLAY_UNITS: Record<QuantityKind, Record<UnitSystem, string>> = {
  length: { US: 'ft', metric: 'm' },
  smallLength: { US: 'in', metric: 'mm' },
  flow: { US: 'gal/min', metric: 'L/min' },
  smallFlow: { US: 'cup/min', metric: 'mL/min' },
  area: { US: 'ft^2', metric: 'm^2' },
  volume: { US: 'gal', metric: 'L' },
  dailyVolume: { US: 'gal/day', metric: 'L/day' },
  pressure: { US: 'psi', metric: 'kPa' },
  velocity: { US: 'ft/s', metric: 'm/s' },
  time: { US: 's', metric: 's' },
  power: { US: 'W', metric: 'W' },
  modulus: { US: 'GPa', metric: 'GPa' },
  temperature: { US: 'tempF', metric: 'tempC' },
  dimensionless: { US: '', metric: '' },
};

/** Units a unit picker may offer for each kind (all parseable by {@link toSI}). */
export const UNIT_CHOICES: Record<QuantityKind, readonly string[]> = {
  length: ['m', 'ft', 'in', 'mm', 'cm', 'yd'],
  smallLength: ['mm', 'in', 'cm', 'm'],
  flow: ['L/min', 'L/h', 'L/s', 'gal/min', 'gal/h', 'galimp/min', 'galimp/h', 'm^3/h', 'm^3/s', 'ft^3/s'],
  smallFlow: ['L/h', 'L/min', 'gal/h', 'gal/min', 'mL/min', 'cup/min', 'galimp/h', 'galimp/min'],
  area: ['m^2', 'ft^2', 'acre', 'hectare'],
  volume: ['L', 'gal', 'galimp', 'm^3'],
  dailyVolume: ['L/day', 'gal/day', 'galimp/day', 'm^3/day'],
  pressure: ['kPa', 'psi', 'bar', 'Pa', 'MPa'],
  velocity: ['m/s', 'ft/s'],
  time: ['s', 'min', 'h', 'day'],
  power: ['W'],
  modulus: ['GPa', 'MPa'],
  temperature: ['tempC', 'tempF'],
  dimensionless: [''],
};

/** How units are shown to a reader. */
const LABELS: Record<string, string> = {
  'm^3/s': 'm³/s',
  'm^3': 'm³',
  'm^2': 'm²',
  'ft^2': 'ft²',
  'm^3/h': 'm³/h',
  'm^3/day': 'm³/day',
  'ft^3/s': 'ft³/s',
  'gal/min': 'US gal/min',
  'gal/h': 'US gal/h',
  'gal/day': 'US gal/day',
  gal: 'US gal',
  'galimp/min': 'imp gal/min',
  'galimp/h': 'imp gal/h',
  'galimp/day': 'imp gal/day',
  galimp: 'imp gal',
  'cup/min': 'US cups/min',
  tempC: '°C',
  tempF: '°F',
};

/**
 * A unit as a reader should see it.
 * @example
 * unitLabel('m^3/s')  // → 'm³/s'
 * unitLabel('gal/min')  // → 'US gal/min'
 */
export function unitLabel(unit: string): string {
  return LABELS[unit] ?? unit;
}

/** Spellings people type that js-quantities does not know, mapped to ones it does. Keys are lower case. */
const ALIASES: Record<string, string> = {
  gpm: 'gal/min',
  usgpm: 'gal/min',
  'us gpm': 'gal/min',
  'us gal/min': 'gal/min',
  gph: 'gal/h',
  gpd: 'gal/day',
  'imp gal': 'galimp',
  'imperial gallon': 'galimp',
  'imperial gallons': 'galimp',
  'uk gal': 'galimp',
  'imp gal/min': 'galimp/min',
  'imp gal/h': 'galimp/h',
  'imp gal/day': 'galimp/day',
  igpm: 'galimp/min',
  igph: 'galimp/h',
  igpd: 'galimp/day',
  lpm: 'L/min',
  lps: 'L/s',
  lph: 'L/h',
  lpd: 'L/day',
  ft2: 'ft^2',
  'sq ft': 'ft^2',
  m2: 'm^2',
  yd2: 'yd^2',
  cfs: 'ft^3/s',
  cms: 'm^3/s',
  'cu ft': 'ft^3',
  cuft: 'ft^3',
  'cu ft/s': 'ft^3/s',
  psig: 'psi',
  kpa: 'kPa',
  mpa: 'MPa',
  gpa: 'GPa',
  '"': 'in',
  '″': 'in',
  '”': 'in',
  "''": 'in',
  'in.': 'in',
  "'": 'ft',
  '′': 'ft',
  '’': 'ft',
  'ft.': 'ft',
  '°c': 'tempC',
  degc: 'tempC',
  c: 'tempC',
  '°f': 'tempF',
  degf: 'tempF',
  f: 'tempF',
};

const VULGAR: Record<string, string> = {
  '½': ' 1/2',
  '⅓': ' 1/3',
  '⅔': ' 2/3',
  '¼': ' 1/4',
  '¾': ' 3/4',
  '⅕': ' 1/5',
  '⅛': ' 1/8',
  '⅜': ' 3/8',
  '⅝': ' 5/8',
  '⅞': ' 7/8',
};

/** Exact re-definitions (NIST SP 811 B.8; NIST Handbook 44 App. C) through js-quantities' exact base units. */
const EXACT_DEFINITIONS: Record<string, string> = {
  '<gallon>': '231 in^3',
  '<quart>': '57.75 in^3',
  '<pint>': '28.875 in^3',
  '<cup>': '14.4375 in^3',
  '<fluid-ounce>': '1.8046875 in^3',
  '<pound-force>': '1 lb*gee',
  '<psi>': '1 lb*gee/in^2',
};

let corrections: Record<string, number> | undefined;

/** Ratio exact/js-quantities for each re-defined unit, e.g. ≈ 0.99999999 for the gallon. */
function correctionTable(): Record<string, number> {
  if (corrections) return corrections;
  const unitOf: Record<string, string> = {
    '<gallon>': 'gal',
    '<quart>': 'qt',
    '<pint>': 'pint',
    '<cup>': 'cup',
    '<fluid-ounce>': 'floz',
    '<pound-force>': 'lbf',
    '<psi>': 'psi',
  };
  const table: Record<string, number> = {};
  for (const [name, def] of Object.entries(EXACT_DEFINITIONS)) {
    const unit = unitOf[name];
    if (unit === undefined) throw new Error(`units.ts: no js-quantities unit listed for ${name}`);
    table[name] = Qty(def).baseScalar / Qty(1, unit).baseScalar;
  }
  corrections = table;
  return table;
}

/** SI base value of a parsed quantity with the exact NIST definitions applied. */
function exactBase(q: Qty): number {
  const corr = correctionTable();
  let v = q.baseScalar;
  for (const u of q.numerator) v *= corr[u] ?? 1;
  for (const u of q.denominator) v /= corr[u] ?? 1;
  return v;
}

/**
 * Unit strings come from readers (a share link, a request body), so every cache keyed
 * by them is bounded: past the bound a unit is simply worked out again.
 */
export const UNIT_CACHE_LIMIT = 2048;

function remember<V>(cache: Map<string, V>, key: string, value: V): void {
  if (cache.size < UNIT_CACHE_LIMIT) cache.set(key, value);
}

const canonicalCache = new Map<string, string>();

function canonicalUnit(raw: string): string {
  const hit = canonicalCache.get(raw);
  if (hit !== undefined) return hit;
  const u = canonicalise(raw);
  remember(canonicalCache, raw, u);
  return u;
}

function canonicalise(raw: string): string {
  let u = raw
    .trim()
    .replace(/\s+per\s+/gi, '/')
    .replace(/\s*\/\s*/g, '/')
    .replace(/\s+/g, ' ');
  u = u.replace(/³/g, '^3').replace(/²/g, '^2').replace(/·/g, '*');
  return ALIASES[u.toLowerCase()] ?? u;
}

const factorCache = new Map<string, number>();

/** Exact SI base value of one `unit` (not for temperatures, which have an offset). */
function baseFactor(unit: string): number {
  const hit = factorCache.get(unit);
  if (hit !== undefined) return hit;
  const f = unit === '' ? 1 : exactBase(Qty(1, unit));
  remember(factorCache, unit, f);
  return f;
}

const kindCache = new Map<string, boolean>();

function checkKind(unit: string, kind: QuantityKind): boolean {
  if (kind === 'dimensionless') return unit === '';
  if (unit === '') return false;
  const key = `${kind}|${unit}`;
  const hit = kindCache.get(key);
  if (hit !== undefined) return hit;
  let ok: boolean;
  try {
    ok = Qty(1, unit).isCompatible(Qty(1, SI_UNIT[kind]));
  } catch {
    ok = false;
  }
  remember(kindCache, key, ok);
  return ok;
}

/**
 * Converts `value` in `unit` to the SI unit of `kind`.
 * Throws EngineInputError (field "unit") if the unit is unknown or of another kind.
 * Reference: NIST SP 811 (2008), Appendix B (1 US gal = 231 in³, 1 in = 0.0254 m).
 * @example 2 × 231 × 0.0254³ / 60
 * toSI(2, 'gal/min', 'flow')  // ≈ 1.261803928e-4
 * toSI(2, 'gpm', 'length')  // throws EngineInputError
 * @example the imperial gallon, 4.546 09 L exactly, beside the US gallon's 3.785 411 784 L
 * // UK Weights and Measures Act 1985, Schedule 1 (from memory); js-quantities defines it by that value
 * toSI(1, 'galimp', 'volume')  // ≈ 0.00454609 ±1e-15
 * toSI(1, 'imp gal', 'volume') / toSI(1, 'gal', 'volume')  // ≈ 1.200950 ±1e-6
 * toSI(10, 'igpm', 'flow')  // ≈ 7.576817e-4
 */
export function toSI(value: number, unit: string, kind: QuantityKind, field = 'unit'): number {
  const u = canonicalUnit(unit);
  if (!checkKind(u, kind)) {
    throw new EngineInputError([
      {
        field,
        message: `"${unit}" is not a unit of ${kindWords(kind)}; try ${UNIT_CHOICES[kind].filter(Boolean).join(', ')}`,
      },
    ]);
  }
  if (kind === 'temperature') return Qty(value, u).to('tempC').scalar;
  const si = (value * baseFactor(u)) / baseFactor(SI_UNIT[kind]);
  if (!Number.isFinite(si)) throw new EngineInputError([{ field, message: 'is too large to use' }]);
  // A value this close to zero divides out to Infinity (1e-320 m of fall gives an
  // infinite lift ratio); no measurement on a ram site is that small in SI.
  if (si !== 0 && Math.abs(si) < MIN_SI_MAGNITUDE) {
    throw new EngineInputError([{ field, message: 'is too close to zero to use' }]);
  }
  return si;
}

/**
 * Smallest non-zero SI magnitude an input may have: far below any reading a person
 * could type in a picker unit (a millionth of a mL/min is 1.7e-14 m³/s), yet large
 * enough that dividing by it stays finite (subnormals such as 1e-320 do not).
 */
export const MIN_SI_MAGNITUDE = 1e-30;

/**
 * Converts an SI value of `kind` to `unit` (the inverse of {@link toSI}).
 * @example
 * fromSI(0.3048, 'ft', 'length')  // ≈ 1 ±1e-12
 */
export function fromSI(si: number, unit: string, kind: QuantityKind): number {
  const u = canonicalUnit(unit);
  if (!checkKind(u, kind)) throw new Error(`"${unit}" is not a unit of ${kindWords(kind)}`);
  if (kind === 'temperature') return Qty(si, 'tempC').to(u).scalar;
  return (si * baseFactor(SI_UNIT[kind])) / baseFactor(u);
}

/**
 * Entries held by the unit caches, for tests that check they stay bounded.
 * @example
 * unitCacheSizes().factor <= 2048  // → true
 */
export function unitCacheSizes(): { canonical: number; kind: number; factor: number } {
  return { canonical: canonicalCache.size, kind: kindCache.size, factor: factorCache.size };
}

function kindWords(kind: QuantityKind): string {
  const words: Record<QuantityKind, string> = {
    length: 'length',
    smallLength: 'length',
    flow: 'flow',
    smallFlow: 'flow',
    area: 'area',
    volume: 'volume',
    dailyVolume: 'volume per day',
    pressure: 'pressure',
    velocity: 'velocity',
    time: 'time',
    power: 'power',
    modulus: 'stiffness (pressure units)',
    temperature: 'temperature',
    dimensionless: 'a plain number',
  };
  return words[kind];
}

/** Splits "1 1/4 in", "3/4\"", "1.2 m", "1,000 gal" into number and unit text. */
function splitNumber(text: string): { value: number; unit: string } | undefined {
  let s = text.trim();
  for (const [ch, rep] of Object.entries(VULGAR)) s = s.split(ch).join(rep);
  s = s.replace(/⁄/g, '/').trim();
  if (/^\d{1,3}(,\d{3})+(\.\d+)?/.test(s)) s = s.replace(/(\d),(?=\d{3})/g, '$1');
  else s = s.replace(/^(\d+),(\d+)/, '$1.$2');
  let m = /^(\d+)(?:\s+|-)(\d+)\/(\d+)\s*(.*)$/.exec(s);
  if (m) return { value: Number(m[1]) + Number(m[2]) / Number(m[3]), unit: m[4] ?? '' };
  m = /^(\d+)\/(\d+)\s*(.*)$/.exec(s);
  if (m) return { value: Number(m[1]) / Number(m[2]), unit: m[3] ?? '' };
  m = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)\s*(.*)$/i.exec(s);
  if (m) return { value: Number(m[1]), unit: m[2] ?? '' };
  return undefined;
}

/** A quantity as typed: "4 ft", or a number with its unit. A bare number is taken as already SI. */
export type QuantityInput = string | number | { value: number; unit: string };

/**
 * Reads a quantity and returns its value in the SI unit of `kind`.
 *
 * Accepts "4 ft", "1.2 m", "2 gpm", "500 mL/min", "3 cups/min", "40 psi",
 * "3/4 in", "¾\"", "1 1/4 in", "4'" or { value: 2, unit: 'gal/min' }.
 * Throws EngineInputError naming `field` when the text is not a finite
 * number with a unit of that kind.
 * @example 4 × 0.3048, ¾ in × 25.4 mm
 * parseQuantity('4 ft', 'length', 'fallM')  // ≈ 1.2192 ±1e-12
 * parseQuantity('¾"', 'smallLength')  // ≈ 0.01905 ±1e-12
 * parseQuantity('4', 'length')  // throws EngineInputError
 */
export function parseQuantity(input: QuantityInput, kind: QuantityKind, field = 'value'): number {
  let value: number;
  let unit: string;
  if (typeof input === 'number') {
    value = input;
    unit = SI_UNIT[kind];
  } else if (typeof input === 'string') {
    const parts = splitNumber(input);
    if (!parts) {
      throw new EngineInputError([
        {
          field,
          message: `could not read "${input}" as a ${kindWords(kind)}; type a number and a unit, e.g. ${exampleFor(kind)}`,
        },
      ]);
    }
    value = parts.value;
    unit = parts.unit;
    if (unit === '' && kind !== 'dimensionless') {
      throw new EngineInputError([{ field, message: `"${input}" needs a unit, e.g. ${exampleFor(kind)}` }]);
    }
  } else {
    value = input.value;
    unit = input.unit;
  }
  if (!Number.isFinite(value)) {
    throw new EngineInputError([{ field, message: `must be a finite number, got ${String(value)}` }]);
  }
  const si = toSI(value, unit, kind, field);
  if (!Number.isFinite(si)) throw new EngineInputError([{ field, message: 'is too large to use' }]);
  return si;
}

function exampleFor(kind: QuantityKind): string {
  const u = DISPLAY_UNITS[kind];
  return kind === 'dimensionless' ? '0.6' : `"4 ${u.US}" or "1.2 ${u.metric}"`;
}

/** An SI value shown in a system's display unit. */
export interface DisplayValue {
  value: number;
  /** unit as js-quantities spells it (pass back to fromDisplay/toSI) */
  unit: string;
  /** unit as a reader should see it */
  label: string;
}

/**
 * SI → display.
 * @example
 * toDisplay('flow', 1.261803928e-4, 'US').value  // ≈ 2 ±1e-8
 * toDisplay('flow', 1.261803928e-4, 'US').label  // → 'US gal/min'
 */
export function toDisplay(kind: QuantityKind, si: number, system: UnitSystem): DisplayValue {
  const unit = DISPLAY_UNITS[kind][system];
  return { value: fromSI(si, unit, kind), unit, label: unitLabel(unit) };
}

/**
 * Display → SI. Reference: 1 psi = 1 lbf/in² = 0.45359237 kg × 9.80665 m/s² / 0.0254² m² (NIST SP 811).
 * @example 40 × 6894.757
 * fromDisplay('pressure', 40, 'US')  // ≈ 275790.3
 */
export function fromDisplay(kind: QuantityKind, value: number, system: UnitSystem): number {
  return toSI(value, DISPLAY_UNITS[kind][system], kind);
}

/** Field names that hold small lengths (diameters, walls, roughness, weir heads) shown in mm or in. */
const SMALL_LENGTH_FIELD =
  /(Diameter|WallThickness|Roughness|NotchHead|Depth|DepthPerWeek|diameter|wallThickness|roughness|notchHead)M$/;

/**
 * The quantity kind of a schema or result field, from its SI suffix:
 * …M3s flow, …M3PerDay daily volume, …M3 volume, …M2 area, …Pa pressure, …Ms velocity,
 * …DiameterM / …WallThicknessM / …RoughnessM / …NotchHeadM / …DepthM small length, …M length,
 * …S time, …W power, …TempC temperature. Unknown suffix → undefined.
 * @example
 * kindOfField('drivePipe.insideDiameterM')  // → 'smallLength'
 * kindOfField('fallM')  // → 'length'
 * kindOfField('pumpType')  // → undefined
 */
export function kindOfField(field: string): QuantityKind | undefined {
  const leaf = field.split('.').pop() ?? field;
  if (/M3s$/.test(leaf)) return 'flow';
  if (/M3PerDay$/.test(leaf)) return 'dailyVolume';
  if (/M3$/.test(leaf)) return 'volume';
  if (/M2$/.test(leaf)) return 'area';
  if (/ModulusPa$/.test(leaf)) return 'modulus';
  if (/Pa$/.test(leaf)) return 'pressure';
  if (/Ms$/.test(leaf)) return 'velocity';
  if (SMALL_LENGTH_FIELD.test(leaf)) return 'smallLength';
  if (/M$/.test(leaf)) return 'length';
  if (/S$/.test(leaf)) return 'time';
  if (/W$/.test(leaf)) return 'power';
  if (/TempC$/.test(leaf)) return 'temperature';
  return undefined;
}

/**
 * Shows a field's SI value in a system's units; dimensionless when the field has no known kind.
 * @example 1.2192 m of fall is 4 ft
 * fieldToDisplay('fallM', 1.2192, 'US').value  // ≈ 4 ±1e-12
 */
export function fieldToDisplay(field: string, si: number, system: UnitSystem): DisplayValue {
  return toDisplay(kindOfField(field) ?? 'dimensionless', si, system);
}

/**
 * Reads a field's display value back to SI.
 * @example 29 ft of lift
 * fieldFromDisplay('liftM', 29, 'US')  // ≈ 8.8392 ±1e-12
 */
export function fieldFromDisplay(field: string, value: number, system: UnitSystem): number {
  return fromDisplay(kindOfField(field) ?? 'dimensionless', value, system);
}

/**
 * Units a person would write a value in, by size: larger or smaller units are used where the
 * plain display unit would give a long tail of zeros or a huge number. Flows under 1 gal/min or
 * 1 L/min read as per hour; lengths under a foot read in inches, under 0.1 m in mm; volumes of
 * 10,000 L and more in m³. Each entry: [threshold in the plain display unit, unit to use below it].
 */
const BY_SIZE: Partial<Record<QuantityKind, Record<UnitSystem, { below: number; unit: string }[]>>> = {
  flow: { US: [{ below: 1, unit: 'gal/h' }], metric: [{ below: 1, unit: 'L/h' }] },
  smallFlow: { US: [{ below: 1, unit: 'gal/h' }], metric: [{ below: 1, unit: 'L/h' }] },
  length: { US: [{ below: 1, unit: 'in' }], metric: [{ below: 0.1, unit: 'mm' }] },
};
/** The plain unit for small flows is per minute, so cups and millilitres never head a result. */
const PLAIN: Partial<Record<QuantityKind, Record<UnitSystem, string>>> = {
  smallFlow: { US: 'gal/min', metric: 'L/min' },
};

/**
 * SI → the unit a person would write this value in (see BY_SIZE), for results and text.
 * Inputs keep {@link toDisplay}'s fixed units so a typed value does not jump units.
 * @example 0.5 US gal/min reads as 30 US gal/h (NIST SP 811: 1 gal = 3.785411784 L)
 * readableDisplay('smallFlow', 3.15450982e-5, 'US').label  // → 'US gal/h'
 * readableDisplay('smallFlow', 3.15450982e-5, 'US').value  // ≈ 30 ±1e-6
 * readableDisplay('flow', 1e-3, 'metric').label  // → 'L/min'
 * readableDisplay('length', 0.05, 'metric').label  // → 'mm'
 */
export function readableDisplay(kind: QuantityKind, si: number, system: UnitSystem): DisplayValue {
  const plainUnit = PLAIN[kind]?.[system] ?? DISPLAY_UNITS[kind][system];
  const plain = fromSI(si, plainUnit, kind);
  const smaller = BY_SIZE[kind]?.[system].find((s) => Math.abs(plain) < s.below && si !== 0);
  const unit = smaller?.unit ?? plainUnit;
  return { value: unit === plainUnit ? plain : fromSI(si, unit, kind), unit, label: unitLabel(unit) };
}

/**
 * The unit an input of this kind opens on when it holds no value yet. Measured delivery
 * (smallFlow) opens on a unit people time a bucket in, never cups or millilitres a minute.
 * @example
 * inputUnit('smallFlow', 'US')  // → 'gal/h'
 * inputUnit('smallFlow', 'metric')  // → 'L/h'
 * inputUnit('length', 'metric')  // → 'm'
 */
export function inputUnit(kind: QuantityKind, system: UnitSystem): string {
  return PLAIN_INPUT[kind]?.[system] ?? DISPLAY_UNITS[kind][system];
}
const PLAIN_INPUT: Partial<Record<QuantityKind, Record<UnitSystem, string>>> = {
  smallFlow: { US: 'gal/h', metric: 'L/h' },
};

/** Unit words of each system; time (s, min, h, day) belongs to both, the imperial gallon to neither. */
const US_WORDS = new Set(['ft', 'in', 'yd', 'mi', 'gal', 'cup', 'qt', 'pint', 'floz', 'psi', 'lbf', 'acre', 'tempF']);
const METRIC_WORDS = new Set([
  'm',
  'mm',
  'cm',
  'km',
  'L',
  'l',
  'mL',
  'ml',
  'Pa',
  'kPa',
  'MPa',
  'GPa',
  'bar',
  'hectare',
]);
METRIC_WORDS.add('tempC');

/**
 * Which system a unit belongs to, so an input in the other one can be re-expressed:
 * 'US', 'metric', 'imperial' (the imperial gallon, foreign to both) or undefined for
 * units both share (seconds, hours, a plain number).
 * @example
 * unitSystemOf('gpm')  // → 'US'
 * unitSystemOf('L/min')  // → 'metric'
 * unitSystemOf('m^3/day')  // → 'metric'
 * unitSystemOf('igpm')  // → 'imperial'
 * unitSystemOf('min')  // → undefined
 */
export function unitSystemOf(unit: string): UnitSystem | 'imperial' | undefined {
  const words = canonicalUnit(unit)
    .split(/[/*^\s\d]+/)
    .filter(Boolean);
  if (words.some((w) => w.startsWith('galimp'))) return 'imperial';
  if (words.some((w) => US_WORDS.has(w))) return 'US';
  if (words.some((w) => METRIC_WORDS.has(w))) return 'metric';
  return undefined;
}

const roundTo = (x: number, step: number) => Math.round(x / step) * step;
const significant = (x: number, digits: number) => (x === 0 ? 0 : Number(x.toPrecision(digits)));

/**
 * A value in `unit` rounded as a person writes it off a tape, a gauge or a bucket:
 * metres to the centimetre under 5 m, then to 0.1 m, whole metres from 100 m; feet to
 * 0.1 ft under 10 ft, then whole feet; inches to the eighth from half an inch (finer
 * as two figures); millimetres whole from 10 mm; degrees whole; flows and volumes to two
 * significant figures under 10 and three above; velocities to two; anything else three.
 * Rules of common practice, no source. For converted defaults and values re-expressed
 * after a unit switch, never for what the reader typed.
 * @example 2 ft, 4 ft and 24 ft in metres; 0.6 m in feet
 * roundAsWritten(0.6096, 'm', 'length')  // → 0.61
 * roundAsWritten(1.2192, 'm', 'length')  // → 1.22
 * roundAsWritten(7.3152, 'm', 'length')  // → 7.3
 * roundAsWritten(1.9685, 'ft', 'length')  // → 2
 * @example 3/4 in in mm; 25 mm in inches; 2 US gal/min in L/min
 * roundAsWritten(19.05, 'mm', 'smallLength')  // → 19
 * roundAsWritten(0.98425, 'in', 'smallLength')  // → 1
 * roundAsWritten(7.5708, 'L/min', 'flow')  // → 7.6
 */
export function roundAsWritten(value: number, unit: string, kind: QuantityKind): number {
  if (!Number.isFinite(value)) return value;
  const a = Math.abs(value);
  let r: number;
  switch (canonicalUnit(unit)) {
    case 'm':
      r = roundTo(value, a < 5 ? 0.01 : a < 100 ? 0.1 : 1);
      break;
    case 'ft':
      r = roundTo(value, a < 10 ? 0.1 : 1);
      break;
    case 'in':
      r = a >= 0.5 ? roundTo(value, 0.125) : significant(value, 2);
      break;
    case 'mm':
      r = a >= 10 ? Math.round(value) : significant(value, 2);
      break;
    case 'cm':
      r = a >= 10 ? Math.round(value) : roundTo(value, 0.1);
      break;
    case 'tempC':
    case 'tempF':
      r = Math.round(value);
      break;
    default:
      if (kind === 'flow' || kind === 'smallFlow' || kind === 'dailyVolume' || kind === 'volume')
        r = significant(value, a < 10 ? 2 : 3);
      else r = significant(value, kind === 'velocity' ? 2 : 3);
  }
  // 1.22 rather than 1.2200000000000002: the step's own rounding error is far below the digits kept
  return Number(r.toPrecision(12));
}

/**
 * An SI value as an input would open on it in a reader's system: the unit a person
 * writes it in by size ({@link readableDisplay}), unless the field offers only other
 * units, and the value rounded by {@link roundAsWritten}.
 * @example 4 ft for a metric reader; 0.5 US gal/min of delivery for a metric reader
 * asWritten('length', 1.2192, 'metric')  // → { value: 1.22, unit: 'm', label: 'm' }
 * asWritten('smallFlow', 3.15450982e-5, 'metric')  // → { value: 1.9, unit: 'L/min', label: 'L/min' }
 */
export function asWritten(
  kind: QuantityKind,
  si: number,
  system: UnitSystem,
  offered: readonly string[] = UNIT_CHOICES[kind],
): DisplayValue {
  let unit = readableDisplay(kind, si, system).unit;
  if (!offered.includes(unit)) {
    const plain = inputUnit(kind, system);
    unit = offered.includes(plain) ? plain : (offered.find((u) => unitSystemOf(u) === system) ?? plain);
  }
  return { value: roundAsWritten(fromSI(si, unit, kind), unit, kind), unit, label: unitLabel(unit) };
}
