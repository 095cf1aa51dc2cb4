import { stemmer } from 'stemmer';
import english from 'flexsearch/lang/en';

/**
 * The trade-aware text pipeline both search engines share. Text is cut into
 * tokens, and before any word is stemmed:
 * - pipe sizes written any way ("3/4 inch", "¾\"", "0.75 in", "19 mm", "DN20")
 *   become one token for the nominal size (`dn20`);
 * - lengths, flows and pressures with a unit become a token for the value in SI,
 *   rounded to two significant figures, so "4 ft" meets "1.2 m";
 * - the trade's synonyms become one word ("supply head" → fall, "impulse valve" →
 *   waste valve …);
 * then the remaining words lose stop-words and are stemmed (Porter).
 */

export interface Token {
  /** what is indexed (already final: not stemmed again) */
  term: string;
  /** index-time neighbours that should also match (quantities only) */
  near?: string[];
  start: number;
  end: number;
}

/**
 * Nominal pipe sizes: inches (NPS) against the metric DN designation, as tabulated
 * in ASME B36.10M and ISO 6708 (DN 15 = ½", DN 20 = ¾", DN 25 = 1" …).
 */
export const NOMINAL_SIZES: ReadonlyArray<{ inches: number; dn: number }> = [
  { inches: 0.25, dn: 8 },
  { inches: 0.375, dn: 10 },
  { inches: 0.5, dn: 15 },
  { inches: 0.75, dn: 20 },
  { inches: 1, dn: 25 },
  { inches: 1.25, dn: 32 },
  { inches: 1.5, dn: 40 },
  { inches: 2, dn: 50 },
  { inches: 2.5, dn: 65 },
  { inches: 3, dn: 80 },
  { inches: 4, dn: 100 },
  { inches: 5, dn: 125 },
  { inches: 6, dn: 150 },
  { inches: 8, dn: 200 },
];

const VULGAR: Record<string, number> = {
  '¼': 0.25,
  '½': 0.5,
  '¾': 0.75,
  '⅛': 0.125,
  '⅜': 0.375,
  '⅝': 0.625,
  '⅞': 0.875,
};

function dnForInches(inches: number): number | null {
  const hit = NOMINAL_SIZES.find((s) => Math.abs(inches - s.inches) / s.inches <= 0.03);
  return hit ? hit.dn : null;
}

function dnForMillimetres(mm: number): number | null {
  const exact = NOMINAL_SIZES.find((s) => s.dn === mm);
  if (exact) return exact.dn;
  return dnForInches(mm / 25.4);
}

/** Two significant figures, written without dot or sign so no tokenizer splits it: 1.2 → "1p2". */
function bucket(value: number, shift = 0): string {
  if (!(value > 0) || !Number.isFinite(value)) return '0';
  const exp = Math.floor(Math.log10(value)) - 1;
  const step = 10 ** exp;
  const n = Math.round(value / step) + shift;
  const v = n * step;
  return Number(v.toPrecision(3)).toString().replace('.', 'p');
}

function quantityToken(kind: string, si: number, start: number, end: number): Token {
  return { term: `${kind}${bucket(si)}`, near: [`${kind}${bucket(si, -1)}`, `${kind}${bucket(si, 1)}`], start, end };
}

/** metres per unit */
const LENGTH: Record<string, number> = {
  m: 1,
  metre: 1,
  metres: 1,
  meter: 1,
  meters: 1,
  ft: 0.3048,
  feet: 0.3048,
  foot: 0.3048,
  "'": 0.3048,
  cm: 0.01,
  km: 1000,
  yd: 0.9144,
  yards: 0.9144,
};
/** litres per minute per unit (US gallon, 3.785411784 L, as the rest of the app) */
const GAL = 3.785411784;
const FLOW: Record<string, number> = {
  'l/min': 1,
  lpm: 1,
  'litres per minute': 1,
  'liters per minute': 1,
  'l/s': 60,
  'l/h': 1 / 60,
  lph: 1 / 60,
  'l/day': 1 / 1440,
  'l/d': 1 / 1440,
  gpm: GAL,
  'gal/min': GAL,
  'gallons per minute': GAL,
  'gallon per minute': GAL,
  gph: GAL / 60,
  'gal/h': GAL / 60,
  'gallons per hour': GAL / 60,
  gpd: GAL / 1440,
  'gal/day': GAL / 1440,
  'gallons per day': GAL / 1440,
};
/** kilopascals per unit (1 psi = 6.894757 kPa, NIST SP 811) */
const PRESSURE: Record<string, number> = { psi: 6.894757, kpa: 1, bar: 100 };

