/**
 * Pipe materials and nominal pipe sizes ½" to 4", resolved to inside
 * diameters from published schedule tables.
 *
 * Steel, schedule 40 and 80: outside diameter and nominal wall from
 * ASME B36.10M, "Welded and Seamless Wrought Steel Pipe" (table values
 * recalled, from memory; they are the familiar NPS figures, e.g. 1" =
 * 1.315 in OD, 0.133 in wall sch 40, 0.179 in sch 80).
 * PVC, schedule 40 and 80: ASTM D1785, "PVC Plastic Pipe, Schedules 40, 80
 * and 120", which uses the same outside diameters and (minimum) walls as
 * steel pipe of the same schedule for these sizes. Pressure ratings for
 * PVC 1120 at 73 °F (23 °C) from the D1785 appendix table (Appendix X1 of
 * ASTM D1785-15; the values from memory).
 * HDPE, IPS DR series: outside diameter per ASTM D3035 (IPS sizes, same
 * ODs as steel pipe); minimum wall = OD/DR; inside diameter computed as
 * average OD − 2 × minimum wall. Pressure class at 73 °F from
 * PR = 2·HDS/(DR − 1): the hdpe-dr series are PE4710 (HDS 1000 psi); pass
 * 'PE3608' to resolvePipe for the older grade (HDS 800 psi), which rates lower
 * at the same DR (pipeRatings.ts).
 * Metric series (ISO 4427 PE, EN 1452 PVC-U) are in metricPipes.ts.
 */
import { peRating, type PeGrade } from './pipeRatings';
import { toSI } from './units';

export const NOMINAL_SIZES = ['1/2', '3/4', '1', '1-1/4', '1-1/2', '2', '2-1/2', '3', '4'] as const;
export type NominalSize = (typeof NOMINAL_SIZES)[number];

export const PIPE_SERIES = [
  'steel-sch40',
  'steel-sch80',
  'pvc-sch40',
  'pvc-sch80',
  'hdpe-dr9',
  'hdpe-dr11',
  'hdpe-dr17',
] as const;
export type PipeSeries = (typeof PIPE_SERIES)[number];

import { PIPE_MATERIALS as MATERIALS, type PipeMaterial } from '../vocabulary';

export { MATERIALS, type PipeMaterial };

export interface MaterialProps {
  label: string;
  /** Young's modulus E, Pa */
  youngsModulusPa: number;
  /** published range of E, Pa */
  youngsModulusRangePa: readonly [number, number];
  /** absolute roughness ε, m */
  roughnessM: number;
  /** Hazen-Williams C */
  hazenWilliamsC: number;
  /** rigid pipe carries the pressure wave; flexible pipe soaks it up */
  rigid: boolean;
  source: string;
}

/**
 * Material properties.
 * E: Wylie & Streeter, "Fluid Transients in Systems" (1993), Table 2.1
 * (steel ≈ 200–207 GPa, PVC ≈ 2.4–3.3 GPa, polyethylene ≈ 0.8–1.1 GPa) —
 * from memory; PVC 2.76 GPa is the minimum tensile modulus (400,000 psi) of
 * cell class 12454 in ASTM D1784 (from memory).
 * ε: Moody (1944) as tabulated in Munson, Young & Okiishi, Table 8.1
 * (commercial steel 0.045 mm, galvanized iron 0.15 mm, drawn tubing
 * 0.0015 mm — used for smooth plastics) — from memory.
 * C: Hazen-Williams coefficients as commonly tabulated (PVC/PE 150, new
 * steel 120, galvanized 120) — common practice, no source.
 * Hose: reinforced rubber/vinyl hose, E ≈ 0.02 GPa — from memory, order of magnitude only.
 */
