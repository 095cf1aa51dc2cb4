/**
 * Ram efficiency: the D'Aubuisson and Rankine definitions, the published
 * tables of efficiency against the lift ratio h/H, and the typical bands by
 * pump type derived from them.
 *
 * Definitions (Q drive flow entering the drive pipe, q delivered flow, H
 * fall and h lift, both measured from the pump):
 *   D'Aubuisson  η_D = q·h / (Q·H)            — energy out over energy in, heads from the pump
 *   Rankine      η_R = q·(h−H) / ((Q−q)·H)    — counts only the lift above the supply and the water wasted
 * Reference: both as defined in e.g. Krol, J. (1951), "The automatic
 * hydraulic ram", Proceedings of the Institution of Mechanical Engineers 165,
 * 53–73 (that the paper uses both definitions is from memory).
 *
 * The published tables found (EFFICIENCY_SOURCES, each with its citation):
 *  - Building Trades Pocketbook (International Textbook Company, Scranton;
 *    editions 1899–1905), "Water Supply and Distribution — The Hydraulic Ram":
 *    efficiency against the ratio of lift to fall, 72 % at 4 falling to 0 at 26
 *    (the scanned copy prints "10" between 14 and 18; read as 16, the only
 *    value that keeps the ratios in steps of 2). The same page's rule — about
 *    1/7 of the supply to five times the fall, 1/14 to ten times — is kept as a
 *    second, separate series.
 *  - Water for the World, Technical Note RWS.4.D.5 (USAID): D = S·F·E/L with
 *    E = 0.66 for commercial rams and 0.33 for home-built ones, as reproduced in
 *    "Hydram Pump Calculations", The Free On-line Aquaculture Dictionary
 *    (aquatext.com). Flat, no dependence on the ratio.
 * Watt (1975, ITDG), Inversin (1985, VITA) and Jeffery et al. (1992, IT
 * Publications) were looked for; no table of theirs was found in the
 * references searched, so none is used.
 *
 * Typical bands derived from them (EFFICIENCY_BANDS):
 *  - commercial: typical = the Pocketbook table; high = the Pocketbook's own
 *    rule where it is higher (ratios 5–10); low = half the table (the
 *    0.33/0.66 home-built to commercial ratio of Water for the World).
 *  - homemade: typical = the Pocketbook table × 0.33/0.66 (Water for the World's
 *    home-built to commercial ratio); high = the table itself (a well-made
 *    homemade ram can match a manufactured one); low = a quarter of the table
 *    (common practice, no published source: half the homemade typical, so only
 *    a pump doing markedly worse is flagged).
 * Both reach zero at a ratio of 26, where the Pocketbook table does: that is
 * the maximum usable lift ratio. Below a ratio of 4 (the first row) the first
 * row holds.
 */

import { PUMP_TYPES, type PumpType } from '../vocabulary';

export { PUMP_TYPES, type PumpType };

export interface EfficiencyBandRow {
  /** lift ratio h/H */
  ratio: number;
  low: number;
  typical: number;
  high: number;
}

export interface EfficiencyBand {
  label: string;
  /** sorted by ratio; never empty */
  rows: readonly [EfficiencyBandRow, ...EfficiencyBandRow[]];
  source: string;
}

/** One published series of efficiency against lift ratio, as printed, for a chart with its source under it. */
export interface EfficiencySource {
  id: string;
  /** what the series is, in a few words */
  label: string;
  /** author or publisher, title, year, table or page: shown under the chart */
  citation: string;
  /** which pump type the series describes */
  pumpType: PumpType;
  /** [lift ratio h/H, D'Aubuisson efficiency] pairs, sorted by ratio */
  points: readonly (readonly [number, number])[];
  note?: string;
}

const POCKETBOOK =
  'International Textbook Company, Building Trades Pocketbook (Scranton, editions 1899–1905), "Water Supply and Distribution — The Hydraulic Ram"';
const WATER_FOR_THE_WORLD =
  'Water for the World, Technical Note RWS.4.D.5 "Designing a Hydraulic Ram Pump" (USAID), as reproduced in "Hydram Pump Calculations", The Free On-line Aquaculture Dictionary (aquatext.com)';

/** Building Trades Pocketbook: ratio of lift to fall → per cent efficiency. */
const POCKETBOOK_TABLE: readonly (readonly [number, number])[] = [
  [4, 0.72],
  [6, 0.61],
  [8, 0.52],
  [10, 0.44],
  [12, 0.37],
  [14, 0.31],
  [16, 0.25],
  [18, 0.19],
  [20, 0.14],
  [22, 0.09],
  [24, 0.04],
  [26, 0],
];

