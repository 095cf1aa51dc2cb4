/**
 * Properties of fresh water and standard gravity, SI units.
 *
 * Table values (density, kinematic viscosity, speed of sound) follow
 * Munson, Young & Okiishi, "Fundamentals of Fluid Mechanics", Table B.2
 * "Physical properties of water (SI units)"; the values are recalled
 * (from memory), not copied from a scan. As a check found in print: the
 * density and kinematic viscosity rows agree with Venard, J.K. & Street, R.L.
 * (1975), Elementary Fluid Mechanics, 5th ed., Wiley, as tabulated in
 * Crittenden et al. (2012), MWH's Water Treatment: Principles and Design,
 * 3rd ed., Table C-1 (e.g. 10 °C: 999.7 kg/m³, 1.306e-6 m²/s; 20 °C: 998.2,
 * 1.003e-6 against our 1.004e-6); other tables give 1.307–1.308e-6 at 10 °C,
 * so the last digit is uncertain. The bulk modulus is derived from the table's
 * speed of sound, K = ρ·c², which gives 2.19 GPa at 20 °C — the value
 * Wylie & Streeter, "Fluid Transients" use for water (from memory).
 */

import { bracketRows, type Table } from './tables';

/** Standard acceleration of gravity, m/s² (exact; NIST SP 811, 2008, and NIST SP 330). */
export const G = 9.80665;

/** [°C, ρ kg/m³, ν m²/s, c m/s] — Munson/Young/Okiishi Table B.2 (from memory). */
const TABLE: Table<readonly [number, number, number, number]> = [
  [0, 999.9, 1.787e-6, 1403],
  [5, 1000.0, 1.519e-6, 1427],
  [10, 999.7, 1.306e-6, 1447],
  [20, 998.2, 1.004e-6, 1481],
  [30, 995.7, 8.009e-7, 1507],
  [40, 992.2, 6.58e-7, 1526],
];

export interface WaterProperties {
  temperatureC: number;
  /** density ρ, kg/m³ */
  densityKgM3: number;
  /** kinematic viscosity ν, m²/s */
  kinematicViscosityM2s: number;
  /** speed of sound in unconfined water, m/s */
  soundSpeedMs: number;
  /** bulk modulus K = ρc², Pa */
  bulkModulusPa: number;
  /** specific weight γ = ρg, N/m³ */
  specificWeightNm3: number;
}

const cache = new Map<number, WaterProperties>();

/**
 * Properties of water at a temperature, linearly interpolated in the table.
 *
 * Formula: p(T) = p₁ + (p₂ − p₁)(T − T₁)/(T₂ − T₁) between table rows; K = ρ·c²; γ = ρ·g.
 * Parameters: temperatureC in °C, 0 ≤ T ≤ 40 (clamped to that range).
 * Reference: Munson, Young & Okiishi, Fundamentals of Fluid Mechanics, Table B.2 (from memory).
 * @example 15 °C lies halfway between the 10 and 20 °C rows
 * waterProperties(15).densityKgM3  // ≈ 998.95
 * waterProperties(15).kinematicViscosityM2s  // ≈ 1.155e-6
 * // at 20 °C, K = ρc² = 998.2 × 1481² — the 2.19 GPa of Wylie & Streeter
 * waterProperties(20).bulkModulusPa  // ≈ 2.19e9
 */
export function waterProperties(temperatureC = 10): WaterProperties {
  const t = Math.min(40, Math.max(0, Number.isFinite(temperatureC) ? temperatureC : 10));
  const hit = cache.get(t);
  if (hit) return hit;
  const [a, b] = bracketRows(TABLE, t);
  const w = (t - a[0]) / (b[0] - a[0]);
  const lerp = (k: 1 | 2 | 3) => a[k] + (b[k] - a[k]) * w;
  const rho = lerp(1);
  const c = lerp(3);
  const props: WaterProperties = {
    temperatureC: t,
    densityKgM3: rho,
    kinematicViscosityM2s: lerp(2),
    soundSpeedMs: c,
    bulkModulusPa: rho * c * c,
    specificWeightNm3: rho * G,
  };
  if (cache.size < 512) cache.set(t, props);
  return props;
}
