/**
 * Thin-plate V-notch weirs, after the U.S. Bureau of Reclamation, "Water
 * Measurement Manual" (3rd ed., revised 1997/2001), chapter 7, §7 "V-Notch
 * Weirs of Any Angle" (eq. 7-3; k_h and Ce from figures 7-6a and 7-6b, after
 * Kulin & Compton, National Bureau of Standards, 1975) and the 90° rating
 * equation.
 *
 * Kindsvater-Shen (USBR WMM eq. 7-3), foot-second units:
 *   Q = 4.28 · Ce · tan(θ/2) · (h₁ + k_h)^2.5   (Q ft³/s, h₁ and k_h ft)
 * for fully contracted notches of 25°–100° (Kulin & Compton, 1975, NBS).
 * Ce and k_h against θ are read from the manual's figure 7-6 (after Kulin &
 * Compton); the readings below are from memory, good to about ±0.003 in Ce
 * away from 90°. At 90° Ce = 0.578 and k_h = 0.0029 ft (≈ 0.003 ft), the
 * values commonly quoted with the manual.
 * Simplified 90° equation (Cone's formula, USBR WMM ch. 7): Q = 2.49·h₁^2.48 ft³/s.
 * Limits quoted with the manual (from memory; ISO 1438 gives the same in SI):
 * 0.2 ft ≤ h₁ ≤ 1.25 ft; full contraction needs h₁/P ≤ 0.4, h₁/B ≤ 0.2,
 * P ≥ 1.5 ft and B ≥ 3 ft (P crest height above the approach bed, B approach width).
 */
import { bracketRows, type Table } from './tables';
import { toSI } from './units';

/** [θ degrees, Ce, k_h ft] — readings of USBR WMM figure 7-6 (from memory). */
const CE_KH: Table<readonly [number, number, number]> = [
  [25, 0.595, 0.0075],
  [30, 0.59, 0.0065],
  [40, 0.583, 0.0052],
  [50, 0.579, 0.0044],
  [60, 0.577, 0.0038],
  [70, 0.576, 0.0034],
  [80, 0.577, 0.0031],
  [90, 0.578, 0.0029],
  [100, 0.58, 0.0027],
];

export const WEIR_ANGLE_RANGE = [25, 100] as const;

let FT: number | undefined;
let CFS: number | undefined;
/** metres per foot and m³/s per ft³/s, through the units module (exact: 0.3048 m). */
function ftUnits(): { ft: number; cfs: number } {
  FT ??= toSI(1, 'ft', 'length');
  CFS ??= toSI(1, 'ft^3/s', 'flow');
  return { ft: FT, cfs: CFS };
}

/**
 * Metres → feet through the units module: ft = m/0.3048 (NIST SP 811).
 * @example
 * toFeet(0.1524)  // ≈ 0.5
 */
export function toFeet(m: number): number {
  return m / ftUnits().ft;
}

/**
 * Feet → metres through the units module: m = ft × 0.3048 (NIST SP 811).
 * @example k_h of a 90° notch
 * fromFeet(0.0029)  // ≈ 0.000884
 */
export function fromFeet(ft: number): number {
  return ft * ftUnits().ft;
}

/**
 * Ce and k_h (ft) at a notch angle, interpolated linearly in the table; angles clamped to 25°–100°.
 * Reference: USBR WMM figures 7-6a and 7-6b (readings from memory; the 90° values are the ones quoted with the manual).
 * @example
 * weirCoefficients(90).ce  // ≈ 0.578
 * weirCoefficients(90).khFt  // ≈ 0.0029
 */
export function weirCoefficients(angleDeg: number): { ce: number; khFt: number } {
  const a = Math.min(100, Math.max(25, angleDeg));
  const [p, q] = bracketRows(CE_KH, a);
  const w = (a - p[0]) / (q[0] - p[0]);
  return { ce: p[1] + (q[1] - p[1]) * w, khFt: p[2] + (q[2] - p[2]) * w };
}

/**
 * V-notch discharge by Kindsvater-Shen.
 * Formula: Q = 4.28·Ce·tan(θ/2)·(h₁ + k_h)^2.5 in ft and ft³/s, converted to SI.
 * Units: head m, angle degrees; returns m³/s. Range: 25°–100°, 0.2–1.25 ft head.
 * Reference: USBR Water Measurement Manual, ch. 7, eq. 7-3 (Kulin & Compton 1975).
 * @example 90°, h₁ = 0.5 ft (0.1524 m): 4.28 × 0.578 × 1 × 0.5029^2.5
 * fromSI(vNotchFlow(0.1524, 90), 'ft^3/s', 'flow')  // ≈ 0.4437
 * vNotchFlow(0.1524, 90)  // ≈ 0.012564
 * vNotchFlow(0.1524, 90) * 60000  // ≈ 754
 */
export function vNotchFlow(headM: number, angleDeg = 90): number {
  const { ft, cfs } = ftUnits();
  const { ce, khFt } = weirCoefficients(angleDeg);
  const hFt = headM / ft;
  const theta = (angleDeg * Math.PI) / 180;
  return 4.28 * ce * Math.tan(theta / 2) * Math.pow(hFt + khFt, 2.5) * cfs;
}

/**
 * 90° V-notch by the USBR simplified rating (Cone's formula): Q = 2.49·h₁^2.48 ft³/s.
 * Units: head m; returns m³/s. Range: as {@link vNotchFlow}.
 * Reference: USBR Water Measurement Manual, ch. 7 (90° V-notch equation).
 * @example h₁ = 1 ft and 0.5 ft
 * vNotch90Usbr(0.3048)  // ≈ 0.07051
 * fromSI(vNotch90Usbr(0.1524), 'ft^3/s', 'flow')  // ≈ 0.4463
 */
export function vNotch90Usbr(headM: number): number {
  const { ft, cfs } = ftUnits();
  return 2.49 * Math.pow(headM / ft, 2.48) * cfs;
}

/**
 * Head limits and full-contraction limits in metres, converted from the foot values in the module comment.
 * Reference: USBR WMM ch. 7 §7 (head limits; the contraction limits from memory).
 * @example 0.2 ft, 1.25 ft, P ≥ 1.5 ft, B ≥ 3 ft
 * weirLimits().minHeadM  // ≈ 0.061
 * weirLimits().maxHeadM  // ≈ 0.381
 * weirLimits().minCrestM  // ≈ 0.457
 * weirLimits().minWidthM  // ≈ 0.914
 */
export function weirLimits(): { minHeadM: number; maxHeadM: number; minCrestM: number; minWidthM: number } {
  const { ft } = ftUnits();
  return { minHeadM: 0.2 * ft, maxHeadM: 1.25 * ft, minCrestM: 1.5 * ft, minWidthM: 3 * ft };
}
