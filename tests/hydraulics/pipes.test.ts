import { describe, expect, it } from 'vitest';
import { FITTING_K, NOMINAL_SIZES, fromSI, parseNominalSize, resolvePipe, sumK } from '@/lib/hydraulics';

const idIn = (series: Parameters<typeof resolvePipe>[0], size: Parameters<typeof resolvePipe>[1]) =>
  fromSI(resolvePipe(series, size).insideDiameterM, 'in', 'smallLength');
const psi = (pa: number) => fromSI(pa, 'psi', 'pressure');

describe('nominal pipe sizes', () => {
  // ASME B36.10M inside diameters (in) as commonly tabulated — from memory
  const sch40 = [0.622, 0.824, 1.049, 1.38, 1.61, 2.067, 2.469, 3.068, 4.026];
  const sch80 = [0.546, 0.742, 0.957, 1.278, 1.5, 1.939, 2.323, 2.9, 3.826];
  NOMINAL_SIZES.forEach((n, i) => {
    it(`${n}" schedule 40 and 80`, () => {
      expect(idIn('steel-sch40', n)).toBeCloseTo(sch40[i], 3);
      expect(idIn('steel-sch80', n)).toBeCloseTo(sch80[i], 3);
      // ASTM D1785: PVC schedule pipe has the steel OD and wall for these sizes
      expect(idIn('pvc-sch40', n)).toBeCloseTo(sch40[i], 3);
    });
  });
  it('PVC pressure ratings', () => {
    // ASTM D1785 appendix, PVC 1120 at 73 °F: ½" sch 40 600 psi, 1" 450, 2" 280, 4" 220; 1" sch 80 630 (from memory)
    expect(psi(resolvePipe('pvc-sch40', '1/2').pressureRatingPa)).toBeCloseTo(600, 6);
    expect(psi(resolvePipe('pvc-sch40', '1').pressureRatingPa)).toBeCloseTo(450, 6);
    expect(psi(resolvePipe('pvc-sch40', '2').pressureRatingPa)).toBeCloseTo(280, 6);
    expect(psi(resolvePipe('pvc-sch40', '4').pressureRatingPa)).toBeCloseTo(220, 6);
    expect(psi(resolvePipe('pvc-sch80', '1').pressureRatingPa)).toBeCloseTo(630, 6);
  });
  it('HDPE IPS DR series', () => {
    // ASTM D3035: 1¼" IPS OD = 1.660 in; DR 11 minimum wall = 1.660/11 = 0.1509 in → ID 1.358 in (arithmetic on the standard's OD)
    expect(idIn('hdpe-dr11', '1-1/4')).toBeCloseTo(1.66 - (2 * 1.66) / 11, 6);
    // AWWA C906 / PPI: PE4710 DR 11 = 200 psi, DR 17 = 125 psi, DR 9 = 250 psi (from memory)
    expect(psi(resolvePipe('hdpe-dr11', '1').pressureRatingPa)).toBeCloseTo(200, 6);
    expect(psi(resolvePipe('hdpe-dr17', '1').pressureRatingPa)).toBeCloseTo(125, 6);
    expect(psi(resolvePipe('hdpe-dr9', '1').pressureRatingPa)).toBeCloseTo(250, 6);
  });
  it('reads sizes as people write them', () => {
    expect(parseNominalSize('½')).toBe('1/2');
    expect(parseNominalSize('3/4"')).toBe('3/4');
    expect(parseNominalSize('1¼ in')).toBe('1-1/4');
    expect(parseNominalSize('1 1/2 inch')).toBe('1-1/2');
    expect(parseNominalSize('2.5')).toBe('2-1/2');
    expect(parseNominalSize('5')).toBeUndefined();
  });
});

describe('fitting loss coefficients', () => {
  it('match the table', () => {
    // Munson, Young & Okiishi, Table 8.2: 90° regular threaded elbow 1.5, tee branch (threaded) 2.0,
    // gate valve open 0.15, globe valve open 10, sharp-edged entrance 0.5, exit 1.0 (from memory)
    expect(FITTING_K['elbow-90-threaded']).toBe(1.5);
    expect(FITTING_K['tee-branch-threaded']).toBe(2);
    expect(FITTING_K['gate-valve-open']).toBe(0.15);
    expect(FITTING_K['globe-valve-open']).toBe(10);
    expect(FITTING_K['entrance-sharp']).toBe(0.5);
    expect(FITTING_K.exit).toBe(1);
    // arithmetic: 2 × 1.5 + 0.15 + custom 0.35 = 3.5
    expect(
      sumK([
        { kind: 'elbow-90-threaded', count: 2 },
        { kind: 'gate-valve-open', count: 1 },
        { k: 0.35, count: 1 },
      ]),
    ).toBeCloseTo(3.5, 12);
  });
});
