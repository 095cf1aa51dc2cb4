/**
 * Pipe friction: Reynolds number, Darcy friction factor (laminar,
 * Colebrook-White, Swamee-Jain), Darcy-Weisbach and Hazen-Williams head
 * loss, and minor losses. All SI.
 */
import { G } from './water';

/**
 * Reynolds number Re = v·D/ν (dimensionless).
 * Units: v m/s, D m, ν m²/s. Range: any positive values.
 * Worked example: v = 1 m/s in D = 0.0266 m at 10 °C (ν = 1.306e-6 m²/s) → Re = 20,368.
 * Reference: any fluid-mechanics text, e.g. White, Fluid Mechanics, §6.1.
 */
export function reynolds(velocityMs: number, diameterM: number, kinematicViscosityM2s: number): number {
  return (velocityMs * diameterM) / kinematicViscosityM2s;
}

/**
 * Swamee-Jain explicit friction factor
 *   f = 0.25 / [log₁₀(ε/(3.7D) + 5.74/Re^0.9)]².
 * Units: dimensionless. Range: stated within about 1 % of Colebrook for
 * 1e-6 < ε/D < 1e-2 and 5000 < Re < 1e8.
 * Worked example: Re = 1e5, ε/D = 1e-4 → log₁₀(2.703e-5 + 1.814e-4) = −3.681 → f = 0.01845.
 * Reference: Swamee, P.K. & Jain, A.K. (1976), "Explicit equations for pipe-flow
 * problems", J. Hydraulics Division ASCE 102(HY5), 657–664.
 */
export function swameeJain(re: number, relativeRoughness: number): number {
  const l = Math.log10(relativeRoughness / 3.7 + 5.74 / Math.pow(re, 0.9));
  return 0.25 / (l * l);
}

/**
 * Colebrook-White friction factor, solved by Newton's method on x = 1/√f:
 *   1/√f = −2 log₁₀( ε/(3.7D) + 2.51/(Re·√f) ).
 * Units: dimensionless. Range: turbulent flow, Re ≥ 4000, any ε/D ≥ 0.
 * Converges to |Δx| < 1e-12 in 3–5 iterations from the Swamee-Jain start
 * (or from `fGuess`, a nearby friction factor, when iterating on velocity).
 * Worked example: Re = 1.27e5, ε/D = 0.0013 (cast iron 0.26 mm in 200 mm) → f = 0.0227.
 * Reference: Colebrook, C.F. (1939), "Turbulent flow in pipes…", J. ICE 11, 133–156;
 * the worked case follows White, Fluid Mechanics, Example 6.x (oil in cast-iron pipe, from memory).
 */
export function colebrook(re: number, relativeRoughness: number, fGuess?: number): number {
  const a = relativeRoughness / 3.7;
  const b = 2.51 / re;
  let x = 1 / Math.sqrt(fGuess ?? swameeJain(Math.max(re, 4000), Math.max(relativeRoughness, 1e-9)));
  for (let i = 0; i < 50; i++) {
    const arg = a + b * x;
    const F = x + 2 * Math.log10(arg);
    const dF = 1 + (2 * b) / (arg * Math.LN10);
    const next = x - F / dF;
    if (Math.abs(next - x) < 1e-12) {
      x = next;
      break;
    }
    x = next > 0 ? next : x / 2;
  }
  return 1 / (x * x);
}

/**
 * Darcy friction factor as a bare number (formula, units and range as
 * {@link frictionFactor}; example: Re = 1e5, ε/D = 0 → 0.0180) (laminar 64/Re, blended critical
 * zone, Colebrook above Re = 4000) — the fast path for iterations; same
 * values as {@link frictionFactor}, without the Swamee-Jain cross-check.
 */
export function darcyF(re: number, relativeRoughness: number, fGuess?: number): number {
  if (re < RE_LAMINAR) return 64 / re;
  if (re < RE_TURBULENT) {
    const fl = 64 / RE_LAMINAR;
    return fl + (colebrook(RE_TURBULENT, relativeRoughness) - fl) * ((re - RE_LAMINAR) / (RE_TURBULENT - RE_LAMINAR));
  }
  return colebrook(re, relativeRoughness, fGuess);
}

/**
 * Friction plus minor head loss for a flow in a round pipe, m — the fast
 * path of {@link pipeLoss} for solvers: h = (f·L/D + ΣK)·v²/(2g).
 * Units: Q m³/s, L, D, ε m, ν m²/s. Range: any Q ≥ 0.
 * Worked example: as pipeLoss — 1e-3 m³/s, 100 m, D = 0.0266 m → 14.0 m.
 * Reference: Darcy-Weisbach with Colebrook (White, Fluid Mechanics, ch. 6).
 */
export function pipeHeadLoss(flowM3s: number, lengthM: number, diameterM: number, roughnessM: number, nu: number, sumKValue: number): number {
  const v = flowM3s / boreArea(diameterM);
  if (v === 0) return 0;
  const f = darcyF(reynolds(v, diameterM, nu), roughnessM / diameterM);
  return ((f * (lengthM / diameterM) + sumKValue) * v * v) / (2 * G);
}

export type FlowRegime = 'laminar' | 'transitional' | 'turbulent';

export interface FrictionFactor {
  f: number;
  regime: FlowRegime;
  /** Swamee-Jain value as a cross-check (turbulent and transitional only; equals f when laminar) */
  fSwameeJain: number;
}

/** Re below which flow is taken as laminar, and above which fully turbulent (Moody's "critical zone"). */
export const RE_LAMINAR = 2000;
export const RE_TURBULENT = 4000;