const NUM = String.raw`(\d+(?:\.\d+)?)`;
const INCH = String.raw`(?:"|”|″|''|\s?-?\s?inch(?:es)?\b|\s?in\b\.?)`;
const unitAlt = (m: Record<string, number>) =>
  Object.keys(m)
    .sort((a, b) => b.length - a.length)
    .map((u) => u.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&').replace(/ /g, '\\s+'))
    .join('|');

interface Rule {
  re: RegExp;
  make: (m: RegExpExecArray) => Token | null;
}

const num = (s: string) => Number(s);

const RULES: Rule[] = [
  // DN20, DN 20
  {
    re: /\bdn\s?(\d{1,3})\b/y,
    make: (m) => (NOMINAL_SIZES.some((s) => s.dn === Number(m[1])) ? tok(`dn${Number(m[1])}`, m) : null),
  },
  // 1 1/4", 1-1/4 inch, 1¼", ¾ inch
  {
    re: new RegExp(String.raw`(?:(\d+)[\s-]+)?(\d)\/(\d{1,2})${INCH}`, 'y'),
    make: (m) => {
      const [, whole, top, bottom] = m;
      return top && bottom ? sizeOrLength((whole ? Number(whole) : 0) + Number(top) / Number(bottom), m) : null;
    },
  },
  {
    re: new RegExp(String.raw`(\d+)?\s?([¼½¾⅛⅜⅝⅞])${INCH}`, 'y'),
    make: (m) => {
      const [, whole, vulgar] = m;
      const fraction = vulgar && VULGAR[vulgar];
      return fraction ? sizeOrLength((whole ? Number(whole) : 0) + fraction, m) : null;
    },
  },
  // 0.75 in, 1-inch, 2"
  { re: new RegExp(String.raw`${NUM}${INCH}`, 'y'), make: (m) => (m[1] ? sizeOrLength(num(m[1]), m) : null) },
  // 19 mm
  {
    re: new RegExp(String.raw`${NUM}\s?mm\b`, 'y'),
    make: (m) => {
      if (!m[1]) return null;
      const dn = dnForMillimetres(num(m[1]));
      return dn ? tok(`dn${dn}`, m) : quantityToken('len', num(m[1]) / 1000, m.index, m.index + m[0].length);
    },
  },
  {
    re: new RegExp(String.raw`${NUM}\s?(${unitAlt(FLOW)})(?![a-z])`, 'y'),
    make: (m) => withUnit('flow', FLOW, m, (u) => u.replace(/\s+/g, ' ')),
  },
  {
    re: new RegExp(String.raw`${NUM}\s?(${unitAlt(PRESSURE)})(?![a-z])`, 'y'),
    make: (m) => withUnit('kpa', PRESSURE, m),
  },
  { re: new RegExp(String.raw`${NUM}\s?(${unitAlt(LENGTH)})(?![a-z])`, 'y'), make: (m) => withUnit('len', LENGTH, m) },
];

/** A number and a unit from `units` (groups 1 and 2), as a quantity token in SI; null when the unit is not in the table. */
function withUnit(
  kind: string,
  units: Record<string, number>,
  m: RegExpExecArray,
  key = (u: string) => u,
): Token | null {
  const [, value, unit] = m;
  if (!value || !unit) return null;
  const factor = units[key(unit.toLowerCase())];
  return factor === undefined ? null : quantityToken(kind, num(value) * factor, m.index, m.index + m[0].length);
}

function tok(term: string, m: RegExpExecArray): Token {
  return { term, start: m.index, end: m.index + m[0].length };
}

function sizeOrLength(inches: number, m: RegExpExecArray): Token | null {
  if (!(inches > 0)) return null;
  const dn = dnForInches(inches);
  return dn ? tok(`dn${dn}`, m) : quantityToken('len', inches * 0.0254, m.index, m.index + m[0].length);
}

/** Phrases of the trade that mean the same thing, each to one indexed word. */
export const SYNONYMS: ReadonlyArray<{ term: string; phrases: string[] }> = [
  { term: 'fall', phrases: ['supply head', 'fall'] },
  { term: 'lift', phrases: ['delivery head', 'lift'] },
  { term: 'wastevalve', phrases: ['waste valve', 'impulse valve', 'waste-valve', 'impulse-valve'] },
  { term: 'airchamber', phrases: ['air chamber', 'pressure tank', 'air-chamber'] },
  { term: 'drivepipe', phrases: ['drive pipe', 'drive line', 'drive-pipe', 'drive-line', 'drivepipe', 'driveline'] },
];
const SYNONYM_RE = new RegExp(
  String.raw`(${SYNONYMS.flatMap((s) => s.phrases)
    .sort((a, b) => b.length - a.length)
    .map((p) => p.replace(/[-\s]/g, String.raw`[\s-]+`))
    .join('|')})(?:e?s|ing|ed)?\b`,
  'y',
);
/** the first word of each synonym phrase, to try the phrase rule only where it can match */
const SYNONYM_FIRST_WORDS = new Set(SYNONYMS.flatMap((s) => s.phrases.map((p) => p.split(/[-\s]/)[0])));
const SYNONYM_OF = new Map<string, string>(
  SYNONYMS.flatMap((s) => s.phrases.map((p) => [p.replace(/[-\s]+/g, ' '), s.term] as const)),
);

/** flexsearch's English stop-word list */
const STOP_WORDS = english.filter as Set<string>;

const WORD_RE = /[\p{L}\p{N}]+(?:['’][\p{L}]+)?/uy;
const START_RE = /[\p{L}\p{N}¼½¾⅛⅜⅝⅞]/u;

/** Lower case only, so offsets into the text stay those of the original (for snippets). */
function fold(text: string): string {
  return text.toLowerCase();
}

/** Every token of a text with its place in the text (for snippets). */
export function tokenize(input: string): Token[] {
  const text = fold(input);
  const out: Token[] = [];
  let i = 0;
  while (i < text.length) {
    const ch = text.charAt(i);
    if (!START_RE.test(ch)) {
      i++;
      continue;
    }
    const atWordStart = i === 0 || !/[\p{L}\p{N}]/u.test(text.charAt(i - 1));
    let matched: Token | null = null;
    WORD_RE.lastIndex = i;
    const w = WORD_RE.exec(text);
    if (atWordStart) {
      // the unit and size rules start at a digit, a vulgar fraction or "dn"; synonyms at their first word
      if (/[\d¼½¾⅛⅜⅝⅞]/.test(ch) || (ch === 'd' && text[i + 1] === 'n')) {
        for (const rule of RULES) {
          rule.re.lastIndex = i;
          const m = rule.re.exec(text);
          if (m) {
            matched = rule.make(m);
            if (matched) break;
          }
        }
      }
      if (!matched && w && SYNONYM_FIRST_WORDS.has(w[0])) {
        SYNONYM_RE.lastIndex = i;
        const m = SYNONYM_RE.exec(text);
        const phrase = m?.[1];
        if (m && phrase)
          matched = { term: SYNONYM_OF.get(phrase.replace(/[-\s]+/g, ' ')) ?? phrase, start: i, end: i + m[0].length };
      }
    }
    if (matched) {
      out.push(matched);
      i = matched.end;
      continue;
    }
    if (!w) {
      i++;
      continue;
    }
    const word = w[0].replace(/['’]/g, '');
    if (!STOP_WORDS.has(word) && word.length > 0)
      out.push({ term: /^\d/.test(word) ? word : stemmer(word), start: i, end: i + w[0].length });
    i += w[0].length;
  }
  return out;
}

/** Terms for the index: each token, and the neighbouring buckets of quantities so near values meet. */
export function indexTerms(text: string): string[] {
  const out: string[] = [];
  for (const t of tokenize(text)) {
    out.push(t.term);
    if (t.near) out.push(...t.near);
  }
  return out;
}

/** Terms for a query: each token once, in order. */
export function queryTerms(text: string): string[] {
  return [...new Set(tokenize(text).map((t) => t.term))];
}
