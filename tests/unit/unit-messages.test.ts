import { describe, expect, it } from 'vitest';
import {
  CALCULATORS,
  computeForm,
  computeFromForm,
  formatMessage,
  initialState,
  type Calculator,
  type FormState,
} from '@/lib/calculators';

/** The card's outcome for a form typed as given, for a reader in `units`. */
function card(id: keyof typeof CALCULATORS, typed: Record<string, string>, units: 'US' | 'metric') {
  const def: Calculator = CALCULATORS[id];
  const state: FormState = initialState(def.fields, typed, def.defaults, units, 'none');
  return computeForm(def, state, units);
}

describe('engine warnings in the reader’s units', () => {
  it('the flexible drive pipe’s wave speeds read in ft/s for a US reader, m/s for a metric one', () => {
    const out = computeFromForm('drive-pipe-check', { material: 'hdpe-dr11' });
    if (!out.ok) throw new Error(out.message);
    const w = out.output.warnings.find((x) => x.code === 'flexible-drive-pipe');
    expect(w).toBeDefined();
    const us = formatMessage(w!, 'US');
    expect(us).toMatch(/\d ft\/s instead of about [\d,]+ ft\/s/);
    expect(us).not.toMatch(/m\/s/);
    expect(formatMessage(w!, 'metric')).toMatch(/\d m\/s instead of about [\d,]+ m\/s/);
  });

  it('demand and storage speaks US gallons a day to a US reader', () => {
    // 10 people at the default 80 US gal each (USGS, from memory) against 800 L/day: demand exceeds delivery
    const out = card('demand-and-storage', { people: '10', delivery: '800 L/day' }, 'US');
    if (!out.ok) throw new Error('refused');
    const w = out.output.warnings.find((x) => x.code === 'demand-exceeds-delivery');
    // 800 L/day = 211 US gal/day (1 US gal = 3.785411784 L, NIST Handbook 44 App. C); 10 × 80 = 800 US gal/day
    expect(formatMessage(w!, 'US')).toBe(
      'The demand of 800 US gal/day is more than the 211 US gal/day the ram delivers; add a pump, find more fall or trim the demand.',
    );
    expect(w!.message).toMatch(/^The demand of 3,030 L\/day is more than the 800 L\/day/);
  });

  it('a safety warning keeps its deferral sentence in either system', () => {
    const out = computeFromForm('drive-pipe-check', { material: 'hdpe-dr11' });
    if (!out.ok) throw new Error(out.message);
    const w = out.output.warnings.find((x) => x.code === 'flexible-drive-pipe')!;
    expect(formatMessage(w, 'US').endsWith(w.message.slice(-40))).toBe(true);
  });
});

describe('input errors in the reader’s units', () => {
  it('a fall past the engine’s 100 m says so in feet to a US reader', () => {
    const out = card('yield-estimate', { fall: '400 ft', lift: '900 ft' }, 'US');
    expect(out.ok).toBe(false);
    // 100 m = 328.08 ft (1 ft = 0.3048 m, NIST SP 811, 2008), three figures
    if (!out.ok) expect(out.fieldErrors.fallM).toBe('must be a number greater than 0 ft and at most 328 ft');
    const metric = card('yield-estimate', { fall: '400 ft', lift: '900 ft' }, 'metric');
    if (!metric.ok) expect(metric.fieldErrors.fallM).toBe('must be a number greater than 0 m and at most 100 m');
  });

  it('a lift under the fall names the fall in the reader’s units', () => {
    const out = card('yield-estimate', { fall: '4 ft', lift: '3 ft' }, 'US');
    // 4 ft typed, read back through SI: 1.2192 m = 4 ft exactly (NIST SP 811)
    if (!out.ok) expect(out.fieldErrors.liftM).toMatch(/^must be greater than the fall \(4 ft\)/);
    else throw new Error('lift under the fall was accepted');
  });

  it('the engine’s own message, for callers with no reader, stays metric', () => {
    const out = card('yield-estimate', { fall: '4 ft', lift: '3 ft' }, 'US');
    const def: Calculator = CALCULATORS['yield-estimate'];
    const plain = computeForm(
      def,
      initialState(def.fields, { fall: '4 ft', lift: '3 ft' }, def.defaults, 'US', 'none'),
    );
    expect(out.ok || plain.ok).toBe(false);
    // 4 ft = 1.2192 m (NIST SP 811), three figures
    if (!plain.ok) expect(plain.fieldErrors.liftM).toMatch(/^must be greater than the fall \(1\.22 m\)/);
  });
});
