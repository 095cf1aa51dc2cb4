import { describe, expect, it } from 'vitest';
import {
  DRIVE_PIPE_GUIDES,
  EngineInputError,
  checkDrivePipe,
  resolvePipe,
  toSI,
  waterProperties,
} from '@/lib/hydraulics';
import { FALL, LIFT, drivePipe, ft } from './fixtures';

describe('drive pipe check', () => {
  const r = checkDrivePipe({ fallM: FALL, liftM: LIFT, drivePipe: drivePipe('1') });
  it('length against fall and bore', () => {
    // arithmetic: 20 ft / 4 ft = 5; 6.096 m / 0.026645 m = 228.8
    expect(r.results.lengthToFall).toBeCloseTo(5, 12);
    expect(r.results.lengthToDiameter).toBeCloseTo(228.8, 1);
    expect(r.results.guides.every((g) => g.within)).toBe(true);
  });
  it('applies one length rule, L/H 5–10, and says where it comes from', () => {
    // settled: L/H 5–10 (common practice, no published source found; was 3–12 and 5–12 side by side, from memory),
    // L/D 150–1000 (Calvert, from memory)
    expect(DRIVE_PIPE_GUIDES.map((g) => [g.min, g.max])).toEqual([
      [5, 10],
      [150, 1000],
    ]);
    const long = checkDrivePipe({ fallM: FALL, drivePipe: { ...drivePipe('1'), lengthM: ft(44) } }); // 11 H
    const w = long.warnings.find((x) => x.code === 'drive-length-long-for-fall');
    expect(w!.message).toMatch(/5–10 times the fall \(common practice, no published source found\)/);
  });
  it('wave speed, surge and round trip follow Korteweg and Joukowsky', () => {
    const w = waterProperties(10);
    const p = resolvePipe('pvc-sch40', '1');
    // Korteweg, as in Wylie & Streeter (1993): c = √((K/ρ)/(1 + KD/(Ee))) with E = 2.76 GPa (ASTM D1784, from memory)
    const c = Math.sqrt(
      w.bulkModulusPa / w.densityKgM3 / (1 + (w.bulkModulusPa * p.insideDiameterM) / (2.76e9 * p.wallThicknessM)),
    );
    expect(r.results.waveSpeedMs).toBeCloseTo(c, 9);
    expect(c).toBeGreaterThan(500); // thick-walled 1" sch 40 PVC, ≈ 548 m/s
    // Joukowsky (1900): Δp = ρ·c·v₀
    expect(r.results.surgePa).toBeCloseTo(w.densityKgM3 * c * r.results.fullFlowVelocityMs, 6);
    expect(r.results.roundTripS).toBeCloseTo((2 * ft(20)) / c, 12);
    expect(r.results.peakPressurePa).toBeCloseTo(r.results.staticPressurePa + r.results.surgePa, 6);
    // 1" sch 40 PVC is rated 450 psi (ASTM D1785, from memory)
    expect(r.results.ratingMargin).toBeCloseTo(toSI(450, 'psi', 'pressure') / r.results.peakPressurePa, 9);
  });
  it('warns when the surge exceeds the rating, deferring to codes and professionals', () => {
    const weak = checkDrivePipe({
      fallM: 20,
      drivePipe: { ...drivePipe('1'), lengthM: 100, pressureRatingPa: toSI(100, 'psi', 'pressure') },
    });
    const w = weak.warnings.find((x) => x.code === 'surge-exceeds-rating');
    expect(w).toBeDefined();
    expect(w!.severity).toBe('danger');
    expect(w!.message).toMatch(/local codes/);
    expect(w!.message).toMatch(/licensed plumber or engineer/);
  });
  it('flags flexible pipe', () => {
    const hd = checkDrivePipe({ fallM: FALL, drivePipe: drivePipe('1', 'hdpe-dr11') });
    expect(hd.results.rigid).toBe(false);
    expect(hd.results.waveSpeedMs).toBeLessThan(400);
    expect(hd.warnings.map((w) => w.code)).toContain('flexible-drive-pipe');
  });
  it('needs wall and rating', () => {
    const noWall: Record<string, unknown> = { ...drivePipe('1') };
    delete noWall.wallThicknessM;
    expect(() => checkDrivePipe({ fallM: FALL, drivePipe: noWall as never })).toThrow(EngineInputError);
  });
});

