/**
 * The survey a site plan starts from: the fall and how it was measured, the
 * source's spare flow in the driest (and optionally the wettest) month, the
 * lift, the runs to the pump and the tank, the demand, frost and drinking
 * water, the reserve and the friction the reader accepts.
 */
import * as z from 'zod/mini';
import { demandAndStorageSchema } from './demandAndStorage';
import { PUMP_TYPES } from './efficiency';
import { qty, say } from './message';
import { NOMINAL_SIZES } from './pipes';
import { PRACTICE } from './practice';
import { addRangeIssue, fallM, flowM3s, liftM, siNumber, waterTempC } from './schemaKit';

export const FALL_METHODS = ['level-and-staff', 'hose-level', 'pressure-gauge', 'gps-or-map', 'other'] as const;

const demandFields = z.pick(demandAndStorageSchema, {
  people: true,
  perPersonM3PerDay: true,
  gardenAreaM2: true,
  livestock: true,
  otherM3PerDay: true,
});

export const sitePlanSchema = z
  .object({
    fallM: fallM(),
    fallMethod: z._default(z.enum(FALL_METHODS), 'other'),
    /** flow the source can spare in the driest month, m³/s */
    spareFlowM3s: flowM3s(),
    /** flow it can spare in the wettest month, m³/s (for the month-by-month delivery) */
    wetFlowM3s: z.optional(flowM3s()),
    driestMonth: z._default(siNumber({ min: 1, max: 12, unit: '', integer: true }), 8),
    liftM: liftM(),
    /** horizontal run from the intake to the pump, m */
    sourceToPumpRunM: siNumber({ min: 0, max: 2000, unit: 'm' }),
    /** horizontal run from the pump to the tank, m */
    pumpToTankRunM: siNumber({ min: 0, max: 10000, unit: 'm' }),
    demand: demandFields,
    freezes: z._default(z.boolean(), false),
    drinkingWater: z._default(z.boolean(), false),
    reserveDays: z._default(siNumber({ min: 0, max: 60, unit: 'day' }), 3),
    /** delivery-line friction accepted, as a share of the lift */
    deliveryLossShare: z._default(siNumber({ min: 0.01, max: 0.5, unit: '' }), PRACTICE.deliveryLossShare.value),
    pumpType: z._default(z.enum(PUMP_TYPES), 'homemade'),
    largestSize: z._default(z.enum(NOMINAL_SIZES), '4'),
    maxPumps: z._default(siNumber({ min: 1, max: 20, unit: '', integer: true }), 6),
    waterTempC: waterTempC(),
  })
  .check(
    z.superRefine((v, ctx) => {
      if (v.liftM <= v.fallM)
        addRangeIssue(ctx, ['liftM'], say`must be greater than the fall (${qty('length', v.fallM)})`, {
          min: v.fallM,
          minExclusive: true,
          max: 1000,
          unit: 'm',
        });
      if (v.wetFlowM3s !== undefined && v.wetFlowM3s < v.spareFlowM3s)
        addRangeIssue(ctx, ['wetFlowM3s'], say`must be at least the driest month's ${qty('flow', v.spareFlowM3s)}`, {
          min: v.spareFlowM3s,
          max: 0.1,
          unit: 'm³/s',
        });
      const d = v.demand;
      if (d.people === 0 && d.gardenAreaM2 === 0 && d.otherM3PerDay === 0 && d.livestock.every((a) => a.count === 0))
        ctx.addIssue({
          code: 'custom',
          path: ['demand'],
          message: 'needs at least one use: people, animals, a garden or other',
        });
    }),
  );

export type SitePlanInput = z.input<typeof sitePlanSchema>;
export type SitePlanSurvey = z.output<typeof sitePlanSchema>;
