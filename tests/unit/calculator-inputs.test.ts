import { describe, expect, it } from 'vitest';
import { CALCULATORS, computeFromForm, type Recomputed } from '@/lib/calculators';
import {
  checkDrivePipe,
  planDemandAndStorage,
  resolvePipe,
  toSI,
  type DemandAndStorageResults,
  type DrivePipeCheckResults,
} from '@/lib/hydraulics';

function ok<R>(r: Recomputed): R {
  if (!r.ok) throw new Error(`refused: ${r.message}`);
  return r.output.results as R;
}

const rowLabels = (id: keyof typeof CALCULATORS, results: unknown) =>
  CALCULATORS[id].rows(results as never).map((row) => row.label);

describe('drive pipe check: fittings, closure time, joints, beats per minute', () => {
  const dpc = (form: Record<string, string>) => ok<DrivePipeCheckResults>(computeFromForm('drive-pipe-check', form));

  it('recomputes a form saved before the new inputs exactly as the engine does with its own defaults', () => {
    const p = resolvePipe('pvc-sch40', '1/2');
    const engine = checkDrivePipe({
      fallM: toSI(4, 'ft', 'length'),
      drivePipe: {
        lengthM: toSI(24, 'ft', 'length'),
        insideDiameterM: p.insideDiameterM,
        wallThicknessM: p.wallThicknessM,
        pressureRatingPa: p.pressureRatingPa,
        material: 'pvc',
      },
    }).results;
    const form = dpc({ fall: '4 ft', length: '24 ft', size: '1/2', material: 'pvc-sch40' });
    // same engine, same input: equal to rounding (common practice, no source)
    expect(form.peakPressurePa).toBeCloseTo(engine.peakPressurePa, 6);
    expect(form.shutOffPressurePa).toBeCloseTo(engine.shutOffPressurePa, 6);
    expect(form.fatigue?.yearsToFailure).toBeCloseTo(engine.fatigue?.yearsToFailure ?? NaN, 9);
    expect(form.weakestRatingPa).toBe(engine.pressureRatingPa);
  });

  it('shows the shut-off pressure, the weakest rating, its margin and the fatigue life', () => {
    const r = dpc({});
    expect(rowLabels('drive-pipe-check', r)).toEqual(
      expect.arrayContaining([
        'Shut-off pressure (delivery closed)',
        'Weakest rating (the pipe)',
        'Weakest rating ÷ shut-off pressure',
        'Fatigue life at 60 beats a minute (PVC)',
      ]),
    );
    // margin is the rating over the shut-off pressure (definition)
    expect(r.shutOffMargin).toBeCloseTo(r.weakestRatingPa / r.shutOffPressurePa, 9);
  });

  it('rates threaded schedule 80 PVC at half the pipe and refuses threaded schedule 40', () => {
    const plain = dpc({ material: 'pvc-sch80' });
    const threaded = dpc({ material: 'pvc-sch80', joints: 'threaded' });
    // threaded sch 80 PVC at half its plain rating: a PVC pipe manufacturer's threaded-pipe table (from memory)
    expect(threaded.weakestRatingPa).toBeCloseTo(plain.pressureRatingPa / 2, 3);
    expect(threaded.weakestIs).toBe('threaded joint');
    expect(rowLabels('drive-pipe-check', threaded)).toContain('Weakest rating (threaded joints)');
    const sch40 = computeFromForm('drive-pipe-check', { joints: 'threaded' });
    expect(sch40.ok && sch40.output.warnings.map((w) => w.code)).toContain('threaded-joint-refused');
  });

  it('counts the elbows and the valve on the drive pipe in its losses', () => {
    const none = dpc({});
    const fitted = dpc({ elbows: '2', valve: 'gate' });
    expect(fitted.fullFlowVelocityMs).toBeLessThan(none.fullFlowVelocityMs);
    const input = CALCULATORS['drive-pipe-check'].toInput?.({
      elbows: 2,
      valve: 'gate',
      drivePipe: { lengthM: 7, nominal: '1/2', series: 'pvc-sch40' },
    }) as { drivePipe: { fittings: { kind: string; count: number }[] } };
    expect(input.drivePipe.fittings).toEqual([
      { kind: 'elbow-90-threaded', count: 2 },
      { kind: 'gate-valve-open', count: 1 },
    ]);
  });

  it('uses the closure time: slower than 2L/c gives Michaud’s 2ρLv/t', () => {
    const r = dpc({ closureTime: '0.5 s' });
    const sudden = dpc({});
    // Michaud (1878), as in Wylie & Streeter, Fluid Transients in Systems (1993): Δp = 2ρLv₀/t_c for t_c > 2L/c
    const rho = r.staticPressurePa / (9.80665 * toSI(4, 'ft', 'length'));
    expect(r.surgePa).toBeCloseTo((2 * rho * toSI(24, 'ft', 'length') * r.fullFlowVelocityMs) / 0.5, 0);
    expect(r.surgePa).toBeLessThan(sudden.surgePa);
  });

  it('the fatigue life falls in proportion to the beat rate', () => {
    const at60 = dpc({});
    const at120 = dpc({ bpm: '120' });
    // the same peak gives the same cycles to failure (Vinson's curve); years = cycles / (beats a year): arithmetic
    expect(at120.fatigue?.cyclesToFailure).toBeCloseTo(at60.fatigue?.cyclesToFailure ?? NaN, 0);
    expect(at120.fatigue?.yearsToFailure).toBeCloseTo((at60.fatigue?.yearsToFailure ?? NaN) / 2, 6);
  });
});