describe('drive pipe under a ram: shut-off pressure, joints and fatigue', () => {
  const r = checkDrivePipe({ fallM: FALL, drivePipe: drivePipe('1') });
  it('the shut-off pressure is the fall plus the surge at closure (Joukowsky 1900, as in Wylie & Streeter 1993)', () => {
    expect(r.results.shutOffPressurePa).toBeCloseTo(r.results.staticPressurePa + r.results.surgePa, 6);
    const slower = checkDrivePipe({
      fallM: FALL,
      drivePipe: drivePipe('1'),
      closureVelocityMs: r.results.fullFlowVelocityMs / 2,
    });
    expect(slower.results.shutOffPressurePa - slower.results.staticPressurePa).toBeCloseTo(r.results.surgePa / 2, 3);
  });
  it('refuses threaded schedule 40 PVC and halves threaded schedule 80', () => {
    // a PVC pipe manufacturer's threaded-pipe table: "threading of PVC Schedule 40 … is not recommended";
    // 1" sch 80: 630 psi plain (ASTM D1785 appendix, from memory) → 315 psi threaded
    const t40 = checkDrivePipe({ fallM: FALL, drivePipe: drivePipe('1'), series: 'pvc-sch40', joints: 'threaded' });
    expect(t40.results.joint!.allowed).toBe(false);
    const w = t40.warnings.find((x) => x.code === 'threaded-joint-refused');
    expect(w!.severity).toBe('danger');
    const t80 = checkDrivePipe({
      fallM: FALL,
      drivePipe: drivePipe('1', 'pvc-sch80'),
      series: 'pvc-sch80',
      joints: 'threaded',
    });
    expect(t80.results.weakestIs).toBe('threaded joint');
    expect(t80.results.weakestRatingPa).toBeCloseTo(toSI(315, 'psi', 'pressure'), 3);
    expect(t80.results.shutOffMargin).toBeCloseTo(t80.results.weakestRatingPa / t80.results.shutOffPressurePa, 12);
  });
  it('warns when the shut-off pressure is above the weakest rating', () => {
    const weak = checkDrivePipe({
      fallM: FALL,
      drivePipe: { ...drivePipe('1'), pressureRatingPa: toSI(100, 'psi', 'pressure') },
    });
    expect(weak.warnings.map((x) => x.code)).toContain('shut-off-exceeds-rating');
  });
  it('gives the cyclic life of a PVC drive pipe by Vinson’s equation', () => {
    // Vinson's N = 5.05e21 × S^−4.906 (S peak hoop stress, psi): Moser & Folkman, Buried Pipe Design, 3rd ed.
    // (2008), Eq. 4.17. S = p(DR − 1)/2 with DR = OD/wall = 1.315/0.133 (ASTM D1785 sch 40, from memory)
    const p = resolvePipe('pvc-sch40', '1');
    const dr = p.outsideDiameterM / p.wallThicknessM;
    const sPsi = (r.results.shutOffPressurePa * (dr - 1)) / 2 / 6894.757;
    expect(r.results.fatigue!.hoopStressPa / 6894.757).toBeCloseTo(sPsi, 6);
    expect(r.results.fatigue!.cyclesToFailure).toBeCloseTo(5.05e21 * sPsi ** -4.906, -3);
    // 60 beats a minute (the engine's default, common practice) × 525 960 min a year
    expect(r.results.fatigue!.yearsToFailure).toBeCloseTo(r.results.fatigue!.cyclesToFailure / (60 * 525_960), 9);
    expect(r.warnings.map((x) => x.code)).toContain('fatigue-life-short'); // ≈ 5 years < 50
    // steel is not PVC: no Vinson figure
    expect(checkDrivePipe({ fallM: FALL, drivePipe: drivePipe('1', 'steel-sch40') }).results.fatigue).toBeUndefined();
  });
});
