/**
 * Per-unit water demand rates.
 *
 * Household: the U.S. Geological Survey puts home use at about 80–100 US
 * gallons per person per day (USGS Water Science School, "How much water do
 * I use at home each day?" — from memory), and average domestic use in 2015
 * at 82 gal per person per day (Dieter, C.A. & Maupin, M.A. (2017), "Public
 * Supply and Domestic Water Use in the United States, 2015", USGS Open-File
 * Report 2017–1131; also in Dieter et al. (2018), USGS Circular 1441). A
 * frugal off-grid home uses far less; the rate is an input.
 * Livestock: typical drinking water per head per day in warm weather, in
 * line with the tables in US extension publications, e.g. Meehan, M.A.,
 * Stokka, G. & Mostrom, M. (2021), "Livestock Water Requirements", North
 * Dakota State University Extension AS1763 (earlier AS-954; its beef-cow
 * figures are 14–16.5 US gal at 88 °F) — our values are from memory, not
 * copied from its tables; needs rise steeply with heat and lactation. Milking
 * cows follow the NDSU figures quoted at the table (found); chickens, 9 US gal
 * per 100 birds (0.34 L each, laying hens in hot weather), stay from memory.
 * Garden: about 1 inch (25.4 mm) of water a week in the growing season —
 * common practice, no source.
 */
import { toSI } from './units';

export const LIVESTOCK_KINDS = ['beef-cow', 'dairy-cow', 'horse', 'sheep', 'goat', 'pig', 'chickens-per-100'] as const;
export type LivestockKind = (typeof LIVESTOCK_KINDS)[number];

/** [typical, low, high] US gal per head (or per 100 birds) per day — from memory. */
const LIVESTOCK_GAL: Record<LivestockKind, readonly [number, number, number]> = {
  'beef-cow': [15, 8, 20],
  // NDSU Extension news release "Water Vital for Livestock During Droughts" (1 May 2008), lactating 1,400 lb
  // cows at 80 °F: 17.9 gal (20 lb milk a day) to 45.7 gal (100 lb); 38.7 gal at 80 lb taken as typical
  'dairy-cow': [38.7, 17.9, 45.7],
  horse: [12, 8, 15],
  sheep: [2, 1, 3],
  goat: [2, 1, 3],
  pig: [4, 2, 8],
  'chickens-per-100': [9, 5, 10],
};

export interface Rate {
  typicalM3PerDay: number;
  lowM3PerDay: number;
  highM3PerDay: number;
  source: string;
}

let livestockSI: Record<LivestockKind, Rate> | undefined;

/**
 * Livestock rates in m³/day (1 US gal = 231 in³). Reference: module comment (from memory).
 * @example beef cow 15 US gal/day
 * livestockRates()['beef-cow'].typicalM3PerDay  // ≈ 0.05678
 */
export function livestockRates(): Record<LivestockKind, Rate> {
  if (livestockSI) return livestockSI;
  const gal = (x: number) => toSI(x, 'gal', 'volume');
  const t = {} as Record<LivestockKind, Rate>;
  for (const k of LIVESTOCK_KINDS) {
    const [typ, lo, hi] = LIVESTOCK_GAL[k];
    t[k] = {
      typicalM3PerDay: gal(typ),
      lowM3PerDay: gal(lo),
      highM3PerDay: gal(hi),
      source: 'US extension livestock water tables (from memory)',
    };
  }
  livestockSI = t;
  return t;
}

let household: Rate | undefined;

/**
 * Household use per person, m³/day: 80 (80–100) US gal. Reference: USGS (module comment).
 * @example
 * householdRate().typicalM3PerDay  // ≈ 0.3028
 * householdRate().highM3PerDay  // ≈ 0.3785
 */
export function householdRate(): Rate {
  household ??= {
    typicalM3PerDay: toSI(80, 'gal', 'volume'),
    lowM3PerDay: toSI(80, 'gal', 'volume'),
    highM3PerDay: toSI(100, 'gal', 'volume'),
    source: 'USGS Water Science School; USGS Circular 1441 (from memory)',
  };
  return household;
}

/** Garden water depth per week, m: 1 inch = 0.0254 m (common practice, no source). */
export const GARDEN_DEPTH_PER_WEEK_M = 0.0254;
