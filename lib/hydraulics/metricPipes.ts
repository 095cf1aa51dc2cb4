/**
 * Metric plastic pipe beside the US schedules: polyethylene to ISO 4427 and
 * PVC-U to EN 1452 / ISO 1452, by outside diameter (20–110 mm) and SDR.
 *
 * PE, ISO 4427-2:2007, table of minimum wall thickness by SDR (walls copied
 * from a reproduction of that table, with the SDR series S and PN by grade):
 * SDR 9, 11 and 17. SDR 17 is not made below 32 mm (its computed wall would be
 * under the 2.0 mm minimum). Pressure: PN = 20·σ_s/(SDR − 1) bar with
 * σ_s = MRS/C, MRS 8 MPa (PE80) or 10 MPa (PE100), C = 1.25 (the minimum
 * design coefficient for water in ISO 4427 / ISO 12162), rounded to the nearest
 * preferred PN, e.g. PE100 SDR 11 → 16 bar, PE80 SDR 11 → 12.8 → PN 12.5.
 *
 * PVC-U, EN 1452-2 / ISO 1452-2: MRS 25 MPa with C = 2.5 up to 90 mm and 2.0
 * above (σ_s 10 and 12.5 MPa), same PN formula: SDR 21 → PN 10, SDR 17 →
 * PN 12.5, SDR 13.6 → PN 16 up to 90 mm (from memory: the standard's own table
 * was not found in the references searched). Walls computed as OD/SDR rounded
 * up to 0.1 mm (common practice, the rule the ISO 4065 series uses; the
 * standard's table may set larger minimum walls at small sizes).
 *
 * Inside diameter: OD − 2 × minimum wall, as for the US series in pipes.ts.
 */
import { toSI } from './units';
import type { UnitSystem } from './units';
import type { PipeMaterial, PipeSeries } from './pipes';

export const METRIC_ODS_MM = [20, 25, 32, 40, 50, 63, 75, 90, 110] as const;
export type MetricOd = (typeof METRIC_ODS_MM)[number];

export const METRIC_SERIES = [
  'pe100-sdr9',
  'pe100-sdr11',
  'pe100-sdr17',
  'pe80-sdr9',
  'pe80-sdr11',
  'pe80-sdr17',
  'pvcu-sdr13.6',
  'pvcu-sdr17',
  'pvcu-sdr21',
] as const;
export type MetricSeries = (typeof METRIC_SERIES)[number];

/** ISO 4427-2:2007 minimum walls, mm, by SDR and OD (undefined: not made). */
const PE_WALLS_MM: Record<9 | 11 | 17, Partial<Record<MetricOd, number>>> = {
  9: { 20: 2.3, 25: 3.0, 32: 3.6, 40: 4.5, 50: 5.6, 63: 7.1, 75: 8.4, 90: 10.1, 110: 12.3 },
  11: { 20: 2.0, 25: 2.3, 32: 3.0, 40: 3.7, 50: 4.6, 63: 5.8, 75: 6.8, 90: 8.2, 110: 10.0 },
  17: { 32: 2.0, 40: 2.4, 50: 3.0, 63: 3.8, 75: 4.5, 90: 5.4, 110: 6.6 },
};

export const METRIC_PIPE_SOURCES = {
  pe: 'ISO 4427-2:2007, walls by SDR; PN = 20·(MRS/1.25)/(SDR − 1), MRS 8 MPa PE80, 10 MPa PE100',
  pvcu: 'EN 1452-2 / ISO 1452-2: PN = 20·(25 MPa/C)/(SDR − 1), C = 2.5 to 90 mm, 2.0 above (from memory); walls OD/SDR rounded up to 0.1 mm',
} as const;

/** Preferred nominal pressures, bar (the R10 series the standards use). */
const PREFERRED_PN = [4, 5, 6, 8, 10, 12.5, 16, 20, 25] as const;

/**
 * Nominal pressure from the standards' formula, PN = 20·σ_s/(SDR − 1), rounded to the nearest preferred PN, bar.
 * Units: σ_s MPa; returns bar. Reference: module comment.
 * @example PE100 SDR 11: σ_s = 10/1.25 = 8 MPa → 16 bar; PE80 SDR 11: 6.4 MPa → 12.8 → 12.5
 * nominalPressureBar(8, 11)  // ≈ 16
 * nominalPressureBar(6.4, 11)  // ≈ 12.5
 * // PVC-U SDR 13.6 up to 90 mm: 25/2.5 = 10 MPa → 15.9 → 16
 * nominalPressureBar(10, 13.6)  // ≈ 16
 */
