/**
 * The one way dates are written on Clackwater: "3 Dec 2026", and with the time
 * "3 Dec 2026, 14:05 UTC". Always in UTC, so the server's page and the browser's
 * hydration print the same words wherever the reader is (a thread page is cached
 * for every reader). Plain Intl: safe in the browser and on the server.
 */
/** The months by name, January first (the planner's driest month, the month chart). */
export const MONTH_NAMES = [
  'January',
  'February',
  'March',
  'April',
  'May',
  'June',
  'July',
  'August',
  'September',
  'October',
  'November',
  'December',
] as const;

const parts = new Intl.DateTimeFormat('en', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
  hourCycle: 'h23',
  timeZone: 'UTC',
});

/**
 * The pieces, put in our order ourselves: locales disagree on it ("Dec 3, 2026",
 * "3 Sept 2026") and on the abbreviations between ICU versions.
 */
function pieces(d: Date) {
  const got: Partial<Record<Intl.DateTimeFormatPartTypes, string>> = {};
  for (const p of parts.formatToParts(d)) got[p.type] = p.value;
  return { day: got.day!, month: got.month!, year: got.year!, time: `${got.hour}:${got.minute}` };
}

export type DateInput = Date | string | number;

/**
 * A Date, an ISO timestamp or a calendar day ("2026-03-14", read as that day, not
 * as midnight somewhere else).
 */
export function toDate(value: DateInput): Date {
  if (value instanceof Date) return value;
  if (typeof value === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(value)) return new Date(`${value}T00:00:00Z`);
  return new Date(value);
}

/** "3 Dec 2026" ('' for a date that does not parse, never "Invalid Date"). */
export function formatDate(value: DateInput): string {
  const d = toDate(value);
  if (Number.isNaN(d.getTime())) return '';
  const p = pieces(d);
  return `${p.day} ${p.month} ${p.year}`;
}

/** "3 Dec 2026, 14:05 UTC": where the hour matters (audit log, outbox, moderation). */
export function formatDateTime(value: DateInput): string {
  const d = toDate(value);
  return Number.isNaN(d.getTime()) ? '' : `${formatDate(d)}, ${pieces(d).time} UTC`;
}

/** "Dec 2026": member since. */
export function formatMonth(value: DateInput): string {
  const d = toDate(value);
  if (Number.isNaN(d.getTime())) return '';
  const p = pieces(d);
  return `${p.month} ${p.year}`;
}

/** The calendar day as stored and sent ("2026-12-03"), for a <time dateTime> or a date input. */
export function isoDay(value: DateInput): string {
  return toDate(value).toISOString().slice(0, 10);
}
