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
 * Reference: Korteweg, D.J. (1878), "Über die Fortpflanzungsgeschwindigkeit des
 * Schalles in elastischen Röhren", Annalen der Physik und Chemie; Wylie, E.B.,
 * Streeter, V.L. & Suo, L. (1993), Fluid Transients in Systems, Prentice Hall,
 * ch. 2 (section from memory).
 * @example 1" sch 40 pipe, D = 26.64 mm, e = 3.378 mm, water at 20 °C (K = 2.19 GPa, ρ = 998.2)
 * // steel, E = 200 GPa: K·D/(E·e) = 0.0863 → c = 1481/√1.0863
 * waveSpeed(2.19e9, 998.2, 0.02664, 200e9, 0.003378)  // ≈ 1421
 * // PVC, E = 2.76 GPa: K·D/(E·e) = 6.26 → c = 1481/√7.26
 * waveSpeed(2.19e9, 998.2, 0.02664, 2.76e9, 0.003378)  // ≈ 550
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
 * Reference: Joukowsky, N. (1900), "Über den hydraulischen Stoss in Wasserleitungsröhren",
 * Mémoires de l'Académie Impériale des Sciences de St.-Pétersbourg; Wylie,
 * Streeter & Suo (1993), ch. 1 (section from memory).
 * @example ≈ 10 bar (≈ 102 m of head) per m/s in a 1000 m/s pipe, the usual rule of thumb
 * joukowskySurge(998.2, 1000, 1)  // ≈ 998200
 */
export function joukowskySurge(densityKgM3: number, waveSpeedMs: number, deltaVelocityMs: number): number {
  return densityKgM3 * waveSpeedMs * deltaVelocityMs;
}

/**
 * Surge as head, Δh = c·Δv/g, m. Units: c, Δv m/s. Reference: as {@link joukowskySurge}.
 * @example
 * joukowskyHead(1000, 1)  // ≈ 102.0
 */
export function joukowskyHead(waveSpeedMs: number, deltaVelocityMs: number): number {
  return (waveSpeedMs * deltaVelocityMs) / G;
}

/**
 * Round-trip time of the pressure wave along the drive pipe, t = 2L/c, s.
 * A closure faster than this sees the full Joukowsky rise; the reflected
 * wave from the intake ends each pressure pulse after this time.
 * Units: L m, c m/s. Reference: Wylie & Streeter (1993), ch. 1 (from memory).
 * @example 20 ft of 1" PVC drive pipe
 * waveRoundTrip(6.1, 550)  // ≈ 0.0222
 */
export function waveRoundTrip(lengthM: number, waveSpeedMs: number): number {
  return (2 * lengthM) / waveSpeedMs;
}

/**
 * Surge for a closure slower than 2L/c (Michaud's approximation):
 *   Δp ≈ 2·ρ·L·Δv / t_c  (never more than the Joukowsky value).
 * Units: ρ kg/m³, L m, Δv m/s, t_c s. Range: t_c > 2L/c, else the full Joukowsky rise.
 * Reference: Michaud, J. (1878), "Coups de bélier dans les conduites", Bulletin de la
 * Société Vaudoise des Ingénieurs et des Architectes; as given in Wylie & Streeter
 * (1993), ch. 1 (from memory).
 * @example L = 6.1 m, Δv = 1 m/s, c = 550 m/s: 2ρLΔv/t_c, and a closure faster than 2L/c
 * slowClosureSurge(998.2, 6.1, 1, 0.05, 550)  // ≈ 2.436e5
 * slowClosureSurge(998.2, 6.1, 1, 0.01, 550)  // ≈ 549010
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
