import { z } from 'zod';
import { POST_TYPES } from '@/lib/vocabulary';
import { BROKEN_TEXT_MESSAGE, isWellFormedText } from './text';
import { saveCalculationSchema } from './calculation';
import { siteIdField } from './site';

/**
 * Shared by the ask form (react-hook-form's zod resolver) and POST /api/questions.
 * The site sheet is the stall check's form: each measurement as typed, with its unit
 * ("4 ft", "1.2 m", "2 gal/min"); the server reads it with the engine and refuses
 * impossible values naming the field.
 */
export const SITE_SHEET_FIELDS = [
  'fall',
  'lift',
  'driveLength',
  'driveSize',
  'driveMaterial',
  'elbows',
  'sourceFlow',
  'pumpSize',
  'pumps',
  'driveFlow',
  'delivered',
  'bpm',
  'deliveryLength',
  'deliverySize',
  'deliveryMaterial',
  'symptoms',
] as const;
export type SiteSheetField = (typeof SITE_SHEET_FIELDS)[number];

export const siteSheetSchema = z
  .partialRecord(
    z.enum(SITE_SHEET_FIELDS),
    z
      .string()
      .trim()
      .max(200, 'each site sheet value must be at most 200 characters')
      .refine(isWellFormedText, BROKEN_TEXT_MESSAGE),
  )
  .optional();

export const askQuestionSchema = z.object({
  title: z
    .string({ error: 'title is required' })
    .trim()
    .min(10, 'title must be at least 10 characters')
    .max(160, 'title must be at most 160 characters'),
  body: z
    .string({ error: 'body is required' })
    .trim()
    .min(20, 'body must be at least 20 characters')
    .max(20_000, 'body must be at most 20,000 characters'),
  tags: z
    .array(z.string().regex(/^[a-z0-9-]{2,40}$/, 'tags must be tag names like drive-pipe'))
    .min(1, 'tags: choose at least one')
    .max(5, 'tags: at most five'),
  siteSheet: siteSheetSchema,
  photoIds: z
    .array(z.string().regex(/^[0-9A-Za-z]{10,24}$/, 'photoIds must be ids from the upload'))
    .max(6, 'at most six photos')
    .default([]),
  guide: z
    .string()
    .regex(/^[a-z0-9-]+$/)
    .max(80)
    .optional(),
  /** the field log entry the site sheet was filled from */
  fieldLogEntryId: z.number({ error: 'fieldLogEntryId must be a field log entry number' }).int().positive().optional(),
  /** the asker's own site the question is about (its site sheet may be filled from it) */
  siteId: siteIdField.optional(),
});
export type AskQuestion = z.input<typeof askQuestionSchema>;

export const editQuestionSchema = askQuestionSchema.pick({ title: true, body: true, tags: true, siteSheet: true });

export const answerSchema = z
  .object({
    body: z
      .string({ error: 'body is required' })
      .trim()
      .min(20, 'body must be at least 20 characters')
      .max(20_000, 'body must be at most 20,000 characters'),
    calculationId: z
      .string()
      .regex(/^[0-9A-Za-z]{6,16}$/, 'calculationId must be a worked calculation id')
      .optional(),
    /**
     * A calculation shown in the answer form, saved with the answer in one go: what the
     * answerer sees in the form is what is posted, with no separate "attach" step to miss.
     */
    calculation: saveCalculationSchema.pick({ tool: true, inputs: true }).optional(),
    photoIds: z
      .array(z.string().regex(/^[0-9A-Za-z]{10,24}$/))
      .max(6, 'at most six photos')
      .default([]),
  })
  .refine((a) => !(a.calculationId && a.calculation), {
    message: 'calculation: send either calculationId or calculation, not both',
    path: ['calculation'],
  });

export const editBodySchema = z.object({
  body: z
    .string({ error: 'body is required' })
    .trim()
    .min(2, 'body must not be empty')
    .max(20_000, 'body must be at most 20,000 characters'),
});

export const replySchema = z.object({
  body: z
    .string({ error: 'body is required' })
    .trim()
    .min(2, 'body must not be empty')
    .max(5_000, 'body must be at most 5,000 characters'),
  answerId: z.number().int().positive().optional(),
  replyToId: z.number().int().positive().optional(),
});

export const helpfulSchema = z.object({
  postType: z.enum(POST_TYPES),
  postId: z.number({ error: 'postId must be a number' }).int().positive(),
});

/** "What fixed it": the asker's one line, saved with the answer they chose. */
export const WHAT_FIXED_IT_MIN = 10;
export const WHAT_FIXED_IT_MAX = 140;
export const whatFixedItLine = z
  .string({ error: 'whatFixedIt: say in one line what fixed it' })
  .trim()
  .min(WHAT_FIXED_IT_MIN, `whatFixedIt must be at least ${WHAT_FIXED_IT_MIN} characters`)
  .max(WHAT_FIXED_IT_MAX, `whatFixedIt must be at most ${WHAT_FIXED_IT_MAX} characters`)
  .refine((s) => !/[\r\n]/.test(s), 'whatFixedIt must be one line');

/**
 * PUT /api/questions/:id/fixed. Choosing an answer needs the line; taking the choice
 * back (answerId null) needs none and clears it.
 */
export const fixedItSchema = z
  .object({
    answerId: z.number({ error: 'answerId must be a number or null' }).int().positive().nullable(),
    whatFixedIt: whatFixedItLine.optional(),
  })
  .superRefine((v, ctx) => {
    if (v.answerId !== null && v.whatFixedIt === undefined)
      ctx.addIssue({ code: 'custom', path: ['whatFixedIt'], message: 'whatFixedIt: say in one line what fixed it' });
  });
export type FixedIt = z.input<typeof fixedItSchema>;
