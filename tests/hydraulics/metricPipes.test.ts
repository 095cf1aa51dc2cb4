import { describe, expect, it } from 'vitest';
import {
  METRIC_ODS_MM,
  METRIC_SERIES,
  defaultSeriesFor,
  fromSI,
  resolveMetricPipe,
  resolvePipe,
  toSI,
} from '@/lib/hydraulics';

describe('ISO 4427 polyethylene by SDR', () => {
  it('walls follow the ISO 4427-2:2007 table', () => {
    // ISO 4427-2:2007 minimum walls (as reproduced with the standard's SDR/PN header): SDR 11 110 mm 10.0,
    // 63 mm 5.8; SDR 9 90 mm 10.1; SDR 17 32 mm 2.0 and not made at 20 mm
    expect(resolveMetricPipe('pe100-sdr11', 110)!.wallThicknessM).toBeCloseTo(0.01, 12);
    expect(resolveMetricPipe('pe100-sdr11', 63)!.wallThicknessM).toBeCloseTo(0.0058, 12);
    expect(resolveMetricPipe('pe80-sdr9', 90)!.wallThicknessM).toBeCloseTo(0.0101, 12);
    expect(resolveMetricPipe('pe100-sdr17', 32)!.wallThicknessM).toBeCloseTo(0.002, 12);
    expect(resolveMetricPipe('pe100-sdr17', 20)).toBeUndefined();
  });
  it('PN by grade: PE100 SDR 11 = 16 bar, PE80 SDR 11 = 12.5, PE100 SDR 17 = 10, PE80 SDR 9 = 16', () => {
    // ISO 4427 (C = 1.25, MRS 10 / 8 MPa), the PN row of the same table
    expect(resolveMetricPipe('pe100-sdr11', 50)!.pnBar).toBe(16);
    expect(resolveMetricPipe('pe80-sdr11', 50)!.pnBar).toBe(12.5);
    expect(resolveMetricPipe('pe100-sdr17', 50)!.pnBar).toBe(10);
    expect(resolveMetricPipe('pe80-sdr9', 50)!.pnBar).toBe(16);
    expect(resolveMetricPipe('pe100-sdr9', 50)!.pressureRatingPa).toBeCloseTo(toSI(20, 'bar', 'pressure'), 6);
  });
  it('every listed size either resolves with ID = OD − 2 walls or is not made', () => {
    for (const s of METRIC_SERIES)
      for (const od of METRIC_ODS_MM) {
        const p = resolveMetricPipe(s, od);
        if (p) expect(p.insideDiameterM).toBeCloseTo(od / 1000 - 2 * p.wallThicknessM, 12); // definition
      }
  });
});

describe('EN 1452 PVC-U', () => {
  it('PN 10 / 12.5 / 16 for SDR 21 / 17 / 13.6 up to 90 mm; the lower design coefficient above 90 mm', () => {
    // EN 1452-2 design coefficient 2.5 to 90 mm, 2.0 above, MRS 25 MPa (from memory)
    expect(resolveMetricPipe('pvcu-sdr21', 63)!.pnBar).toBe(10);
    expect(resolveMetricPipe('pvcu-sdr17', 63)!.pnBar).toBe(12.5);
    expect(resolveMetricPipe('pvcu-sdr13.6', 63)!.pnBar).toBe(16);
    // 110 mm: σ = 12.5 MPa → SDR 21: 20 × 12.5/20 = 12.5 bar
    expect(resolveMetricPipe('pvcu-sdr21', 110)!.pnBar).toBe(12.5);
  });
});

describe('unit system picks the pipe series', () => {
  it('US → schedules and DR, metric → ISO/EN', () => {
    // common practice, no source: what is sold where
    expect(defaultSeriesFor('US', 'pvc')).toBe('pvc-sch40');
    expect(defaultSeriesFor('US', 'hdpe')).toBe('hdpe-dr11');
    expect(defaultSeriesFor('metric', 'pvc')).toBe('pvcu-sdr13.6');
    expect(defaultSeriesFor('metric', 'hdpe')).toBe('pe100-sdr11');
  });
});

describe('HDPE grades rate differently at the same DR', () => {
  it('PE4710 200 psi and PE3608 160 psi at DR 11', () => {
    // PR = 2·HDS/(DR − 1), HDS 1000 psi PE4710, 800 psi PE3608 (PPI TR-4 / AWWA C906, from memory)
    expect(fromSI(resolvePipe('hdpe-dr11', '1').pressureRatingPa, 'psi', 'pressure')).toBeCloseTo(200, 9);
    expect(fromSI(resolvePipe('hdpe-dr11', '1', undefined, 'PE3608').pressureRatingPa, 'psi', 'pressure')).toBeCloseTo(
      160,
      9,
    );
    expect(fromSI(resolvePipe('hdpe-dr17', '2', undefined, 'PE3608').pressureRatingPa, 'psi', 'pressure')).toBeCloseTo(
      100,
      9,
    );
  });
});

describe('imperial gallons', () => {
  it('4.54609 L exactly, beside the US gallon', () => {
    // UK Weights and Measures Act 1985, Schedule 1 (from memory); US gallon 231 in³ (NIST SP 811)
    expect(toSI(1, 'imp gal', 'volume')).toBe(0.00454609);
    expect(fromSI(toSI(1, 'galimp/min', 'flow'), 'gal/min', 'flow')).toBeCloseTo(4.54609 / 3.785411784, 12);
    expect(fromSI(toSI(100, 'L/day', 'dailyVolume'), 'galimp/day', 'dailyVolume')).toBeCloseTo(100 / 4.54609, 10);
  });
});
