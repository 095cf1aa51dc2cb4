import { describe, expect, it } from 'vitest';
import { siteGlance } from '@/lib/questions/site-glance';

/** The list's site line: the asker's sheet as typed, each number in the reader's units. */
const sheet = {
  fall: '4 ft',
  lift: '29 ft',
  driveLength: '24 ft',
  pumpSize: '1/2',
  pumps: '2',
  driveFlow: '2 gal/min',
  delivered: '850 mL/min',
  symptoms: 'weak-delivery,spits-air',
};
const values = (g: ReturnType<typeof siteGlance>) => Object.fromEntries(g!.numbers.map((n) => [n.key, n.value]));

describe('siteGlance', () => {
  it('shows fall, lift, flow, delivery and pumps in US units', () => {
    const g = siteGlance(sheet, 'US');
    expect(values(g)).toEqual({
      fall: '4 ft',
      lift: '29 ft',
      driveFlow: '2 US gal/min',
      // 0.85 L/min × 60 = 51 L/h; ÷ 3.785411784 L per US gal (NIST Handbook 44, appendix C: 1 US gal = 231 in³) = 13.47 US gal/h
      delivered: expect.stringMatching(/^(13\.5 US gal\/h|0\.225 US gal\/min)$/),
      pumpSize: '2 × ½"',
    });
    expect(g!.symptom).toBe('weak delivery, spits air');
    // the drive pipe's length is on the thread's site sheet, not the list's glance
    expect(g!.numbers.map((n) => n.key)).not.toContain('driveLength');
  });

  it('shows the same site in metric', () => {
    expect(values(siteGlance(sheet, 'metric'))).toEqual({
      // 4 ft × 0.3048 m (international yard and pound agreement, 1959) = 1.2192 m; 29 ft = 8.8392 m
      fall: '1.22 m',
      lift: '8.84 m',
      // 2 US gal/min × 3.785411784 L (NIST Handbook 44, appendix C: 1 US gal = 231 in³) = 7.571 L/min
      driveFlow: '7.57 L/min',
      // 850 mL/min = 51 L/h (arithmetic)
      delivered: expect.stringMatching(/^(51 L\/h|0\.85 L\/min)$/),
      pumpSize: '2 × ½"',
    });
  });

  it('prefers what the source can spare to the drive flow, and skips a value that no longer reads', () => {
    const g = siteGlance({ fall: '1.5 m', lift: 'about ten', sourceFlow: '40 L/min', driveFlow: '20 L/min' }, 'US');
    expect(values(g)).toEqual({
      // 1.5 m ÷ 0.3048 = 4.921 ft (international yard and pound agreement, 1959)
      fall: '4.92 ft',
      // 40 L/min ÷ 3.785411784 = 10.57 US gal/min (NIST Handbook 44, appendix C: 1 US gal = 231 in³)
      sourceFlow: '10.6 US gal/min',
    });
    expect(g!.symptom).toBeNull();
  });

  it('is nothing without a sheet', () => {
    expect(siteGlance(null, 'US')).toBeNull();
    expect(siteGlance({}, 'metric')).toBeNull();
  });
});
