/**
 * Pipe ratings under a ram: a ram loads its drive pipe at every beat, tens of
 * millions of times a year, so the static (non-shock) rating printed on the
 * pipe is not the whole story.
 *
 * Cyclic (fatigue) life of PVC: Vinson's equation
 *   N = 5.05×10²¹ · S^−4.906,  S the peak hoop stress in psi,
 * from Moser, A.P. & Folkman, S. (2008), Buried Pipe Design, 3rd ed.,
 * McGraw-Hill, ch. 4 "Design of Pressure Pipes", Eq. 4.17 (p. 211), where it is
 * described as the equation "used for years as the standard for predicting
 * fatigue life of PVC pipe" (the constants checked against that page). The newer
 * method of AWWA C900-16 Appendix B and Folkman & Parvez, "PVC Pipe Cyclic
 * Design Method" (ASCE Pipelines 2020) uses mean stress and amplitude; it was
 * found but not its constants, so it is not used here.
 * Hoop stress: S = P·(DR − 1)/2 with DR = OD/wall (the ISO/Barlow form used for
 * plastic pressure pipe ratings; common practice).
 *
 * Threaded joints: "threading of PVC Schedule 40 … pipe is not recommended", and
 * threaded schedule 80 PVC is rated at half the plain pipe (e.g. 1": 630 → 315 psi),
 * as tabulated in a PVC pipe manufacturer's published installation guide
 * (table of pressure ratings of threaded pipe at 73 °F); the same rule is in
 * ASTM D1785's appendix (from memory).
 *
 * HDPE grades: pressure rating PR = 2·HDS/(DR − 1) with the hydrostatic design
 * stress for water at 73 °F of 800 psi for PE3608 and 1000 psi for PE4710
 * (Plastics Pipe Institute TR-4 listings and AWWA C906, from memory).
 */
import { fromSI, toSI } from './units';

/** Vinson's constants (Moser & Folkman 2008, Eq. 4.17). */
export const VINSON = {
  coefficient: 5.05e21,
  exponent: -4.906,
  source: 'Vinson, as given in Moser & Folkman, Buried Pipe Design, 3rd ed. (2008), Eq. 4.17',
} as const;

/** Hydrostatic design stress for water at 73 °F, psi. */
export const PE_HDS_PSI = { PE3608: 800, PE4710: 1000 } as const;
export type PeGrade = keyof typeof PE_HDS_PSI;
export const PE_HDS_SOURCE = 'PPI TR-4 / AWWA C906: HDS 800 psi PE3608, 1000 psi PE4710 (from memory)';

export const THREAD_SOURCE =
  "a PVC pipe manufacturer's installation guide, threaded-pipe pressure table (threaded sch 80 = half the plain rating; sch 40 not to be threaded); ASTM D1785 appendix (from memory)";

/**
 * Hoop stress in a plastic pipe wall, S = P·(DR − 1)/2, Pa.
 * Units: P Pa (gauge); DR = OD/wall, dimensionless. Range: DR > 1.
 * Reference: module comment (common practice).
 * @example 1" sch 40 PVC (OD 1.315 in, wall 0.133 in, DR 9.89) at 100 psi
 * fromSI(hoopStress(toSI(100, 'psi', 'pressure'), 1.315 / 0.133), 'psi', 'pressure')  // ≈ 444.36
 */
export function hoopStress(pressurePa: number, dr: number): number {
  return (pressurePa * (dr - 1)) / 2;
}

/**
 * Cycles to failure of PVC pipe at a peak hoop stress (Vinson): N = 5.05×10²¹ · S^−4.906, S in psi.
 * Units: S Pa in, cycles out. Range: Vinson's tests, roughly 10³–10⁷ cycles; beyond, an extrapolation.
 * Reference: Moser & Folkman (2008), Buried Pipe Design, Eq. 4.17.
 * @example 2000 psi peak hoop stress: 5.05e21 × 2000^−4.906
 * pvcCyclesToFailure(toSI(2000, 'psi', 'pressure'))  // ≈ 3.224e5 ±0.1%
 */
export function pvcCyclesToFailure(peakHoopStressPa: number): number {
  const s = fromSI(peakHoopStressPa, 'psi', 'pressure');
  return VINSON.coefficient * s ** VINSON.exponent;
}

export interface PvcFatigue {
  hoopStressPa: number;
  cyclesToFailure: number;
  /** at the given beats per minute, beating day and night */
  yearsToFailure: number;
  beatsPerYear: number;
  source: string;
}

