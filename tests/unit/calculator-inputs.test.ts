import { describe, expect, it } from 'vitest';
import { CALCULATORS, computeFromForm, type Recomputed } from '@/lib/calculators';
import { calculatorPropsFromSiteSheet } from '@/lib/calculators/site-sheet';
import {
  checkDrivePipe,
  planDemandAndStorage,
  resolvePipe,
  toSI,
  type ArrayPlannerResults,
  type DemandAndStorageResults,
  type DrivePipeCheckResults,
  type SourceFlowResults,
  type StallCheckResults,
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

describe('source flow: float coefficient, notch height and pool width', () => {
  const float = { method: 'float', distance: '10 ft', time: '8 s, 9 s', width: '3 ft', depth: '4 in' };

  it('the flow scales with the float coefficient, 0.85 unless given', () => {
    const byDefault = ok<SourceFlowResults>(computeFromForm('source-flow', float));
    const rough = ok<SourceFlowResults>(computeFromForm('source-flow', { ...float, floatK: '0.7' }));
    // Q = k·v_s·w·d (Rantz et al., USGS Water-Supply Paper 2175, 1982, from memory): Q scales with k
    expect(rough.flowM3s / byDefault.flowM3s).toBeCloseTo(0.7 / 0.85, 9);
  });

  it('warns when the pool behind a V-notch is too shallow or narrow', () => {
    const notch = { method: 'v-notch', head: '4 in' };
    const codes = (form: Record<string, string>) => {
      const r = computeFromForm('source-flow', form);
      return r.ok ? r.output.warnings.map((w) => w.code) : [r.message];
    };
    expect(codes(notch)).not.toContain('weir-not-fully-contracted');
    // fully contracted V-notch: P ≥ 0.46 m (1.5 ft), B ≥ 0.91 m (3 ft) (USBR Water Measurement Manual, 2001, from memory)
    expect(codes({ ...notch, crestHeight: '0.3 ft' })).toContain('weir-not-fully-contracted');
    expect(codes({ ...notch, crestHeight: '2 ft', poolWidth: '2 ft' })).toContain('weir-not-fully-contracted');
    expect(codes({ ...notch, crestHeight: '2 ft', poolWidth: '4 ft' })).not.toContain('weir-not-fully-contracted');
  });
});

describe('array planner: efficiency, pump type, the upper pump’s drive flow and delivery line', () => {
  const staged = { mode: 'staged', pumps: '3', driveFlowEach: '10 gal/min', upperLift: '65 ft' };

  it('a lower efficiency delivers less', () => {
    const typical = ok<ArrayPlannerResults>(
      computeFromForm('array-planner', { driveFlowEach: '10 gal/min', efficiency: '60' }),
    );
    const poor = ok<ArrayPlannerResults>(
      computeFromForm('array-planner', { driveFlowEach: '10 gal/min', efficiency: '30' }),
    );
    expect(poor.combinedDeliveryM3s).toBeLessThan(typical.combinedDeliveryM3s);
  });

  it('takes the upper pump’s drive flow as given', () => {
    const r = ok<ArrayPlannerResults>(computeFromForm('array-planner', { ...staged, upperDriveFlow: '2 gal/min' }));
    // 2 US gal/min = 2 × 3.785411784 L / 60 s (NIST Handbook 44)
    expect(r.staged?.upperDriveFlowM3s).toBeCloseTo((2 * 0.003785411784) / 60, 9);
    expect(r.staged?.upperDriveFlowEstimated).toBe(false);
  });

  it('charges the upper delivery line its friction instead of leaving it lossless', () => {
    const lossless = ok<ArrayPlannerResults>(computeFromForm('array-planner', staged));
    const piped = ok<ArrayPlannerResults>(
      computeFromForm('array-planner', { ...staged, upperDeliveryLength: '2000 ft', upperDeliverySize: '1/2' }),
    );
    expect(piped.staged?.topYieldM3s).toBeLessThan(lossless.staged?.topYieldM3s ?? 0);
  });
});

describe('stall check: intake submergence, fittings, delivery line and pump type', () => {
  const reason = (form: Record<string, string>, code: string) => {
    const r = ok<StallCheckResults>(computeFromForm('stall-check', form));
    return r.causes.find((c) => c.code === code)?.reason ?? '';
  };

  const fromNumbers = (form: Record<string, string>, code: string) =>
    ok<StallCheckResults>(computeFromForm('stall-check', form)).causes.some((c) => c.code === code && c.fromNumbers);

  it('checks the water over the intake', () => {
    // S = D(1 + 2.3 Fr) (ANSI/HI 9.8, Pump Intake Design, 1998): about 0.1 m for a 1/2" pipe at full flow
    expect(fromNumbers({ submergence: '1 in' }, 'air-in-drive-pipe')).toBe(true);
    expect(fromNumbers({ submergence: '12 in' }, 'air-in-drive-pipe')).toBe(false);
  });

  it('checks the delivery line only when its length is given', () => {
    const reason = (form: Record<string, string>) =>
      ok<StallCheckResults>(computeFromForm('stall-check', { symptoms: 'weak-delivery', ...form })).causes.find(
        (c) => c.code === 'delivery-line-friction',
      )?.reason;
    expect(reason({})).toContain('Add the delivery line');
    expect(reason({ deliveryLength: '150 ft' })).toContain('the delivery line loses');
  });

  it('counts the drive pipe’s elbows', () => {
    // 3 threaded 90° elbows at K = 1.5 each (Crane TP-410, as in Munson Table 8.2, from memory)
    expect(reason({ elbows: '3' }, 'fittings-in-drive-pipe')).toContain('ΣK = 4.5');
  });
});

describe('a question’s site sheet opens the stall check with its delivery line', () => {
  it('carries the delivery line into the stall check', () => {
    const props = calculatorPropsFromSiteSheet('stall-check', {
      fall: '4 ft',
      deliveryLength: '150 ft',
      deliverySize: '3/4',
      deliveryMaterial: 'hdpe-dr11',
    });
    expect(props).toMatchObject({ deliveryLength: '150 ft', deliverySize: '3/4', deliveryMaterial: 'hdpe-dr11' });
  });
});
