import { describe, expect, it } from 'vitest';
import { fromSI, measureSourceFlow, toSI, vNotch90Usbr, vNotchFlow, weirCoefficients } from '@/lib/hydraulics';

const ft = (x: number) => toSI(x, 'ft', 'length');
const cfs = (m3s: number) => fromSI(m3s, 'ft^3/s', 'flow');

describe('V-notch weirs (USBR Water Measurement Manual, ch. 7)', () => {
  it('90° Kindsvater-Shen with Ce = 0.578, kh = 0.0029 ft', () => {
    // USBR WMM eq. 7-3 with the 90° coefficients quoted with the manual: Q = 4.28 × 0.578 × (h + 0.0029)^2.5
    expect(weirCoefficients(90)).toEqual({ ce: 0.578, khFt: 0.0029 });
    expect(cfs(vNotchFlow(ft(0.5), 90))).toBeCloseTo(4.28 * 0.578 * 0.5029 ** 2.5, 9);
  });
  it('agrees with the USBR 90° equation Q = 2.49 h^2.48', () => {
    // USBR WMM ch. 7: 90° V-notch Q = 2.49 h₁^2.48 (ft³/s, ft); at h = 1 ft, 2.49 ft³/s
    expect(cfs(vNotch90Usbr(ft(1)))).toBeCloseTo(2.49, 9);
    // both equations are fits to the same calibration; they agree within 1 % over 0.2–1.25 ft (USBR states comparable accuracy)
    for (const h of [0.2, 0.3, 0.5, 0.8, 1.0, 1.25]) {
      expect(Math.abs(vNotchFlow(ft(h), 90) / vNotch90Usbr(ft(h)) - 1)).toBeLessThan(0.01);
    }
  });
  it('other angles scale with tan(θ/2)', () => {
    // Kindsvater-Shen: at the same head a 60° notch passes ≈ tan 30°/tan 45° × Ce ratio of a 90° notch
    // (Ce 0.577 at 60°, read from USBR fig. 7-6 — from memory)
    const ratio = vNotchFlow(ft(0.5), 60) / vNotchFlow(ft(0.5), 90);
    expect(ratio).toBeGreaterThan(0.55);
    expect(ratio).toBeLessThan(0.6);
  });
  it('warns outside the head range', () => {
    const r = measureSourceFlow({ method: 'v-notch', notchHeadM: 0.03 });
    expect(r.warnings.map((w) => w.code)).toContain('weir-head-out-of-range');
  });
});

describe('bucket and stopwatch', () => {
  it('mean, sample standard deviation, min and max', () => {
    // a 5-US-gallon bucket (NIST SP 811: 5 × 3.785411784 L) filled in 12.0, 12.6 and 11.4 s;
    // sample statistics by the textbook definitions (n − 1 in the variance) — arithmetic check below
    const V = toSI(5, 'gal', 'volume');
    const times = [12, 12.6, 11.4];
    const r = measureSourceFlow({ method: 'bucket', trials: times.map((timeS) => ({ volumeM3: V, timeS })) });
    const q = times.map((t) => V / t);
    const mean = q.reduce((a, b) => a + b) / 3;
    const sd = Math.sqrt(q.reduce((a, b) => a + (b - mean) ** 2, 0) / 2);
    expect(r.results.flowM3s).toBeCloseTo(mean, 15);
    expect(r.results.stats!.sdM3s).toBeCloseTo(sd, 15);
    expect(r.results.stats!.minM3s).toBeCloseTo(V / 12.6, 15);
    expect(r.results.stats!.maxM3s).toBeCloseTo(V / 11.4, 15);
    expect(r.results.flowM3s * 1000).toBeCloseTo(1.58, 3); // L/s, worked example in the doc comment
  });
});

describe('float method', () => {
  it('Q = k·v·w·d with k = 0.85', () => {
    // USGS WSP 2175 (Rantz et al. 1982): mean velocity ≈ 0.85 × surface velocity (from memory)
    const r = measureSourceFlow({ method: 'float', distanceM: 5, timesS: [10, 10, 10], widthM: 1.2, meanDepthM: 0.15 });
    expect(r.results.flowM3s).toBeCloseTo(0.85 * 0.5 * 1.2 * 0.15, 12);
  });
});

describe('share of the stream', () => {
  it('always reminds that local rules decide diversions', () => {
    const r = measureSourceFlow({ method: 'bucket', trials: [{ volumeM3: 0.02, timeS: 10 }], plannedDrawM3s: 0.0015 });
    expect(r.results.planShare).toBeCloseTo(0.75, 12);
    const codes = r.warnings.map((w) => w.code);
    expect(codes).toContain('diversion-rules');
    expect(codes).toContain('plan-takes-large-share');
    expect(r.warnings.find((w) => w.code === 'diversion-rules')!.message).toMatch(/permit/);
  });
});