/**
 * Fatigue life of a PVC drive pipe that sees a peak pressure at every beat.
 * Formulas: DR = OD/wall; S = P·(DR − 1)/2; N (Vinson); beats a year = bpm × 60 × 24 × 365.25; years = N ÷ beats a year.
 * Units: P Pa, OD and wall m, bpm 1/min. Range: as {@link pvcCyclesToFailure}.
 * Reference: module comment.
 * @example 1" sch 40 PVC at a 125 psi peak, 60 beats a minute
 * // DR = 1.315/0.133 = 9.887, S = 125 × 8.887/2 = 555.5 psi, N = 5.05e21 × 555.5^−4.906
 * const f = pvcFatigue(toSI(125, 'psi', 'pressure'), 0.0334, 0.003378, 60)
 * fromSI(f.hoopStressPa, 'psi', 'pressure')  // ≈ 555.5 ±0.5%
 * f.cyclesToFailure  // ≈ 1.730e8 ±1%
 * // 60 × 525 960 = 31.6 million beats a year
 * f.yearsToFailure  // ≈ 5.48 ±1%
 */
export function pvcFatigue(
  peakPressurePa: number,
  outsideDiameterM: number,
  wallThicknessM: number,
  beatsPerMinute: number,
): PvcFatigue {
  const dr = outsideDiameterM / wallThicknessM;
  const s = hoopStress(peakPressurePa, dr);
  const n = pvcCyclesToFailure(s);
  const perYear = beatsPerMinute * 60 * 24 * 365.25;
  return {
    hoopStressPa: s,
    cyclesToFailure: n,
    yearsToFailure: n / perYear,
    beatsPerYear: perYear,
    source: VINSON.source,
  };
}

/**
 * Pressure rating of polyethylene pipe, PR = 2·HDS/(DR − 1), Pa.
 * Units: DR dimensionless; returns Pa. Range: DR 7–32.5.
 * Reference: module comment (PPI TR-4 / AWWA C906, from memory).
 * @example DR 11: PE4710 200 psi, PE3608 160 psi
 * fromSI(peRating('PE4710', 11), 'psi', 'pressure')  // ≈ 200
 * fromSI(peRating('PE3608', 11), 'psi', 'pressure')  // ≈ 160
 */
export function peRating(grade: PeGrade, dr: number): number {
  return toSI((2 * PE_HDS_PSI[grade]) / (dr - 1), 'psi', 'pressure');
}

export type JointKind = 'plain' | 'threaded';

export interface JointRating {
  /** false when the pipe is not to be threaded at all */
  allowed: boolean;
  ratingPa: number;
  note: string;
  source: string;
}

/**
 * Rating of a pipe at its joints: plain (solvent-welded, fused, compression) keeps
 * the pipe's rating; threaded schedule 80 PVC is halved; threaded schedule 40 PVC
 * is refused; steel's rating already is its threaded fittings'.
 * Units: Pa. Reference: module comment.
 * @example 1" sch 80 PVC, 630 psi plain
 * fromSI(jointRating('pvc-sch80', toSI(630, 'psi', 'pressure'), 'threaded').ratingPa, 'psi', 'pressure')  // ≈ 315
 * jointRating('pvc-sch40', 1e6, 'threaded').allowed  // → false
 * jointRating('pvc-sch40', 1e6, 'plain').ratingPa  // ≈ 1e6
 */
export function jointRating(series: string, pipeRatingPa: number, joints: JointKind): JointRating {
  if (joints === 'plain')
    return { allowed: true, ratingPa: pipeRatingPa, note: 'plain joints keep the pipe rating', source: THREAD_SOURCE };
  if (series === 'pvc-sch40') {
    return {
      allowed: false,
      ratingPa: 0,
      note: 'schedule 40 PVC is not to be threaded: use schedule 80 or solvent-welded joints',
      source: THREAD_SOURCE,
    };
  }
  if (series === 'pvc-sch80')
    return {
      allowed: true,
      ratingPa: pipeRatingPa / 2,
      note: 'threaded schedule 80 PVC at half its rating',
      source: THREAD_SOURCE,
    };
  if (series.startsWith('steel'))
    return {
      allowed: true,
      ratingPa: pipeRatingPa,
      note: 'steel is already rated by its threaded fittings',
      source: 'ASME B16.3 Class 150 (from memory)',
    };
  return {
    allowed: false,
    ratingPa: 0,
    note: 'polyethylene and metric plastic pipe are joined by fusion or compression fittings, not threads',
    source: 'common practice, no published source found',
  };
}
