/**
 * The stall check against the demo threads' own diagnoses: for every fixed demo thread with a
 * site sheet, the cause its "what fixed it" line names must be among the stall check's first
 * three, read from the site sheet as the thread page reads it. The causes are the threads' own
 * words (invented demo data, DESIGN.md "Demo scenario"), mapped here by hand to a cause code.
 */
import { describe, expect, it } from 'vitest';
import { demoThreads } from '@/migrations/seed/demo-forum-data';
import { CALCULATORS, recompute } from '@/lib/calculators';
import { calculatorPropsFromSiteSheet } from '@/lib/calculators/site-sheet';
import type { StallCauseCode, StallCheckResults } from '@/lib/hydraulics';

/** Each fixed thread with a site sheet, by title: the cause its fix names, or why it is left out. */
const FIX_NAMES: Record<string, { cause: StallCauseCode } | { excluded: string }> = {
  'Second pump added, delivery only went up a little': {
    // "moved the pump … so the second drive pipe runs straight, no elbow"
    cause: 'fittings-in-drive-pipe',
  },
  'Pump bangs hard and the PVC fittings creak': {
    // "shortened the waste valve stroke …"
    cause: 'waste-valve-setting',
  },
  'Delivery valve clatters and the delivery is poor': {
    // "cleaned grit off the delivery valve seat and fitted a new rubber flap"
    cause: 'delivery-valve-or-snifter',
  },
  'Pump never starts after I moved it': {
    // "raised the pump so the waste valve outlet sits clear of the water"
    cause: 'flooded-waste-outlet',
  },
  'Delivery stopped during the cold snap': {
    // "thawed the exposed stretch of delivery line …"
    cause: 'frozen-line',
  },
  '1-inch pump stops every dry spell when the creek drops': {
    // "lowered the intake box 14 inches below the dry-week water level": the vortex drew air in
    cause: 'air-in-drive-pipe',
  },
};

const fixedWithSheet = demoThreads.filter((t) => t.fixed && t.siteSheet);

function stallCauses(sheet: Record<string, string>) {
  const props = calculatorPropsFromSiteSheet('stall-check', sheet);
  const r = recompute(CALCULATORS['stall-check'], props);
  if (!r.ok) throw new Error(`site sheet refused: ${r.field} ${r.message}`);
  return (r.output.results as StallCheckResults).causes.map((c) => c.code);
}

describe('stall check against the demo threads’ diagnoses', () => {
  it('knows every fixed demo thread that carries a site sheet', () => {
    expect(fixedWithSheet.length).toBeGreaterThan(0);
    expect(fixedWithSheet.map((t) => t.title).sort()).toEqual(Object.keys(FIX_NAMES).sort());
  });

  for (const t of fixedWithSheet) {
    const named = FIX_NAMES[t.title];
    if (!named || 'excluded' in named) continue;
    it(`puts “${named.cause}” in the first three for “${t.title}”`, () => {
      const codes = stallCauses(t.siteSheet!);
      expect(codes.slice(0, 3), `ranked: ${codes.join(', ')}`).toContain(named.cause);
    });
  }
});
