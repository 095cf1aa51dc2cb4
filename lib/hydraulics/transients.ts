/**
 * Water hammer: pressure-wave speed in a pipe and the Joukowsky surge.
 * The same surge that drives a ram can split an unsuitable drive pipe.
 */
import { G } from './water';

/**
 * Pressure-wave speed in a liquid-filled elastic pipe (Korteweg):
 *   c = √( (K/ρ) / (1 + K·D/(E·e)) ).
 * Units: K bulk modulus of water Pa, ρ kg/m³, D inside diameter m, E pipe
 * Young's modulus Pa, e wall thickness m; c in m/s.
 * Range: thin-walled pipe (D/e ≳ 10) without axial restraint correction; for
 * thick walls (small plastic pipe, D/e ≈ 5–10) it errs a few per cent low.
 * A rigid pipe (E → ∞) gives √(K/ρ) ≈ 1481 m/s at 20 °C, the speed of
 * sound in water.
 * Worked example: 1" sch 40 steel, D = 26.64 mm, e = 3.378 mm, E = 200 GPa,
 * K = 2.19 GPa, ρ = 998.2 kg/m³: K·D/(E·e) = 0.0863 → c = 1481/√1.0863 = 1421 m/s.
 * Same size in PVC (E = 2.76 GPa): K·D/(E·e) = 6.26 → c = 550 m/s.
 * Reference: Korteweg (1878); Wylie & Streeter, Fluid Transients in Systems (1993), §2.4 (from memory).
 */
export function waveSpeed(
  bulkModulusPa: number,
  densityKgM3: number,
  insideDiameterM: number,
  youngsModulusPa: number,
  wallThicknessM: number,
): number {
  const stiffness = (bulkModulusPa * insideDiameterM) / (youngsModulusPa * wallThicknessM);
  return Math.sqrt(bulkModulusPa / densityKgM3 / (1 + stiffness));
}

/**
 * Joukowsky pressure rise for an instant stop of velocity Δv:
 *   Δp = ρ·c·Δv  (Pa),  or as head  Δh = c·Δv/g  (m).
 * Units: ρ kg/m³, c m/s, Δv m/s. Range: valve closure faster than the wave
 * round trip 2L/c; slower closure gives less (see {@link slowClosureSurge}).
 * Worked example: ρ = 998.2, c = 1000 m/s, Δv = 1 m/s → Δp = 998,200 Pa ≈ 10 bar
 * (≈ 102 m of head) — the "10 bar per metre per second" rule of thumb.
 * Reference: Joukowsky, N. (1900), "Über den hydraulischen Stoss in Wasserleitungsröhren";
 * Wylie & Streeter (1993), eq. 1.1 (from memory).
 */
export function joukowskySurge(densityKgM3: number, waveSpeedMs: number, deltaVelocityMs: number): number {
  return densityKgM3 * waveSpeedMs * deltaVelocityMs;
}

/** Surge as head, Δh = c·Δv/g, m. Worked example: c = 1000 m/s, Δv = 1 m/s → 102.0 m. */
export function joukowskyHead(waveSpeedMs: number, deltaVelocityMs: number): number {
  return (waveSpeedMs * deltaVelocityMs) / G;
}

/**
 * Round-trip time of the pressure wave along the drive pipe, t = 2L/c, s.
 * A closure faster than this sees the full Joukowsky rise; the reflected
 * wave from the intake ends each pressure pulse after this time.
 * Worked example: L = 6.1 m, c = 550 m/s → 0.0222 s.
 * Reference: Wylie & Streeter (1993), §1.2 (from memory).
 */
export function waveRoundTrip(lengthM: number, waveSpeedMs: number): number {
  return (2 * lengthM) / waveSpeedMs;
}

/**
 * Surge for a closure slower than 2L/c (Michaud's approximation):
 *   Δp ≈ 2·ρ·L·Δv / t_c  (never more than the Joukowsky value).
 * Units: ρ kg/m³, L m, Δv m/s, t_c s. Worked example: L = 6.1 m, Δv = 1 m/s,
 * t_c = 0.05 s, ρ = 998.2 → 243,600 Pa.
 * Reference: Michaud (1878), as given in Wylie & Streeter (1993), §1.2 (from memory).
 */
export function slowClosureSurge(
  densityKgM3: number,
  lengthM: number,
  deltaVelocityMs: number,
  closureTimeS: number,
  waveSpeedMs: number,
): number {
  const full = joukowskySurge(densityKgM3, waveSpeedMs, deltaVelocityMs);
  if (closureTimeS <= waveRoundTrip(lengthM, waveSpeedMs)) return full;
  return Math.min(full, (2 * densityKgM3 * lengthM * deltaVelocityMs) / closureTimeS);
}