describe('demand and storage: rates per person, per head and the garden depth', () => {
  const demand = (form: Record<string, string>) =>
    ok<DemandAndStorageResults>(computeFromForm('demand-and-storage', form));

  it('keeps the engine’s 80 US gal a person, 1 inch a week and table rates by default', () => {
    const r = demand({ people: '2', sheep: '10', chickens: '12', garden: '200 ft2' });
    const engine = planDemandAndStorage({
      deliveredFlowM3s: 0.8 / 86_400,
      people: 2,
      gardenAreaM2: toSI(200, 'ft^2', 'area'),
      livestock: [
        { kind: 'sheep', count: 10 },
        // 12 birds at 12/100 of the per-100 rate, as the form has always sent them
        { kind: 'chickens-per-100', count: 1, perHeadM3PerDay: (toSI(9, 'gal', 'volume') * 12) / 100 },
      ],
    }).results;
    // same engine, same input (common practice, no source)
    expect(r.totalDemandM3PerDay).toBeCloseTo(engine.totalDemandM3PerDay, 9);
    // 80 US gal a person a day (USGS Circular 1441, from memory); 1 US gal = 3.785411784 L (NIST Handbook 44)
    expect(r.householdM3PerDay).toBeCloseTo(2 * 80 * 0.003785411784, 9);
  });

  it('takes a frugal rate per person, a garden depth and a rate per head', () => {
    const r = demand({
      people: '2',
      perPerson: '100 L/day',
      garden: '70 m2',
      gardenDepth: '50 mm',
      sheep: '10',
      sheepRate: '10 L/day',
    });
    // 2 × 100 L: arithmetic on the reader's own rate
    expect(r.householdM3PerDay).toBeCloseTo(0.2, 9);
    // 70 m² × 50 mm a week ÷ 7 days = 0.5 m³/day: arithmetic
    expect(r.gardenM3PerDay).toBeCloseTo(0.5, 9);
    // 10 sheep × 10 L: arithmetic
    expect(r.livestockM3PerDay).toBeCloseTo(0.1, 9);
  });

  it('asks the rate only for stock the reader keeps', () => {
    const def = CALCULATORS['demand-and-storage'];
    const state = { 'animal.sheep': { text: '3' }, 'animal.goats': { text: '0' } };
    expect(def.visible?.('rate.sheep', state)).toBe(true);
    expect(def.visible?.('rate.goats', state)).toBe(false);
    expect(def.visible?.('people', state)).toBe(true);
  });
});
