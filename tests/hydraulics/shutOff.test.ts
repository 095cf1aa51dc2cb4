import { describe, expect, it } from 'vitest';
import {
  EngineInputError,
  estimateShutOffPressure,
  resolvePipe,
  shutOffPressure,
  waterProperties,
} from '@/lib/hydraulics';
import { drivePipe, ft } from './fixtures';

// Formulas: Joukowsky (1900) Δp = ρ·c·Δv for a closure within 2L/c, Michaud (1878) 2ρ·L·Δv/t_c for a slower one,
// as given in Wylie, Streeter & Suo, Fluid Transients in Systems (1993), ch. 1 (section from memory). No published
// worked example was found in the references searched: the numbers below are hand arithmetic with those formulas.
describe('shut-off (dead-head) pressure', () => {
  it('a steel drive pipe at ~1000 m/s: about 10 bar of surge per m/s, plus the fall', () => {
    // hand arithmetic: 1000 × 1000 × 1.5 = 1.5 MPa; fall 3 m: 1000 × 9.80665 × 3 = 29 420 Pa
    expect(shutOffPressure(1000, 3, 30, 1000, 1.5)).toBeCloseTo(1_529_420, 0);
    // a closure within 2L/c = 0.06 s is still sudden
    expect(shutOffPressure(1000, 3, 30, 1000, 1.5, 0.05)).toBeCloseTo(1_529_420, 0);
  });
  it('a slower closure gives Michaud’s smaller surge, never more than Joukowsky’s', () => {
    // hand arithmetic: 2 × 1000 × 30 × 1.5 / 0.3 = 300 000 Pa, + 29 420 Pa
    expect(shutOffPressure(1000, 3, 30, 1000, 1.5, 0.3)).toBeCloseTo(329_420, 0);
    // just past 2L/c Michaud's formula gives about ρcΔv again: 2ρLΔv/(2L/c) = ρcΔv
    expect(shutOffPressure(1000, 3, 30, 1000, 1.5, 0.0600001)).toBeCloseTo(1_529_420, -2);
  });
  it('the calculator uses the pipe’s own wave speed and says which closure applies', () => {
    const w = waterProperties(10);
    const p = resolvePipe('pvc-sch40', '1');
    const fast = estimateShutOffPressure({ fallM: ft(4), drivePipe: drivePipe('1'), closureVelocityMs: 1.2 });
    // Korteweg with E = 2.76 GPa (ASTM D1784, from memory) as in transients.test.ts: ≈ 548 m/s in 1" sch 40 PVC
    const c = Math.sqrt(
      w.bulkModulusPa / w.densityKgM3 / (1 + (w.bulkModulusPa * p.insideDiameterM) / (2.76e9 * p.wallThicknessM)),
    );
    expect(fast.results.waveSpeedMs).toBeCloseTo(c, 9);
    expect(fast.results.closure).toBe('sudden');
    expect(fast.results.shutOffPressurePa).toBeCloseTo(w.densityKgM3 * 9.80665 * ft(4) + w.densityKgM3 * c * 1.2, 6);
    const slow = estimateShutOffPressure({
      fallM: ft(4),
      drivePipe: drivePipe('1'),
      closureVelocityMs: 1.2,
      valveClosureTimeS: 0.1,
    });
    expect(slow.results.closure).toBe('slow');
    expect(slow.results.surgePa).toBeCloseTo((2 * w.densityKgM3 * ft(20) * 1.2) / 0.1, 6);
    expect(slow.results.shutOffPressurePa).toBeLessThan(fast.results.shutOffPressurePa);
  });
  it('without a velocity it takes the full-flow velocity, the most the pipe can make', () => {
    const worst = estimateShutOffPressure({ fallM: ft(4), drivePipe: drivePipe('1') });
    expect(worst.results.velocityFrom).toBe('full-flow');
    const half = estimateShutOffPressure({
      fallM: ft(4),
      drivePipe: drivePipe('1'),
      closureVelocityMs: worst.results.closureVelocityMs / 2,
    });
    expect(half.results.surgePa).toBeCloseTo(worst.results.surgePa / 2, 6); // Joukowsky is linear in Δv
  });
  it('needs the wall thickness', () => {
    const noWall: Record<string, unknown> = { ...drivePipe('1') };
    delete noWall.wallThicknessM;
    expect(() => estimateShutOffPressure({ fallM: 1, drivePipe: noWall as never })).toThrow(EngineInputError);
  });
});
