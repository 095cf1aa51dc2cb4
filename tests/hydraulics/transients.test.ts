import { describe, expect, it } from 'vitest';
import {
  joukowskyHead,
  joukowskySurge,
  resolvePipe,
  slowClosureSurge,
  waterProperties,
  waveRoundTrip,
  waveSpeed,
} from '@/lib/hydraulics';

const w = waterProperties(20);

describe('Korteweg wave speed', () => {
  it('rigid pipe tends to the speed of sound in water', () => {
    // Wylie & Streeter, Fluid Transients in Systems (1993), §2.4: c → √(K/ρ) ≈ 1,480 m/s as E → ∞ (from memory)
    expect(waveSpeed(w.bulkModulusPa, w.densityKgM3, 0.05, 1e20, 0.005)).toBeCloseTo(1481, 0);
  });
  it('steel pipe ≈ 1,200–1,400 m/s', () => {
    // Wylie & Streeter (1993): water in steel pipe typically 1,200–1,400 m/s (from memory); 1" sch 40 is thick-walled, so near the top
    const p = resolvePipe('steel-sch40', '1');
    const c = waveSpeed(w.bulkModulusPa, w.densityKgM3, p.insideDiameterM, 200e9, p.wallThicknessM);
    expect(c).toBeGreaterThan(1200);
    expect(c).toBeLessThan(1450);
    // thin-walled steel main: D/e = 100 → c = 1481/√(1 + 2.19·100/200) ≈ 1023 m/s (arithmetic on Korteweg's formula)
    expect(waveSpeed(w.bulkModulusPa, w.densityKgM3, 1, 200e9, 0.01)).toBeCloseTo(1023, 0);
  });
  it('PVC pipe ≈ 300–500 m/s for thinner walls', () => {
    // Wylie & Streeter (1993): PVC ≈ 300–500 m/s (from memory). 4" sch 40 (D/e = 17) lands in the band;
    // thick-walled small sizes run faster (1" sch 40, D/e = 7.9, gives ≈ 550 m/s).
    const p4 = resolvePipe('pvc-sch40', '4');
    const c4 = waveSpeed(w.bulkModulusPa, w.densityKgM3, p4.insideDiameterM, 2.76e9, p4.wallThicknessM);
    expect(c4).toBeGreaterThan(300);
    expect(c4).toBeLessThan(500);
  });
});

describe('Joukowsky surge', () => {
  it('Δp = ρ c Δv', () => {
    // Joukowsky (1900); the rule of thumb "about 10 bar per m/s in a 1000 m/s pipe" (common practice, no source)
    expect(joukowskySurge(998.2, 1000, 1)).toBeCloseTo(998200, 6);
    expect(joukowskySurge(998.2, 1000, 1) / 1e5).toBeCloseTo(10, 0);
    // as head: Δh = cΔv/g = 1000/9.80665 = 101.97 m (arithmetic)
    expect(joukowskyHead(1000, 1)).toBeCloseTo(101.97, 2);
  });
  it('slow closure gives less (Michaud)', () => {
    // Wylie & Streeter (1993), §1.2: for t_c > 2L/c, Δp ≈ 2ρLΔv/t_c (from memory)
    expect(waveRoundTrip(6.1, 550)).toBeCloseTo(0.02218, 5);
    expect(slowClosureSurge(998.2, 6.1, 1, 0.05, 550)).toBeCloseTo((2 * 998.2 * 6.1) / 0.05, 6);
    expect(slowClosureSurge(998.2, 6.1, 1, 0.01, 550)).toBeCloseTo(joukowskySurge(998.2, 550, 1), 6);
  });
});