export function nominalPressureBar(designStressMPa: number, sdr: number): number {
  const pn = (20 * designStressMPa) / (sdr - 1);
  let best: number = PREFERRED_PN[0];
  for (const p of PREFERRED_PN) if (Math.abs(p - pn) < Math.abs(best - pn)) best = p;
  return best;
}

export interface MetricPipeSpec {
  material: PipeMaterial;
  series: MetricSeries;
  outsideDiameterMm: MetricOd;
  sdr: number;
  insideDiameterM: number;
  wallThicknessM: number;
  outsideDiameterM: number;
  /** nominal pressure PN at 20 °C, Pa */
  pressureRatingPa: number;
  pnBar: number;
  source: string;
}

/**
 * A metric pipe by series and outside diameter, or undefined when the series is not made in that size.
 * Units: metres and pascals. Range: 20–110 mm.
 * Reference: module comment.
 * @example 32 mm PE100 SDR 11: wall 3.0 mm (ISO 4427-2 table), ID 26.0 mm, PN 16
 * const p = resolveMetricPipe('pe100-sdr11', 32)
 * p.insideDiameterM  // ≈ 0.026
 * p.pnBar  // ≈ 16
 * fromSI(p.pressureRatingPa, 'kPa', 'pressure')  // ≈ 1600
 * @example 50 mm PVC-U SDR 21: wall 50/21 = 2.38 → 2.4 mm, PN 10
 * resolveMetricPipe('pvcu-sdr21', 50).wallThicknessM  // ≈ 0.0024
 * resolveMetricPipe('pvcu-sdr21', 50).pnBar  // ≈ 10
 * resolveMetricPipe('pe100-sdr17', 20)  // → undefined
 */
export function resolveMetricPipe(series: MetricSeries, odMm: MetricOd): MetricPipeSpec | undefined {
  const sdr = Number(series.slice(series.indexOf('sdr') + 3));
  let wallMm: number | undefined;
  let stress: number;
  let material: PipeMaterial;
  let source: string;
  if (series.startsWith('pvcu')) {
    wallMm = Math.ceil((odMm / sdr) * 10 - 1e-9) / 10;
    stress = 25 / (odMm <= 90 ? 2.5 : 2.0);
    material = 'pvc';
    source = METRIC_PIPE_SOURCES.pvcu;
  } else {
    wallMm = PE_WALLS_MM[sdr as 9 | 11 | 17][odMm];
    stress = (series.startsWith('pe100') ? 10 : 8) / 1.25;
    material = 'hdpe';
    source = METRIC_PIPE_SOURCES.pe;
  }
  if (wallMm === undefined) return undefined;
  const pn = nominalPressureBar(stress, sdr);
  return {
    material,
    series,
    outsideDiameterMm: odMm,
    sdr,
    insideDiameterM: (odMm - 2 * wallMm) / 1000,
    wallThicknessM: wallMm / 1000,
    outsideDiameterM: odMm / 1000,
    pressureRatingPa: toSI(pn, 'bar', 'pressure'),
    pnBar: pn,
    source,
  };
}

/**
 * The pipe series a reader's unit system starts from: US readers the schedules
 * and DR series (pipes.ts), metric readers ISO 4427 PE and EN 1452 PVC-U.
 * Common practice, no published source (what is sold where).
 * @example
 * defaultSeriesFor('US', 'pvc')  // → 'pvc-sch40'
 * defaultSeriesFor('metric', 'pvc')  // → 'pvcu-sdr13.6'
 * defaultSeriesFor('metric', 'hdpe')  // → 'pe100-sdr11'
 * defaultSeriesFor('metric', 'steel')  // → 'steel-sch40'
 */
export function defaultSeriesFor(system: UnitSystem, material: PipeMaterial): PipeSeries | MetricSeries {
  if (system === 'metric') {
    if (material === 'pvc') return 'pvcu-sdr13.6';
    if (material === 'hdpe' || material === 'hose') return 'pe100-sdr11';
  }
  if (material === 'pvc') return 'pvc-sch40';
  if (material === 'hdpe' || material === 'hose') return 'hdpe-dr11';
  return 'steel-sch40';
}
