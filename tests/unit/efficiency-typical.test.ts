import { describe, expect, it } from 'vitest';
import { CALCULATORS, computeForm, initialState, percentWords, typicalEfficiency } from '@/lib/calculators';

const def = CALCULATORS['yield-estimate'];
const open = (props: Record<string, string> = {}) => initialState(def.fields, props, def.defaults, 'US');

describe('the yield estimate’s efficiency opens on the typical value for the site', () => {
  it('opens empty, so the first answer uses the typical efficiency, not a hopeful one', () => {
    const state = open();
    expect(state.efficiency?.text ?? '').toBe('');
    const out = computeForm(def, state, 'US');
    if (!out.ok) throw new Error('the defaults should compute');
    expect(out.output.results.efficiencySource).toBe('typical');
    // Building Trades Pocketbook table at h/H = 7.25: 0.61 + (0.52 − 0.61)·0.625 = 0.5538, × 0.33/0.66 for a
    // home-built ram (Water for the World, technical note RWS.4.D.5): 0.2769
    expect(out.output.results.efficiencyUsed).toBeCloseTo(0.2769, 3);
  });

  it('names the typical value and its band for the form’s own site', () => {
    const t = typicalEfficiency(def, open(), 'US');
    expect(t?.field).toBe('efficiency');
    expect(t?.typical).toBeCloseTo(0.2769, 3); // as above: Pocketbook × 0.33/0.66
    // band: low half the home-built typical (common practice, no source), high the Pocketbook's own 0.5538
    expect(t?.low).toBeCloseTo(0.1385, 3);
    expect(t?.high).toBeCloseTo(0.5538, 3);
    // the top of the band is well above what the box stands for
    expect(t!.high).toBeGreaterThan(t!.typical * 1.5);
  });

  it('still gives the typical value when the reader typed their own, and follows the lift', () => {
    const typed = { ...open(), efficiency: { text: '60 %' } };
    expect(typicalEfficiency(def, typed, 'US')?.typical).toBeCloseTo(0.2769, 3); // as above
    const higher = { ...open(), liftM: { text: '58', unit: 'ft' } };
    // h/H = 14.5: efficiency falls as the lift ratio grows (Building Trades Pocketbook table)
    expect(typicalEfficiency(def, higher, 'US')!.typical).toBeLessThan(0.2769);
  });

  it('writes the typical value as the result row writes the efficiency used, and a band’s ends whole', () => {
    expect(percentWords(0.2769)).toBe('27.7 %'); // three figures, as lib/calculators/format.ts formatNumber (common practice, no source)
    expect(percentWords(0.1385, true)).toBe('14 %'); // the band row's whole percent (common practice, no source)
  });

  it('gives nothing while the site does not compute', () => {
    expect(typicalEfficiency(def, { ...open(), fallM: { text: '', unit: 'ft' } }, 'US')).toBeNull();
  });
});