export const MATERIAL_PROPS: Record<PipeMaterial, MaterialProps> = {
  steel: {
    label: 'steel (black)',
    youngsModulusPa: 200e9,
    youngsModulusRangePa: [200e9, 207e9],
    roughnessM: 0.045e-3,
    hazenWilliamsC: 120,
    rigid: true,
    source: 'E: Wylie & Streeter Table 2.1; ε: Munson Table 8.1 (from memory)',
  },
  'galvanized-steel': {
    label: 'galvanized steel',
    youngsModulusPa: 200e9,
    youngsModulusRangePa: [200e9, 207e9],
    roughnessM: 0.15e-3,
    hazenWilliamsC: 120,
    rigid: true,
    source: 'E: Wylie & Streeter Table 2.1; ε: Munson Table 8.1 (from memory)',
  },
  pvc: {
    label: 'PVC',
    youngsModulusPa: 2.76e9,
    youngsModulusRangePa: [2.4e9, 3.3e9],
    roughnessM: 0.0015e-3,
    hazenWilliamsC: 150,
    rigid: true,
    source: 'E: ASTM D1784 cell class 12454; range Wylie & Streeter Table 2.1 (from memory)',
  },
  hdpe: {
    label: 'HDPE (polyethylene)',
    youngsModulusPa: 0.9e9,
    youngsModulusRangePa: [0.8e9, 1.1e9],
    roughnessM: 0.0015e-3,
    hazenWilliamsC: 150,
    rigid: false,
    source: 'E: Wylie & Streeter Table 2.1 (from memory)',
  },
  hose: {
    label: 'hose (rubber or vinyl)',
    youngsModulusPa: 0.02e9,
    youngsModulusRangePa: [0.005e9, 0.1e9],
    roughnessM: 0.01e-3,
    hazenWilliamsC: 140,
    rigid: false,
    source: 'from memory, order of magnitude only',
  },
};

/** [OD in, sch 40 wall in, sch 80 wall in, PVC sch 40 psi, PVC sch 80 psi] per nominal size. */
const STEEL_PVC: Record<NominalSize, readonly [number, number, number, number, number]> = {
  '1/2': [0.84, 0.109, 0.147, 600, 850],
  '3/4': [1.05, 0.113, 0.154, 480, 690],
  '1': [1.315, 0.133, 0.179, 450, 630],
  '1-1/4': [1.66, 0.14, 0.191, 370, 520],
  '1-1/2': [1.9, 0.145, 0.2, 330, 470],
  '2': [2.375, 0.154, 0.218, 280, 400],
  '2-1/2': [2.875, 0.203, 0.276, 300, 420],
  '3': [3.5, 0.216, 0.3, 260, 370],
  '4': [4.5, 0.237, 0.337, 220, 320],
};

/** Threaded steel pipe is limited by its fittings: Class 150 malleable iron, 300 psi at ambient (ASME B16.3, from memory). */
const STEEL_THREADED_PSI = 300;

export interface PipeSpec {
  material: PipeMaterial;
  insideDiameterM: number;
  wallThicknessM: number;
  outsideDiameterM: number;
  /** working pressure rating, Pa */
  pressureRatingPa: number;
  series?: PipeSeries;
  nominal?: NominalSize;
}

const inch = (x: number) => toSI(x, 'in', 'smallLength');
const psi = (x: number) => toSI(x, 'psi', 'pressure');

/**
 * Inside diameter and wall of a nominal pipe size in a series.
 *
 * Formula: steel/PVC ID = OD − 2·wall (table wall); HDPE DR: wall = OD/DR, ID = OD − 2·OD/DR.
 * Units: returns metres and pascals. Range: ½" to 4".
 * Reference: ASME B36.10M; ASTM D1785; ASTM D3035 (table values from memory).
 * @example 1" sch 40 PVC: OD 1.315 in, wall 0.133 in → ID = 1.049 in, 450 psi
 * fromSI(resolvePipe('pvc-sch40', '1').insideDiameterM, 'mm', 'smallLength')  // ≈ 26.64
 * fromSI(resolvePipe('pvc-sch40', '1').pressureRatingPa, 'psi', 'pressure')  // ≈ 450
 * @example 1¼" HDPE DR 11: OD 1.660 in, wall 1.660/11 = 0.1509 in → ID = 1.358 in, 2 × 1000/(11 − 1) = 200 psi
 * fromSI(resolvePipe('hdpe-dr11', '1-1/4').insideDiameterM, 'mm', 'smallLength')  // ≈ 34.50
 * fromSI(resolvePipe('hdpe-dr11', '1-1/4').pressureRatingPa, 'psi', 'pressure')  // ≈ 200
 * @example the same DR 11 in PE3608: 2 × 800/(11 − 1) = 160 psi
 * fromSI(resolvePipe('hdpe-dr11', '1-1/4', undefined, 'PE3608').pressureRatingPa, 'psi', 'pressure')  // ≈ 160
 */
