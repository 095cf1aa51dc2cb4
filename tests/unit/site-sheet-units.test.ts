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
    expect(s.fall).toBe('4.921 ft'); // 1.5 m ÷ 0.3048 (NIST SP 811, 2008)
    expect(s.deliveryLength).toBe('295.3 ft'); // 90 m ÷ 0.3048 (NIST SP 811, 2008)
    expect(s.driveFlow).toBe('5.283 gal/min'); // 20 L/min ÷ 3.785411784 (NIST SP 811, 2008)
  });
  it('types metres and litres a minute for a metric asker', () => {
    const s = entrySiteSheet(entry, 'metric');
    expect(s.fall).toBe('1.5 m'); // as measured (the demo's invented site)
    expect(s.delivered).toBe('0.9 L/min'); // as measured (the demo's invented site)
  });
});
