import { demoCalculations, demoQuestions } from '../../migrations/seed/demo-data';
import { demoThreads } from '../../migrations/seed/demo-forum-data';
import { demoSites } from '../../migrations/seed/demo-sites';
import { demoFieldLog } from '../../migrations/seed/demo-field-log';

/**
 * Finding a unit of the other system in text a reader sees. Units are matched after a
 * number ("4 ft", "2.5L/min"), in brackets ("Lift (m)") or, for the symbols no English
 * word shares ("kPa", "°F", "gpm"), anywhere; word boundaries are letters and digits, so
 * "min", "mm" or "in" inside a word ("minute", "summit", "inlet") never match.
 */
export type System = 'US' | 'metric';

const NUM = String.raw`(?<![\p{L}\p{N}.^])(\d*[¼½¾⅛⅜⅝⅞]|\d+(?:[.,]\d+)*(?:[-/]\d+)?)`;
const END = String.raw`(?![\p{L}\p{N}²³])`;

/** What a US reader must not see. */
const METRIC_AFTER_NUMBER = String.raw`mm|cm|km|m³|m3|m\/s|m(?!\/)|mL|ml|L\/min|L\/h|L\/day|L\/d|L\/s|L(?!\/)|kPa|bar|°C|litres?|liters?|metres?|meters?|millimetres?|kilometres?`;
const METRIC_ANYWHERE = String.raw`mL|m³|m\/s|L\/min|L\/h|L\/day|L\/s|kPa|°C|litres?|metres?`;
/** What a metric reader must not see ("in" only after a number, see below). */
const US_AFTER_NUMBER = String.raw`ft\/s|ft|feet|foot|in|inch(?:es)?|"|″|US gal\/\w+|US gal|gal|gallons?|gpm|psi|°F|US cups|cups?|yd|yards?`;
const US_ANYWHERE = String.raw`ft\/s|ft|US gal|gal|gpm|psi|°F|cups`;

/** "2 in parallel", "1 in 10", "3 in the tank": "in" after a number as a preposition, not inches. */
const IN_AS_WORD = /^\s?in\s+(?:parallel|series|stages?|a|an|the|each|every|all|one|two|three|\d)\b/u;

function patterns(system: System): RegExp[] {
  const [afterNumber, anywhere] =
    system === 'US' ? [METRIC_AFTER_NUMBER, METRIC_ANYWHERE] : [US_AFTER_NUMBER, US_ANYWHERE];
  return [
    new RegExp(`${NUM}\\s?(?:${afterNumber})${END}`, 'gu'),
    new RegExp(`\\((?:${afterNumber})\\)`, 'gu'),
    new RegExp(`(?<![\\p{L}\\p{N}/])(?:${anywhere})${END}`, 'gu'),
  ];
}

/** e-notation as a program prints it: 1e-3, 2.5E+4 (never in the UI). */
const E_NOTATION = /(?<![\p{L}\p{N}])\d(?:\.\d+)?e[-+]?\d/giu;

/**
 * Pipe and pump sizes are sold under their inch names in both systems ("¾ in", '1¼"',
 * "1-1/4 in"; ASME B36.10M-2018 keeps the NPS names): a fraction names a size, not a
 * measurement. ("1-inch pump" never matches: the hyphen joins it into one word.) A length
 * the site computes is written in decimals ("8 in", "0.75 in"), so it is still caught.
 */
function isNominalSize(match: string, before: string, after: string): boolean {
  if (/[¼½¾⅛⅜⅝⅞]|\d\/\d/.test(match)) return true;
  // a whole-inch size named as such: "pump size 1 inch", 'the 1" pump', "2 in pipe", "1 inch homemade pumps"
  return (
    /\bsize:?\s*$/i.test(before) ||
    /^[\s-]*(?:[a-z]+\s+)?(?:pumps?|pipes?|drive|delivery|line|fittings?|valves?)\b/i.test(after)
  );
}

/**
 * Strings shown on purpose in both systems, each with its reason.
 * - the guide sentence that lists how one pipe size is written, to say search finds any of them
 */
