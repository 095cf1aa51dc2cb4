/**
 * Pipe friction: Reynolds number, Darcy friction factor (laminar,
 * Colebrook-White, Swamee-Jain), Darcy-Weisbach and Hazen-Williams head
 * loss, and minor losses. All SI.
 */
import { G } from './water';

/**
 * Reynolds number Re = v·D/ν (dimensionless).
 * Units: v m/s, D m, ν m²/s. Range: any positive values.
 * Reference: any fluid-mechanics text, e.g. White, F.M., Fluid Mechanics (McGraw-Hill), ch. 6.
 * @example 1 m/s in 26.6 mm at 10 °C
 * reynolds(1, 0.0266, 1.306e-6)  // ≈ 20368
 */
export function reynolds(velocityMs: number, diameterM: number, kinematicViscosityM2s: number): number {
  return (velocityMs * diameterM) / kinematicViscosityM2s;
}

/**
 * Swamee-Jain explicit friction factor
 *   f = 0.25 / [log₁₀(ε/(3.7D) + 5.74/Re^0.9)]².
 * Units: dimensionless. Range: stated within about 1 % of Colebrook for
 * 1e-6 < ε/D < 1e-2 and 5000 < Re < 1e8.
 * Reference: Swamee, P.K. & Jain, A.K. (1976), "Explicit equations for pipe-flow
 * problems", J. Hydraulics Division ASCE 102(HY5), 657–664.
 * @example
 * // log₁₀(1e-4/3.7 + 5.74/1e5^0.9) = log₁₀(2.703e-5 + 1.814e-4) = −3.681 → f = 0.25/3.681²
 * swameeJain(1e5, 1e-4)  // ≈ 0.01845
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
 * Reference: [1] Colebrook, C.F. (1939), "Turbulent flow in pipes, with particular
 * reference to the transition region between the smooth and rough pipe laws",
 * J. Institution of Civil Engineers 11(4), 133–156.
 * [2] White, F.M., Fluid Mechanics (McGraw-Hill), Example 6.7 in the edition
 * checked (edition not recorded): oil, ν = 1e-5 m²/s, 0.2 m³/s through 500 m of
 * 200-mm cast-iron pipe (ε = 0.26 mm, ε/d = 0.0013). White rounds V to 6.4 m/s
 * (Re ≈ 128,000) and reads f ≈ 0.0225 off the Moody chart; solving Colebrook
 * at the unrounded Re = 127,300 gives 0.0227 (h_f ≈ 117 m either way, see
 * {@link darcyHeadLoss}).
 * @example White's oil in cast-iron pipe, Re = 4Q/(πDν)
 * colebrook((4 * 0.2) / (Math.PI * 0.2 * 1e-5), 0.26 / 200)  // ≈ 0.0227
 * colebrook((4 * 0.2) / (Math.PI * 0.2 * 1e-5), 0.26 / 200)  // ≈ 0.0225 ±0.0005
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
 * {@link frictionFactor}: laminar 64/Re, blended critical zone, Colebrook
 * above Re = 4000) — the fast path for iterations; same values as
 * {@link frictionFactor}, without the Swamee-Jain cross-check.
 * @example smooth pipe (Moody chart, smooth-pipe curve at Re = 1e5) and laminar flow
 * darcyF(1e5, 0)  // ≈ 0.0180
 * darcyF(1000, 0.001)  // ≈ 0.064
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
 * Reference: Darcy-Weisbach with Colebrook (White, Fluid Mechanics, ch. 6).
 * @example as {@link pipeLoss}: 1 L/s through 100 m of 26.6-mm smooth pipe at 10 °C
 * pipeHeadLoss(1e-3, 100, 0.0266, 1.5e-6, 1.306e-6, 0)  // ≈ 14.0
 */
export function pipeHeadLoss(
  flowM3s: number,
  lengthM: number,
  diameterM: number,
  roughnessM: number,
  nu: number,
  sumKValue: number,
): number {
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
 * Reference: Moody, L.F. (1944), "Friction factors for pipe flow", Trans. ASME 66, 671–684.
 * @example laminar, smooth turbulent (Moody chart at Re = 1e5), and the critical zone
 * frictionFactor(1000, 0.001).f  // ≈ 0.064
 * frictionFactor(1e5, 0).f  // ≈ 0.0180
 * frictionFactor(3000, 1e-4).regime  // → 'transitional'
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
 * Reference: Darcy-Weisbach; White, F.M., Fluid Mechanics, Example 6.7 (see
 * {@link colebrook}): h_f ≈ 117 m for the oil in 500 m of 200-mm cast iron.
 * @example White's oil example
 * darcyHeadLoss(0.0227, 500, 0.2, 6.366)  // ≈ 117
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
 * Reference: Williams, G.S. & Hazen, A. (1905; 3rd ed. 1920), Hydraulic Tables,
 * Wiley; the SI constant 10.67 is the usual metric form (e.g. Mays, L.W., Water
 * Resources Engineering, Wiley — from memory).
 * @example
 * // 10.67 × 1000 × 0.01^1.852 / (130^1.852 × 0.1^4.87) = 10.67 × 1000 × 1.978e-4 / (8217 × 1.349e-5)
 * hazenWilliamsHeadLoss(0.01, 1000, 0.1, 130)  // ≈ 19.0
 */
export function hazenWilliamsHeadLoss(flowM3s: number, lengthM: number, diameterM: number, c: number): number {
  return (10.67 * lengthM * Math.pow(flowM3s, 1.852)) / (Math.pow(c, 1.852) * Math.pow(diameterM, 4.87));
}

/**
 * Minor (fitting) loss h_m = ΣK·v²/(2g), m. Units: v m/s. Range: ΣK ≥ 0.
 * Reference: Munson, B.R., Young, D.F. & Okiishi, T.H., Fundamentals of Fluid
 * Mechanics (Wiley), §8.4 "minor losses".
 * @example two threaded elbows and an open gate valve (ΣK = 3.15, see {@link sumK}) at 1 m/s
 * minorLoss(3.15, 1)  // ≈ 0.1606
 */
export function minorLoss(sumK: number, velocityMs: number): number {
  return (sumK * velocityMs * velocityMs) / (2 * G);
}

/**
 * Cross-sectional area of a round bore, A = πD²/4, m² (D in m). Reference: geometry.
 * @example ½" sch 40 PVC
 * boreArea(0.0158)  // ≈ 1.961e-4
 */
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
 * Reference: Darcy-Weisbach with {@link frictionFactor}; minor losses {@link minorLoss}.
 * @example 1 L/s in 100 m of 26.6-mm smooth pipe at 10 °C
 * const loss = pipeLoss(1e-3, 100, 0.0266, 1.5e-6, 1.306e-6, 0)
 * loss.velocityMs  // ≈ 1.80
 * loss.reynolds  // ≈ 36650 ±10
 * loss.friction.f  // ≈ 0.0226
 * loss.frictionHeadM  // ≈ 14.0
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
    return {
      velocityMs: 0,
      reynolds: 0,
      friction: { f: 0, regime: 'laminar', fSwameeJain: 0 },
      frictionHeadM: 0,
      minorHeadM: 0,
    };
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
