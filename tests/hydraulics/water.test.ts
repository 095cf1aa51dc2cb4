import { describe, expect, it } from 'vitest';
import { G, toSI, waterProperties } from '@/lib/hydraulics';

describe('water properties', () => {
  it('at 10 °C', () => {
    const w = waterProperties(10);
    // Munson, Young & Okiishi, Fundamentals of Fluid Mechanics, Table B.2: ρ = 999.7 kg/m³ (from memory)
    expect(w.densityKgM3).toBeCloseTo(999.7, 1);
    // same table: ν = 1.306e-6 m²/s (from memory; other tables give 1.307e-6, hence 0.2 %)
    expect(Math.abs(w.kinematicViscosityM2s / 1.306e-6 - 1)).toBeLessThan(0.002);
  });
  it('at 20 °C', () => {
    const w = waterProperties(20);
    // Munson, Young & Okiishi, Table B.2: ρ = 998.2 kg/m³, ν = 1.004e-6 m²/s (from memory)
    expect(w.densityKgM3).toBeCloseTo(998.2, 1);
    expect(Math.abs(w.kinematicViscosityM2s / 1.004e-6 - 1)).toBeLessThan(0.002);
    // Wylie & Streeter, Fluid Transients in Systems (1993): K = 2.19 GPa for water at 20 °C (from memory)
    expect(w.bulkModulusPa / 1e9).toBeCloseTo(2.19, 2);
    // speed of sound in water at 20 °C ≈ 1481 m/s (Munson Table B.2, from memory)
    expect(Math.sqrt(w.bulkModulusPa / w.densityKgM3)).toBeCloseTo(1481, 0);
  });
  it('1 ft of water ≈ 0.433 psi', () => {
    // common practice, no source: "a foot of water column is 0.433 psi"
    const psiPerFt = (waterProperties(10).densityKgM3 * G * toSI(1, 'ft', 'length')) / toSI(1, 'psi', 'pressure');
    expect(psiPerFt).toBeCloseTo(0.433, 3);
  });
  it('standard gravity', () => {
    // NIST SP 811 (2008), B.8 / SP 330: g_n = 9.80665 m/s² (exact)
    expect(G).toBe(9.80665);
  });
});
