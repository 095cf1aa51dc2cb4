import { describe, expect, it } from 'vitest';
import { formatDate, formatDateTime, formatMonth, isoDay } from '@/lib/dates';

// Expected strings are the house format chosen in lib/dates.ts (day, short month, year, 24-hour UTC):
// common practice, no source.
describe('one date format', () => {
  it('writes a day as "3 Sep 2026", whatever form it arrives in', () => {
    expect(formatDate(new Date('2026-09-03T12:00:00Z'))).toBe('3 Sep 2026');
    expect(formatDate('2026-09-03T23:30:00Z')).toBe('3 Sep 2026');
    expect(formatDate(Date.UTC(2026, 8, 3))).toBe('3 Sep 2026');
  });

  it('reads a calendar day as that day in UTC, not the day before somewhere west', () => {
    expect(formatDate('2026-01-01')).toBe('1 Jan 2026');
    expect(isoDay('2026-01-01')).toBe('2026-01-01');
  });

  it('gives times on a 24-hour clock in UTC, midnight as 00', () => {
    expect(formatDateTime('2026-12-03T00:05:00Z')).toBe('3 Dec 2026, 00:05 UTC');
    expect(formatDateTime('2026-12-03T14:05:59Z')).toBe('3 Dec 2026, 14:05 UTC');
  });

  it('writes a month as "Dec 2026"', () => {
    expect(formatMonth('2026-12-31T23:59:00Z')).toBe('Dec 2026');
  });

  it('prints nothing rather than "Invalid Date"', () => {
    expect(formatDate('not a date')).toBe('');
    expect(formatDateTime('')).toBe('');
  });
});

describe('dates are written only through lib/dates.ts', () => {
  it('no page, component or lib module formats a date by itself', async () => {
    const { readFile, readdir } = await import('node:fs/promises');
    const path = await import('node:path');
    const root = path.resolve(__dirname, '../..');
    const own = /toLocaleDateString|toLocaleTimeString|Intl\.DateTimeFormat|toUTCString|toISOString\(\)\.slice/;
    const offenders: string[] = [];
    for (const dir of ['app', 'components', 'lib']) {
      for (const entry of await readdir(path.join(root, dir), { recursive: true, withFileTypes: true })) {
        if (!entry.isFile() || !/\.tsx?$/.test(entry.name)) continue;
        const file = path.join(entry.parentPath, entry.name);
        const rel = path.relative(root, file);
        // the helper itself; the digest's period keys are stored identifiers, not shown
        if (rel === path.join('lib', 'dates.ts') || rel === path.join('lib', 'mail', 'digest.ts')) continue;
        if (own.test(await readFile(file, 'utf8'))) offenders.push(rel);
      }
    }
    expect(offenders).toEqual([]);
  });
});
