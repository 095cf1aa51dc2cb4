import { z } from 'zod';
import { CALCULATOR_IDS } from '@/lib/calculators/ids';
import { BROKEN_TEXT_MESSAGE, isWellFormedText } from './text';
import { siteIdField } from './site';

/** POST /api/calculations: the tool and its inputs as typed (share-link form). */
export const saveCalculationSchema = z.object({
  tool: z.enum(CALCULATOR_IDS, { error: 'tool must be one of the calculators' }),
  inputs: z
    .record(
      z.string().max(40).refine(isWellFormedText, BROKEN_TEXT_MESSAGE),
      z.string().max(500, 'each input must be at most 500 characters').refine(isWellFormedText, BROKEN_TEXT_MESSAGE),
    )
    .refine((r) => Object.keys(r).length <= 40, 'at most 40 inputs'),
  title: z
    .string()
    .trim()
    .max(160, 'title must be at most 160 characters')
    .refine(isWellFormedText, BROKEN_TEXT_MESSAGE)
    .optional(),
  /** the caller's own site it was worked out from */
  siteId: siteIdField.optional(),
});
export type SaveCalculation = z.output<typeof saveCalculationSchema>;