const EXPLAINED = [/\(¾", 0\.75 in, 19 mm, DN20\)/];

/** The field log shows what a member typed beside the converted value: “typed "2.4 m"” is their own words. */
const TYPED = /typed [“"][^”"]*[”"]/g;

/**
 * A member's quantity quoted as written, its reading in the reader's units in brackets
 * right after it: "stroke 9 mm (0.354 in)". The bracket must hold a number in the reader's
 * own units for the quantity before it to be excused.
 */
const READING_AFTER = /^\s?\((\d[\d.,]*\s?[^()]+)\)/u;

const READINGS = /\s?\(\d[\d.,]*\s?[^()]+\)/gu;

/**
 * A member's quantity at text[i, i + length) followed by its reading: in a passage the page
 * marks as a member's quoted words, or where the text without the readings is a demo member's.
 */
function quotedWithReading(text: string, i: number, length: number, system: System, quoted = false): boolean {
  const end = i + length;
  const reading = READING_AFTER.exec(text.slice(end));
  if (!reading || !/\p{L}/u.test(reading[1]) || wrongUnits(reading[1], system).length > 0) return false;
  if (quoted) return true;
  const before = text.slice(0, i).replace(READINGS, '');
  const words = before + text.slice(i, end) + text.slice(end + reading[0].length).replace(READINGS, '');
  return isMemberWords(words, before.length, length);
}

/**
 * A size drawn on its own (a question's pump size at a glance, a pipe size picked in a
 * select) is the size's name as pipes are sold ("1\"", "2 × 1\""), in both systems.
 */
const SIZE_ALONE = /^(?:\d+ × )?\d*[¼½¾⅛⅜⅝⅞]?"$/u;

/**
 * A member's own words are quoted as written (DESIGN.md: we never rewrite a post): the
 * demo posts' titles, bodies, captions and notes. A hit is theirs when the text around it
 * (at least 16 characters, so a bare "4 ft" in a site sheet is never excused) is in one of them.
 */
const MEMBER_KEYS = new Set([
  'title',
  'body',
  'caption',
  'alt',
  'notes',
  'siteName',
  'whatChanged',
  'changed',
  'driveFlowHow',
  'wasteValveSetting',
  // what fixed it, in the asker's words
  'line',
]);
function memberStrings(): string[] {
  const out: string[] = [];
  const walk = (v: unknown, key = '') => {
    if (typeof v === 'string') {
      if (MEMBER_KEYS.has(key)) out.push(v.replace(/\s+/g, ' '));
    } else if (Array.isArray(v)) v.forEach((x) => walk(x, key));
    else if (v && typeof v === 'object' && key !== 'siteSheet' && key !== 'inputs')
      for (const [k, x] of Object.entries(v)) walk(x, k);
  };
  walk([demoQuestions, demoThreads, demoCalculations, demoFieldLog(), demoSites]);
  return out;
}
const MEMBER_WORDS = memberStrings();

function isMemberWords(text: string, index: number, length: number): boolean {
  const from = Math.max(0, index - 15);
  const window = text.slice(from, index + length + 15).trim();
  if (window.length < 16) return false;
  return MEMBER_WORDS.some((m) => m.includes(window));
}

/** Every unit of the other system, and every e-notation, in one block of text. */
export function wrongUnits(text: string, system: System, opts: { quoted?: boolean } = {}): string[] {
  const hits: string[] = [];
  if (SIZE_ALONE.test(text.trim())) return hits;
  const excused: [number, number][] = [];
  for (const re of [...EXPLAINED.map((r) => new RegExp(r.source, 'g')), TYPED])
    for (const m of text.matchAll(re)) excused.push([m.index, m.index + m[0].length]);
  // one unit matched by several patterns ("4 ft", "ft") is reported once
  const seen: [number, number][] = [];
  const report = (i: number, len: number, what = '') => {
    if ([...seen, ...excused].some(([a, b]) => i < b && a < i + len)) return;
    seen.push([i, i + len]);
    hits.push(`“${text.slice(Math.max(0, i - 30), i + len + 30).trim()}” (${text.slice(i, i + len).trim()})${what}`);
  };
  for (const m of text.matchAll(E_NOTATION)) {
    if (!isMemberWords(text, m.index, m[0].length)) report(m.index, m[0].length, ' e-notation');
  }
  for (const re of patterns(system)) {
    for (const m of text.matchAll(re)) {
      const i = m.index;
      if (system === 'metric' && m[1] !== undefined && IN_AS_WORD.test(text.slice(i + m[1].length))) continue;
      if (system === 'metric' && isNominalSize(m[0], text.slice(Math.max(0, i - 12), i), text.slice(i + m[0].length)))
        continue;
      if (isMemberWords(text, i, m[0].length)) continue;
      if (m[1] !== undefined && quotedWithReading(text, i, m[0].length, system, opts.quoted)) {
        // the unit alone ("ft") matches again below: it is excused with its number
        seen.push([i, i + m[0].length]);
        continue;
      }
      report(i, m[0].length);
    }
  }
  return hits;
}
