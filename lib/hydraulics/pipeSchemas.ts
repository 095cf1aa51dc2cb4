/**
 * Schemas for a pipe run, shared by the calculators. Inputs are SI; a form
 * that offers nominal sizes fills insideDiameterM and wallThicknessM from
 * resolvePipe() in pipes.ts.
 */
import * as z from 'zod/mini';
import { fittingSchema } from './fittings';
import { MATERIALS, MATERIAL_PROPS, type PipeMaterial } from './pipes';
import { siNumber } from './schemaKit';

/** Inside diameter of a pipe, m (5 mm to 300 mm). */
export const insideDiameterM = () => siNumber({ min: 0.005, max: 0.3, unit: 'm' });

export const pipeRunSchema = z.object({
  /** length of the run, m */
  lengthM: siNumber({ min: 0, minExclusive: true, max: 10000, unit: 'm' }),
  insideDiameterM: insideDiameterM(),
  material: z._default(z.enum(MATERIALS), 'pvc'),
  /** wall thickness, m; needed for wave speed */
  wallThicknessM: z.optional(siNumber({ min: 0.0005, max: 0.05, unit: 'm' })),
  /** absolute roughness ε, m; default from the material table */
  roughnessM: z.optional(siNumber({ min: 0, max: 0.01, unit: 'm' })),
  /** Hazen-Williams C; default from the material table */
  hazenWilliamsC: z.optional(siNumber({ min: 40, max: 160, unit: '' })),
  /** working pressure rating, Pa; default from the series table when known */
  pressureRatingPa: z.optional(siNumber({ min: 1e4, max: 1e8, unit: 'Pa' })),
  /** fittings in the run (the drive pipe's entrance is counted separately) */
  fittings: z._default(z.array(fittingSchema).check(z.maxLength(50)), []),
});
export type PipeRun = z.output<typeof pipeRunSchema>;

/** A drive pipe: same fields, shorter limit on length (a drive pipe over 500 m is not a drive pipe). */
export const drivePipeSchema = z.extend(pipeRunSchema, {
  lengthM: siNumber({ min: 0, minExclusive: true, max: 500, unit: 'm' }),
});
export type DrivePipe = z.output<typeof drivePipeSchema>;

/**
 * Roughness of a run, from the input or the material table, m.
 * @example PVC takes drawn tubing's 0.0015 mm (Munson Table 8.1, from memory)
 * roughnessOf({ material: 'pvc' })  // ≈ 1.5e-6
 * roughnessOf({ material: 'pvc', roughnessM: 1e-5 })  // ≈ 1e-5
 */
export function roughnessOf(p: { roughnessM?: number; material: PipeMaterial }): number {
  return p.roughnessM ?? MATERIAL_PROPS[p.material].roughnessM;
}

/**
 * Hazen-Williams C of a run, from the input or the material table.
 * @example
 * hazenCOf({ material: 'pvc' })  // ≈ 150
 */
export function hazenCOf(p: { hazenWilliamsC?: number; material: PipeMaterial }): number {
  return p.hazenWilliamsC ?? MATERIAL_PROPS[p.material].hazenWilliamsC;
}