/**
 * Darcy friction factor for any Reynolds number.
 * Formula: Re < 2000: f = 64/Re (Hagen-Poiseuille); Re ≥ 4000: Colebrook-White;
 * 2000 ≤ Re < 4000 (critical zone, flow may flip between states): linear
 * blend from 64/2000 to Colebrook at 4000 — an engineering convention, the
 * true value is uncertain there.
 * Units: dimensionless. Range: Re > 0, 0 ≤ ε/D ≤ 0.05.
 * Worked example: Re = 1000 → f = 0.064; Re = 1e5 smooth → f = 0.0180.
 * Reference: Moody, L.F. (1944), "Friction factors for pipe flow", Trans. ASME 66.
 */
export function frictionFactor(re: number, relativeRoughness: number, fGuess?: number): FrictionFactor {
  if (re < RE_LAMINAR) {
    const f = 64 / re;
    return { f, regime: 'laminar', fSwameeJain: f };
  }
  if (re < RE_TURBULENT) {
    const fl = 64 / RE_LAMINAR;
    const ft = colebrook(RE_TURBULENT, relativeRoughness);
    const w = (re - RE_LAMINAR) / (RE_TURBULENT - RE_LAMINAR);
    const f = fl + (ft - fl) * w;
    return { f, regime: 'transitional', fSwameeJain: swameeJain(re, relativeRoughness) };
  }
  const sj = swameeJain(re, relativeRoughness);
  return { f: colebrook(re, relativeRoughness, fGuess ?? sj), regime: 'turbulent', fSwameeJain: sj };
}

/**
 * Darcy-Weisbach head loss h_f = f·(L/D)·v²/(2g), m.
 * Units: L, D in m; v in m/s. Range: any f from {@link frictionFactor}.
 * Worked example: f = 0.0227, L = 500 m, D = 0.2 m, v = 6.366 m/s → h_f = 117 m.
 * Reference: White, Fluid Mechanics, eq. 6.10 (and the oil example, from memory).
 */
export function darcyHeadLoss(f: number, lengthM: number, diameterM: number, velocityMs: number): number {
  return (f * (lengthM / diameterM) * velocityMs * velocityMs) / (2 * G);
}

/**
 * Hazen-Williams head loss, SI form
 *   h_f = 10.67 · L · Q^1.852 / (C^1.852 · D^4.87), m.
 * Units: L m, Q m³/s, D m, C dimensionless. Range: water at ordinary
 * temperatures, turbulent flow; intended for D ≳ 50 mm and v ≲ 3 m/s — it
 * overstates or understates loss in small pipes at low flow, where the
 * Darcy-Weisbach result should be preferred.
 * Worked example: L = 1000 m, Q = 0.01 m³/s, D = 0.1 m, C = 130 →
 * 10.67 × 1000 × 1.978e-4 / (8217 × 1.349e-5) = 19.0 m.
 * Reference: Hazen & Williams, Hydraulic Tables (1905/1920); SI constant
 * 10.67 as in e.g. Mays, Water Resources Engineering (from memory).
 */
export function hazenWilliamsHeadLoss(flowM3s: number, lengthM: number, diameterM: number, c: number): number {
  return (10.67 * lengthM * Math.pow(flowM3s, 1.852)) / (Math.pow(c, 1.852) * Math.pow(diameterM, 4.87));
}

/**
 * Minor (fitting) loss h_m = ΣK·v²/(2g), m.
 * Worked example: ΣK = 3.15, v = 1 m/s → 0.1606 m.
 * Reference: Munson, Young & Okiishi, §8.4.2.
 */
export function minorLoss(sumK: number, velocityMs: number): number {
  return (sumK * velocityMs * velocityMs) / (2 * G);
}

/** Cross-sectional area of a round bore, A = πD²/4, m² (D in m). Example: D = 0.0158 m → 1.960e-4 m². Reference: geometry. */
export function boreArea(diameterM: number): number {
  return (Math.PI * diameterM * diameterM) / 4;
}

export interface PipeLoss {
  velocityMs: number;
  reynolds: number;
  friction: FrictionFactor;
  frictionHeadM: number;
  minorHeadM: number;
}

/**
 * Darcy-Weisbach friction plus minor losses for a flow in a round pipe.
 * Units: Q m³/s, L m, D m, ε m, ν m²/s, ΣK dimensionless; returns heads in m.
 * Worked example: Q = 1e-3 m³/s in 100 m of D = 0.0266 m, ε = 1.5e-6 m, ν = 1.306e-6 →
 * v = 1.80 m/s, Re = 36,650, f = 0.0226, h_f = 14.0 m.
 */
export function pipeLoss(
  flowM3s: number,
  lengthM: number,
  diameterM: number,
  roughnessM: number,
  nu: number,
  sumKValue: number,
): PipeLoss {
  const v = flowM3s / boreArea(diameterM);
  if (v === 0) {
    return { velocityMs: 0, reynolds: 0, friction: { f: 0, regime: 'laminar', fSwameeJain: 0 }, frictionHeadM: 0, minorHeadM: 0 };
  }
  const re = reynolds(v, diameterM, nu);
  const friction = frictionFactor(re, roughnessM / diameterM);
  return {
    velocityMs: v,
    reynolds: re,
    friction,
    frictionHeadM: darcyHeadLoss(friction.f, lengthM, diameterM, v),
    minorHeadM: minorLoss(sumKValue, v),
  };
}
