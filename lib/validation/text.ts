import { z } from 'zod';

/**
 * Checks shared by every schema that takes text from a request.
 *
 * A JSON body may carry a lone UTF-16 surrogate ("\ud800"): JavaScript keeps it, but
 * it is no character at all, MariaDB's JSON CHECK refuses it and a TEXT column would
 * silently turn it into U+FFFD. Refusing it at the edge names the field instead.
 */
export const BROKEN_TEXT_MESSAGE = 'contains a broken character (a lone UTF-16 surrogate); retype or paste it again';

export function isWellFormedText(s: string): boolean {
  return s.isWellFormed();
}

/** A zod string that refuses lone surrogates, naming the field. */
export function wellFormedString(message = BROKEN_TEXT_MESSAGE) {
  return z.string().refine(isWellFormedText, { message });
}

/**
 * The path of the first key or string in a parsed JSON value that is not well-formed
 * Unicode, or undefined. Depth and breadth are bounded by the body size limit.
 */
export function firstBrokenText(value: unknown, path: (string | number)[] = []): (string | number)[] | undefined {
  if (typeof value === 'string') return isWellFormedText(value) ? undefined : path;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const hit = firstBrokenText(value[i], [...path, i]);
      if (hit) return hit;
    }
    return undefined;
  }
  if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      if (!isWellFormedText(k)) return [...path, k.toWellFormed()];
      const hit = firstBrokenText(v, [...path, k]);
      if (hit) return hit;
    }
  }
  return undefined;
}

/**
 * A calendar date typed as YYYY-MM-DD that exists: 2026-02-30, 2026-99-99 and
 * 0000-00-00 match the pattern but are no day at all, and MariaDB would store
 * them as a zero date or refuse them.
 */
export function isCalendarDate(s: string): boolean {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(s);
  if (!m) return false;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  // DATE columns take years 1000–9999; a field test before 1900 is a typo
  if (y < 1900 || y > 9999 || mo < 1 || mo > 12 || d < 1) return false;
  return d <= new Date(Date.UTC(y, mo, 0)).getUTCDate();
}

/** A YYYY-MM-DD date that exists, for schemas. */
export function calendarDate(field: string) {
  return z
    .string({ error: `${field} is required` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, `${field} must be a date like 2026-05-14`)
    .refine(isCalendarDate, `${field} must be a real date, like 2026-05-14`);
}
