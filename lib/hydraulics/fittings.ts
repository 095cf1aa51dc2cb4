/**
 * Loss coefficients K of pipe fittings, h = K·v²/(2g).
 *
 * Values from Munson, B.R., Young, D.F. & Okiishi, T.H., "Fundamentals of
 * Fluid Mechanics" (Wiley), Table 8.2 "Loss Coefficients for Pipe
 * Components" (checked against a copy of the table; edition not recorded).
 * The four entrances and the exit are not in that table but in the same
 * chapter's figures on inlets and exits (from memory). Threaded values are
 * used for the small screwed and solvent-welded fittings of ram
 * installations; they are the conservative (larger) column.
 */
import * as z from 'zod/mini';
import { siNumber } from './schemaKit';

export const FITTING_K = {
  'entrance-reentrant': 0.8,
  'entrance-sharp': 0.5,
  'entrance-rounded': 0.2,
  'entrance-well-rounded': 0.04,
  exit: 1.0,
  'elbow-90-threaded': 1.5,
  'elbow-90-long-radius-threaded': 0.7,
  'elbow-90-flanged': 0.3,
  'elbow-45-threaded': 0.4,
  'return-bend-threaded': 1.5,
  'tee-line-threaded': 0.9,
  'tee-branch-threaded': 2.0,
  'union-threaded': 0.08,
  'gate-valve-open': 0.15,
  'ball-valve-open': 0.05,
  'globe-valve-open': 10,
  'angle-valve-open': 2,
  'swing-check-valve': 2,
} as const;

export type FittingKind = keyof typeof FITTING_K;
export const FITTING_KINDS = Object.keys(FITTING_K) as [FittingKind, ...FittingKind[]];

/** A fitting in a pipe: a kind from the table, or a custom K. */
export const fittingSchema = z.object({
  kind: z.optional(z.enum(FITTING_KINDS)),
  /** custom loss coefficient, used when kind is absent */
  k: z.optional(siNumber({ min: 0, max: 1000, unit: '' })),
  count: z._default(siNumber({ min: 1, max: 100, unit: '', integer: true }), 1),
});
export type Fitting = z.output<typeof fittingSchema>;

/**
 * Sum of loss coefficients, ΣK = Σ countᵢ·Kᵢ (dimensionless); a fitting
 * without a kind counts its own K. Range: K 0–1000, count 1–100.
 * Reference: Munson, Young & Okiishi, Table 8.2 (see the module comment).
 * @example two threaded 90° elbows and an open gate valve: 2 × 1.5 + 0.15
 * sumK([{ kind: 'elbow-90-threaded', count: 2 }, { kind: 'gate-valve-open', count: 1 }])  // ≈ 3.15
 */
export function sumK(fittings: readonly Fitting[] | undefined): number {
  if (!fittings) return 0;
  let total = 0;
  for (const f of fittings) {
    const k = f.kind ? FITTING_K[f.kind] : (f.k ?? 0);
    total += k * f.count;
  }
  return total;
}
