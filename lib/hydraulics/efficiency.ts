/**
 * Ram efficiency: the D'Aubuisson and Rankine definitions, and typical
 * bands by pump type against the lift ratio h/H.
 *
 * Definitions (Q drive flow entering the drive pipe, q delivered flow, H
 * fall and h lift, both measured from the pump):
 *   D'Aubuisson  η_D = q·h / (Q·H)            — energy out over energy in, heads from the pump
 *   Rankine      η_R = q·(h−H) / ((Q−q)·H)    — counts only the lift above the supply and the water wasted
 * Reference: both as defined in e.g. Krol, J. (1951), "The automatic
 * hydraulic ram", Proceedings of the Institution of Mechanical Engineers 165,
 * 53–73 (that the paper uses both definitions is from memory), and in ram
 * manuals such as Jeffery, T.D., Thomas, T.H., Smith, A.V., Glover, P.B. &
 * Fountain, P.D. (1992), Hydraulic Ram Pumps: A guide to ram pump water supply
 * systems, Intermediate Technology Publications (from memory).
 *
 * Typical bands (D'Aubuisson) — from memory, a summary of the trend that
 * ram handbooks and extension sheets report, not one published table:
 * efficiency is highest at low lift ratios and falls as the ratio grows.
 * As anchor points, the Water for the World technical note RWS.4.D.5
 * "Designing a Hydraulic Ram Pump" (USAID) tells designers to use
 * E = 0.66 for commercial rams and 0.33 for home-built ones (from memory: the
 * note was not found in the references searched); small homemade
 * PVC or galvanized rams run roughly 0.5–0.8 at low lift ratios and fall at
 * higher ratios. Beyond the last ratio listed the pump type is not expected
 * to deliver at all.
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

const row = (ratio: number, low: number, typical: number, high: number): EfficiencyBandRow => ({
  ratio,
  low,
  typical,
  high,
});

export const EFFICIENCY_BANDS: Record<PumpType, EfficiencyBand> = {
  homemade: {
    label: 'small homemade ram (PVC or galvanized fittings, ½"–2")',
    rows: [
      row(2, 0.55, 0.7, 0.8),
      row(3, 0.5, 0.65, 0.78),
      row(5, 0.42, 0.58, 0.72),
      row(7, 0.37, 0.52, 0.66),
      row(10, 0.3, 0.45, 0.6),
      row(15, 0.22, 0.36, 0.5),
      row(20, 0.15, 0.28, 0.42),
      row(30, 0.06, 0.15, 0.28),
      row(40, 0, 0, 0.12),
    ],
    source: 'from memory; anchored on Water for the World RWS.4.D.5 (E = 0.33 home-built)',
  },
  commercial: {
    label: 'manufactured cast or fabricated ram',
    rows: [
      row(2, 0.65, 0.8, 0.88),
      row(3, 0.62, 0.76, 0.85),
      row(5, 0.56, 0.7, 0.8),
      row(7, 0.5, 0.65, 0.76),
      row(10, 0.45, 0.6, 0.72),
      row(15, 0.38, 0.52, 0.65),
      row(20, 0.3, 0.45, 0.58),
      row(30, 0.18, 0.33, 0.47),
      row(45, 0.05, 0.15, 0.3),
      row(60, 0, 0, 0.12),
    ],
    source: 'from memory; anchored on Water for the World RWS.4.D.5 (E = 0.66 commercial)',
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
 * Reference: see module comment (from memory).
 * @example homemade at h/H = 7.25, a quarter of the way from the 7 row to the 10 row
 * // typical 0.52 + (0.45 − 0.52)·(0.25/3)
 * efficiencyBand('homemade', 7.25).typical  // ≈ 0.514
 * efficiencyBand('homemade', 7.25).low  // ≈ 0.364
 * efficiencyBand('homemade', 7.25).high  // ≈ 0.655
 * efficiencyBand('homemade', 40)  // → { low: 0, typical: 0, high: 0.12 }
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
 * Largest lift ratio h/H at which the pump type is expected to deliver (its typical efficiency reaches 0 there).
 * Reference: EFFICIENCY_BANDS (from memory).
 * @example homemade → 40, so at a 4 ft fall the ceiling is 160 ft
 * maxLiftRatio('homemade')  // ≈ 40
 * maxLiftRatio('homemade') * 4  // ≈ 160
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
