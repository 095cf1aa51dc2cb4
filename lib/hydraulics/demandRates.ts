/**
 * Per-unit water demand rates.
 *
 * Household: the U.S. Geological Survey puts home use at about 80–100 US
 * gallons per person per day (USGS Water Science School, "How much water do
 * I use at home each day?"), and domestic per-capita use in 2015 at 82
 * gal/day (Dieter et al., 2018, "Estimated Use of Water in the United States
 * in 2015", USGS Circular 1441) — both from memory. A frugal off-grid home
 * uses far less; the rate is an input.
 * Livestock: typical drinking water per head per day in warm weather, in
 * line with the tables in US extension publications (e.g. North Dakota
 * State University Extension, "Livestock Water Requirements", AS-954) —
 * values from memory; needs rise steeply with heat and lactation.
 * Garden: about 1 inch (25.4 mm) of water a week in the growing season —
 * common practice, no source.
 */
import { toSI } from './units';

export const LIVESTOCK_KINDS = [
  'beef-cow',
  'dairy-cow',
  'horse',
  'sheep',
  'goat',
  'pig',
  'chickens-per-100',
] as const;
export type LivestockKind = (typeof LIVESTOCK_KINDS)[number];

/** [typical, low, high] US gal per head (or per 100 birds) per day — from memory. */
const LIVESTOCK_GAL: Record<LivestockKind, readonly [number, number, number]> = {
  'beef-cow': [15, 8, 20],
  'dairy-cow': [35, 20, 50],
  horse: [12, 8, 15],
  sheep: [2, 1, 3],
  goat: [2, 1, 3],
  pig: [4, 2, 8],
  'chickens-per-100': [9, 5, 10],
};

export const LIVESTOCK_LABELS: Record<LivestockKind, string> = {
  'beef-cow': 'beef cow',
  'dairy-cow': 'dairy cow (milking)',
  horse: 'horse',
  sheep: 'sheep (ewe)',
  goat: 'goat',
  pig: 'pig (growing–finishing)',
  'chickens-per-100': 'chickens, per 100 laying hens',
};

export interface Rate {
  typicalM3PerDay: number;
  lowM3PerDay: number;
  highM3PerDay: number;
  source: string;
}

let livestockSI: Record<LivestockKind, Rate> | undefined;

/** Livestock rates in m³/day. Example: beef cow 15 US gal/day = 0.05678 m³/day. */
export function livestockRates(): Record<LivestockKind, Rate> {
  if (livestockSI) return livestockSI;
  const gal = (x: number) => toSI(x, 'gal', 'volume');
  const t = {} as Record<LivestockKind, Rate>;
  for (const k of LIVESTOCK_KINDS) {
    const [typ, lo, hi] = LIVESTOCK_GAL[k];
    t[k] = { typicalM3PerDay: gal(typ), lowM3PerDay: gal(lo), highM3PerDay: gal(hi), source: 'US extension livestock water tables (from memory)' };
  }
  livestockSI = t;
  return t;
}

let household: Rate | undefined;

/** Household use per person, m³/day: 80 (80–100) US gal = 0.3028 m³/day. USGS (from memory). */
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
