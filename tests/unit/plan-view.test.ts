/** The site plan as a reader reads it: the parts list in their units, as CSV, and the design's lines. */
import { describe, expect, it } from 'vitest';
import { toSI, type PartsListItem } from '@/lib/hydraulics';
import { partRows, partsCsv } from '@/lib/plan/parts';
import { designSections } from '@/lib/plan/design';
import { computeForm, formatMessage, initialState } from '@/lib/calculators';
import { sitePlanner } from '@/lib/calculators/defs/sitePlan';
import { wrongUnits } from '../support/unit-words';

const pipe: PartsListItem = {
  group: 'delivery',
  kind: 'pipe',
  name: 'delivery line',
  quantity: 1,
  nominal: '3/4',
  series: 'hdpe-dr11',
  lengthM: toSI(165, 'ft', 'length'),
};
const tank: PartsListItem = {
  group: 'storage',
  kind: 'tank',
  name: 'storage tank, for 3 days',
  quantity: 1,
  volumeM3: toSI(500, 'gal', 'volume'),
};

describe('parts list rows', () => {
  it('a pipe’s length and a tank’s volume in the reader’s units', () => {
    const us = partRows([pipe, tank], 'US');
    // 165 ft and 500 US gal as typed (NIST SP 811, 2008 conversions round-trip)
    expect(us[0]).toMatchObject({ group: 'Delivery line', size: '¾" HDPE, DR 11', amount: '165 ft long' });
    expect(us[1].amount).toBe('500 US gal');
    const metric = partRows([pipe, tank], 'metric');
    // 165 ft × 0.3048 = 50.29 m; 500 US gal × 3.785411784 L = 1,892.7 L (NIST SP 811, 2008)
    expect(metric[0].amount).toBe('50.3 m long');
    expect(metric[1].amount).toBe('1,890 L');
  });

  it('CSV: a header, one line a part, a comma inside a cell quoted (RFC 4180)', () => {
    const csv = partsCsv(partRows([pipe, tank], 'US'));
    const lines = csv.trimEnd().split('\r\n');
    expect(lines[0]).toBe('part of,what,size,quantity,amount,note');
    expect(lines).toHaveLength(3);
    expect(lines[2]).toBe('Storage,"storage tank, for 3 days",,1,500 US gal,');
  });

  it('a cell a spreadsheet would run as a formula is written as text', () => {
    const csv = partsCsv([{ group: 'Pump', what: '=HYPERLINK("x")', size: '', quantity: 1, amount: '', note: '' }]);
    expect(csv.split('\r\n')[1].startsWith(`Pump,"'=HYPERLINK(""x"")"`)).toBe(true);
  });
});

describe('the default plan, read by each reader', () => {
  for (const units of ['US', 'metric'] as const) {
    it(`${units}: every design line and part in ${units} units, no e-notation`, () => {
      const state = initialState(sitePlanner.fields, {}, sitePlanner.defaults, units);
      const out = computeForm(sitePlanner, state, units);
      if (!out.ok) throw new Error(JSON.stringify(out));
      const text = [
        ...designSections(out.output.results, units).flatMap((s) => s.lines.map((l) => `${l.label} ${l.value}`)),
        ...designSections(out.output.results, units).flatMap((s) => s.notes),
        ...partRows(out.output.results.parts, units).map((r) => `${r.what} ${r.size} ${r.amount} ${r.note}`),
        ...out.output.warnings.map((w) => formatMessage(w, units)),
      ];
      expect(text.flatMap((t) => wrongUnits(t, units))).toEqual([]);
    });
  }
});