/** The published series, as printed; the bands below are derived from them. */
export const EFFICIENCY_SOURCES: readonly EfficiencySource[] = [
  {
    id: 'pocketbook-table',
    label: 'efficiency against ratio of lift to fall',
    pumpType: 'commercial',
    citation: `${POCKETBOOK}, table of per cent efficiency against ratio of lift to fall`,
    points: POCKETBOOK_TABLE,
    note: 'the scanned copy prints "10" between 14 and 18; read as 16',
  },
  {
    id: 'pocketbook-rule',
    label: 'about 1/7 of the supply to 5 × the fall, 1/14 to 10 ×',
    pumpType: 'commercial',
    citation: `${POCKETBOOK}, rule for a ram with a discharge pipe 80–100 ft long`,
    points: [
      [5, 5 / 7],
      [10, 10 / 14],
    ],
  },
  {
    id: 'water-for-the-world-commercial',
    label: 'design efficiency, commercial rams',
    pumpType: 'commercial',
    citation: `${WATER_FOR_THE_WORLD}: E = 0.66 for commercial rams`,
    points: [
      [2, 0.66],
      [26, 0.66],
    ],
    note: 'one figure for every ratio',
  },
  {
    id: 'water-for-the-world-homemade',
    label: 'design efficiency, home-built rams',
    pumpType: 'homemade',
    citation: `${WATER_FOR_THE_WORLD}: E = 0.33 for home-built rams`,
    points: [
      [2, 0.33],
      [26, 0.33],
    ],
    note: 'one figure for every ratio',
  },
];

/** Water for the World's home-built to commercial ratio, 0.33/0.66. */
export const HOMEMADE_SHARE = 0.33 / 0.66;

const row = (ratio: number, low: number, typical: number, high: number): EfficiencyBandRow => ({
  ratio,
  low,
  typical,
  high,
});

/** The Pocketbook rule (5/7 at 5, 10/14 at 10) where it applies, else undefined. */
function pocketbookRule(ratio: number): number | undefined {
  return ratio >= 5 && ratio <= 10 ? 5 / 7 : undefined;
}

/** Pocketbook table at a ratio, linear between its rows (the ratio 5 row of the bands falls between 4 and 6). */
function pocketbookAt(ratio: number): number {
  let a = POCKETBOOK_TABLE[0] ?? [4, 0.72];
  for (const b of POCKETBOOK_TABLE) {
    if (b[0] >= ratio) return b[0] === a[0] ? b[1] : a[1] + ((b[1] - a[1]) * (ratio - a[0])) / (b[0] - a[0]);
    a = b;
  }
  return 0;
}

const BAND_RATIOS = [4, 5, 6, 8, 10, 12, 14, 16, 18, 20, 22, 24, 26] as const;

function derivedRows(pumpType: PumpType): EfficiencyBand['rows'] {
  const rows = BAND_RATIOS.map((r) => {
    const t = pocketbookAt(r);
    if (pumpType === 'commercial') return row(r, t * HOMEMADE_SHARE, t, Math.max(t, pocketbookRule(r) ?? 0));
    return row(r, t * HOMEMADE_SHARE * 0.5, t * HOMEMADE_SHARE, t);
  });
  return rows as unknown as EfficiencyBand['rows'];
}

export const EFFICIENCY_BANDS: Record<PumpType, EfficiencyBand> = {
  homemade: {
    label: 'small homemade ram (PVC or galvanized fittings, ½"–2")',
    rows: derivedRows('homemade'),
    source:
      'Building Trades Pocketbook table (International Textbook Co., 1899–1905) × 0.33/0.66 from Water for the World RWS.4.D.5; low edge common practice, no published source',
  },
  commercial: {
    label: 'manufactured cast or fabricated ram',
    rows: derivedRows('commercial'),
    source:
      'Building Trades Pocketbook table and rule (International Textbook Co., 1899–1905); low edge × 0.33/0.66 from Water for the World RWS.4.D.5',
  },
};

export interface BandAtRatio {
  low: number;
  typical: number;
  high: number;
}