export function resolvePipe(
  series: PipeSeries,
  nominal: NominalSize,
  material?: PipeMaterial,
  peGrade: PeGrade = 'PE4710',
): PipeSpec {
  const key = `${series}|${nominal}|${material ?? ''}|${peGrade}`;
  const hit = pipeCache.get(key);
  if (hit) return { ...hit };
  const spec = computePipe(series, nominal, material, peGrade);
  pipeCache.set(key, spec);
  return { ...spec };
}

const pipeCache = new Map<string, PipeSpec>();

function computePipe(
  series: PipeSeries,
  nominal: NominalSize,
  material: PipeMaterial | undefined,
  peGrade: PeGrade,
): PipeSpec {
  const [odIn, w40, w80, p40, p80] = STEEL_PVC[nominal];
  let wallIn: number;
  let ratingPsi: number;
  let mat: PipeMaterial;
  if (series.startsWith('hdpe')) {
    const dr = Number(series.slice('hdpe-dr'.length));
    wallIn = odIn / dr;
    ratingPsi = peRating(peGrade, dr) / psi(1);
    mat = 'hdpe';
  } else {
    const sch80 = series.endsWith('80');
    wallIn = sch80 ? w80 : w40;
    if (series.startsWith('pvc')) {
      mat = 'pvc';
      ratingPsi = sch80 ? p80 : p40;
    } else {
      mat = material === 'galvanized-steel' ? 'galvanized-steel' : 'steel';
      ratingPsi = STEEL_THREADED_PSI;
    }
  }
  return {
    material: mat,
    insideDiameterM: inch(odIn - 2 * wallIn),
    wallThicknessM: inch(wallIn),
    outsideDiameterM: inch(odIn),
    pressureRatingPa: psi(ratingPsi),
    series,
    nominal,
  };
}

/**
 * The series to size a pipe of this material in, when none is named (common practice, no source).
 * @example
 * defaultSeries('pvc')  // → 'pvc-sch40'
 * defaultSeries('hdpe')  // → 'hdpe-dr11'
 */
export function defaultSeries(material: PipeMaterial): PipeSeries {
  if (material === 'pvc') return 'pvc-sch40';
  if (material === 'hdpe' || material === 'hose') return 'hdpe-dr11';
  return 'steel-sch40';
}

const NOMINAL_WORDS: Record<string, NominalSize> = {
  '0.5': '1/2',
  '1/2': '1/2',
  '.5': '1/2',
  '0.75': '3/4',
  '3/4': '3/4',
  '.75': '3/4',
  '1': '1',
  '1.0': '1',
  '1.25': '1-1/4',
  '1-1/4': '1-1/4',
  '1 1/4': '1-1/4',
  '1.5': '1-1/2',
  '1-1/2': '1-1/2',
  '1 1/2': '1-1/2',
  '2': '2',
  '2.0': '2',
  '2.5': '2-1/2',
  '2-1/2': '2-1/2',
  '2 1/2': '2-1/2',
  '3': '3',
  '3.0': '3',
  '4': '4',
  '4.0': '4',
};

/**
 * Reads a nominal size as people write it: "½", "3/4\"", "1¼ in", "1-1/4", "1.25", "2 inch".
 * Returns undefined when it is not one of ½" to 4".
 * @example
 * parseNominalSize('1¼ in')  // → '1-1/4'
 * parseNominalSize('3/4"')  // → '3/4'
 * parseNominalSize('5 in')  // → undefined
 */
export function parseNominalSize(text: string): NominalSize | undefined {
  let s = text.trim().toLowerCase();
  s = s.replace(/½/g, ' 1/2').replace(/¼/g, ' 1/4').replace(/¾/g, ' 3/4').replace(/⁄/g, '/');
  s = s
    .replace(/(inches|inch|in\.?|["”″]|nps|nominal)/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();
  return NOMINAL_WORDS[s];
}

/** Nominal sizes with their labels for pickers, e.g. { id: '1-1/4', label: '1¼"' }. */
export const NOMINAL_LABELS: Record<NominalSize, string> = {
  '1/2': '½"',
  '3/4': '¾"',
  '1': '1"',
  '1-1/4': '1¼"',
  '1-1/2': '1½"',
  '2': '2"',
  '2-1/2': '2½"',
  '3': '3"',
  '4': '4"',
};
