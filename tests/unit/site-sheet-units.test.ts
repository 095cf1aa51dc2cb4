/** A site sheet filled from a field log entry is typed in the asker's units. */
import { describe, expect, it } from 'vitest';
import { entrySiteSheet } from '@/lib/calculators/site-sheet';

// the demo's invented site (1.5 m of fall, 16.6 m of lift, 90 m of delivery line)
const entry = {
  fallM: 1.5,
  liftM: 16.6,
  driveLengthM: 9,
  driveSize: '1-1/4',
  driveMaterial: 'pvc',
  pumpSize: '1',
  pumpCount: 1,
  driveFlowM3s: 20 / 60_000,
  deliveredFlowM3s: 0.9 / 60_000,
  beatsPerMinute: 55,
  deliveryLengthM: 90,
  deliverySize: '3/4',
  deliveryMaterial: 'pvc',
};

describe('entrySiteSheet', () => {
  it('types feet and gallons a minute for a US asker', () => {
    const s = entrySiteSheet(entry, 'US');
    // converted with NIST SP 811 (2008), then rounded as a tape or a bucket gives it: feet to 0.1 ft under
    // 10 ft and whole feet above, flows to two significant figures under 10 (common practice, no source)
    expect(s.fall).toBe('4.9 ft'); // 1.5 m ÷ 0.3048 = 4.921 ft
    expect(s.deliveryLength).toBe('295 ft'); // 90 m ÷ 0.3048 = 295.3 ft
    expect(s.driveFlow).toBe('5.3 gal/min'); // 20 L/min ÷ 3.785411784 = 5.283 gal/min
  });
  it('types metres and litres a minute for a metric asker', () => {
    const s = entrySiteSheet(entry, 'metric');
    expect(s.fall).toBe('1.5 m'); // as measured (the demo's invented site)
    expect(s.delivered).toBe('0.9 L/min'); // as measured (the demo's invented site)
  });
});