/**
 * Typical D'Aubuisson efficiency band at a lift ratio, by linear
 * interpolation in {@link EFFICIENCY_BANDS}; below the first ratio the first
 * row holds, beyond the last the pump is not expected to deliver (0).
 * Units: dimensionless. Range: ratio > 1.
 * Reference: the Building Trades Pocketbook table and Water for the World
 * RWS.4.D.5, combined as the module comment says.
 * @example homemade at h/H = 7.25, five eighths of the way from the 6 row to the 8 row
 * // Pocketbook: 0.61 + (0.52 − 0.61)·0.625 = 0.5538; homemade typical = × 0.33/0.66
 * efficiencyBand('homemade', 7.25).typical  // ≈ 0.2769
 * efficiencyBand('homemade', 7.25).low  // ≈ 0.1384
 * efficiencyBand('homemade', 7.25).high  // ≈ 0.5538
 * // commercial: the table itself, and the Pocketbook rule 5/7 above it from 5 to 10
 * efficiencyBand('commercial', 20).typical  // ≈ 0.14
 * efficiencyBand('commercial', 8).high  // ≈ 0.7143
 * efficiencyBand('homemade', 40)  // → { low: 0, typical: 0, high: 0 }
 */
export function efficiencyBand(pumpType: PumpType, liftRatio: number): BandAtRatio {
  const rows = EFFICIENCY_BANDS[pumpType].rows;
  const first = rows[0];
  if (liftRatio <= first.ratio) return { low: first.low, typical: first.typical, high: first.high };
  const last = lastRow(rows);
  if (liftRatio >= last.ratio) return { low: 0, typical: 0, high: last.high };
  // first.ratio < liftRatio < last.ratio: interpolate in the first pair whose upper row reaches it
  let a = first;
  for (const b of rows) {
    if (b.ratio >= liftRatio) {
      const w = (liftRatio - a.ratio) / (b.ratio - a.ratio);
      return {
        low: a.low + (b.low - a.low) * w,
        typical: a.typical + (b.typical - a.typical) * w,
        high: a.high + (b.high - a.high) * w,
      };
    }
    a = b;
  }
  return { low: 0, typical: 0, high: last.high };
}

function lastRow(rows: EfficiencyBand['rows']): EfficiencyBandRow {
  return rows[rows.length - 1] ?? rows[0];
}

/**
 * Largest lift ratio h/H at which the pump type is expected to deliver: where
 * the Building Trades Pocketbook table falls to zero efficiency.
 * Reference: Building Trades Pocketbook (International Textbook Co., 1899–1905), hydraulic ram table.
 * @example 26 for both types, so at a 4 ft fall the ceiling is 104 ft
 * maxLiftRatio('homemade')  // ≈ 26
 * maxLiftRatio('commercial') * 4  // ≈ 104
 */
export function maxLiftRatio(pumpType: PumpType): number {
  return lastRow(EFFICIENCY_BANDS[pumpType].rows).ratio;
}

/**
 * D'Aubuisson efficiency η_D = q·h/(Q·H), dimensionless.
 * Units: q, Q m³/s (any one unit); h, H m. Range: 0 < q < Q, h > H > 0.
 * Reference: the definition in the module comment.
 * @example Q = 2 US gal/min, q = 500 mL/min, H = 4 ft, h = 29 ft
 * // q/Q = 8.333e-6/1.2618e-4 = 0.06604 → η_D = 0.06604 × 29/4
 * dAubuissonEfficiency(toSI(2, 'gal/min', 'flow'), toSI(500, 'mL/min', 'flow'), 4, 29)  // ≈ 0.479
 */
export function dAubuissonEfficiency(driveFlow: number, deliveredFlow: number, fall: number, lift: number): number {
  return (deliveredFlow * lift) / (driveFlow * fall);
}

/**
 * Rankine efficiency η_R = q·(h − H)/((Q − q)·H), dimensionless.
 * Units as {@link dAubuissonEfficiency}. Range: 0 < q < Q, h > H > 0.
 * Reference: the definition in the module comment.
 * @example numbers as above: 8.333e-6 × 25 / ((1.2618e-4 − 8.333e-6) × 4)
 * rankineEfficiency(toSI(2, 'gal/min', 'flow'), toSI(500, 'mL/min', 'flow'), 4, 29)  // ≈ 0.442
 */
export function rankineEfficiency(driveFlow: number, deliveredFlow: number, fall: number, lift: number): number {
  return (deliveredFlow * (lift - fall)) / ((driveFlow - deliveredFlow) * fall);
}
