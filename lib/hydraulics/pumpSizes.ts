/**
 * Typical drive flow by pump (drive pipe) size.
 *
 * Common practice, no published source found: the ranges are the order of magnitude that ram handbooks and
 * extension sheets give, roughly in proportion to the bore area (a ½-inch
 * pump uses about 1–3 US gal/min, a 4-inch pump some 45–130); the actual
 * drive flow of an installation depends on its fall, drive pipe and waste
 * valve setting, so measure it, or estimate it for the site with
 * estimateDriveFlow (ramCycle.ts). Used to flag a drive flow that is far
 * out of line for the size.
 */
import type { NominalSize } from './pipes';
import { toSI } from './units';

/** [low, high] typical drive flow in US gal/min — common practice, no published source found. */
const RANGES_GPM: Record<NominalSize, readonly [number, number]> = {
  '1/2': [1, 3],
  '3/4': [2, 5],
  '1': [3, 8],
  '1-1/4': [5, 14],
  '1-1/2': [7, 20],
  '2': [12, 35],
  '2-1/2': [18, 50],
  '3': [25, 75],
  '4': [45, 130],
};

export interface DriveFlowRange {
  lowM3s: number;
  highM3s: number;
  source: string;
}

/**
 * Searched for (Dec 2026): a table of drive flow by ram size in an extension bulletin or handbook. The
 * University of Georgia Cooperative Extension bulletin "Hydraulic Rams for Off-Stream Livestock Watering"
 * was found but its table could not be read to check; the one table found in a period handbook was a
 * pump maker's and is not used. Jeffery, T.D. et al., "Hydraulic Ram Pumps: A guide to ram pump water
 * supply systems" (IT Publications, 1992) was found but not its table; Watt (1975) was not found. One
 * cross-check only: Development Technology Unit, University of Warwick, Working Paper 33 (1992) runs its
 * pumps on a 2-inch drive pipe from about 40 L/min of drive flow (the upper figure is unreadable in the copy
 * found), near the 2-inch low end here (12 US gal/min, 45 L/min). So the ranges stay common practice.
 */
export const PUMP_SIZE_SOURCE =
  'common practice, no published source found (no extension or handbook table of drive flow by size could be verified); measure the drive flow, or estimate it for the site';

let table: Record<NominalSize, DriveFlowRange> | undefined;

/**
 * Typical drive flow range for each pump size, m³/s (1 US gal = 231 in³). Reference: module comment (common practice, no published source found).
 * @example 1¼" → 5–14 US gal/min
 * pumpSizeTable()['1-1/4'].lowM3s  // ≈ 3.15e-4
 * pumpSizeTable()['1-1/4'].highM3s  // ≈ 8.83e-4
 */
export function pumpSizeTable(): Record<NominalSize, DriveFlowRange> {
  if (table) return table;
  const t = {} as Record<NominalSize, DriveFlowRange>;
  for (const [size, [lo, hi]] of Object.entries(RANGES_GPM) as [NominalSize, readonly [number, number]][]) {
    t[size] = { lowM3s: toSI(lo, 'gal/min', 'flow'), highM3s: toSI(hi, 'gal/min', 'flow'), source: PUMP_SIZE_SOURCE };
  }
  table = t;
  return t;
}

/**
 * Typical drive flow range of one size, m³/s. Reference: module comment (common practice, no published source found).
 * @example ½" → 1–3 US gal/min
 * typicalDriveFlow('1/2').lowM3s  // ≈ 6.309e-5
 * typicalDriveFlow('1/2').highM3s  // ≈ 1.893e-4
 */
export function typicalDriveFlow(size: NominalSize): DriveFlowRange {
  return pumpSizeTable()[size];
}
