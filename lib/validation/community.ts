import { z } from 'zod';
import { ROLES, SAFETY_VERDICTS } from '@/lib/vocabulary';
import { BROKEN_TEXT_MESSAGE, isWellFormedText } from './text';
import { UNIT_SYSTEMS } from '@/lib/units/preference';
import { displayNameSchema } from './account';

/** Schemas for expert applications, roles, account settings and safety checks: shared by forms and handlers. */

const text = (field: string, min: number, max: number) =>
  z
    .string({ error: `${field} is required` })
    .trim()
    .min(min, min === 1 ? `${field} is required` : `${field} must be at least ${min} characters`)
    .max(max, `${field} must be at most ${max} characters`);

const optionalText = (field: string, max: number) =>
  z
    .string({ error: `${field} must be text` })
    .trim()
    .max(max, `${field} must be at most ${max} characters`)
    .optional()
    .default('');

const wholeNumber = (field: string, max: number) =>
  z
    .number({ error: `${field} must be a number` })
    .int(`${field} must be a whole number`)
    .min(0, `${field} cannot be negative`)
    .max(max, `${field} must be at most ${max}`);

const link = z
  .string({ error: 'each link must be a web address' })
  .trim()
  .max(500, 'each link must be at most 500 characters')
  .refine(isWellFormedText, BROKEN_TEXT_MESSAGE)
  .pipe(z.url({ protocol: /^https?$/, error: 'each link must be a web address starting with http:// or https://' }));

export const expertApplicationSchema = z.object({
  pumpsBuilt: wholeNumber('pumpsBuilt', 10_000),
  years: wholeNumber('years', 80),
  region: text('region', 2, 80),
  experience: text('experience', 20, 4000),
  links: z
    .array(link, { error: 'links must be a list of web addresses' })
    .max(10, 'links can hold at most 10 addresses')
    .optional()
    .default([]),
});
export type ExpertApplicationInput = z.output<typeof expertApplicationSchema>;

export const EXPERT_DECISIONS = ['approve', 'decline'] as const;
export const expertDecisionSchema = z.object({
  decision: z.enum(EXPERT_DECISIONS, { error: "decision must be 'approve' or 'decline'" }),
  note: text('note', 3, 2000),
});

export const roleChangeSchema = z.object({
  role: z.enum(ROLES, { error: `role must be one of ${ROLES.join(', ')}` }),
});

export const accountSettingsSchema = z.object({
  // the strictest (a member's); the settings handler passes the caller's role
  displayName: displayNameSchema(),
  region: optionalText('region', 80),
  bio: optionalText('bio', 2000),
  units: z.enum(UNIT_SYSTEMS, { error: "units must be 'US' or 'metric'" }),
});
export type AccountSettingsInput = z.output<typeof accountSettingsSchema>;

/** The header's unit switch, saved for a member. */
export const unitsChoiceSchema = z.object({ units: accountSettingsSchema.shape.units });

export const safetyCheckSchema = z.object({
  verdict: z.enum(SAFETY_VERDICTS, { error: "verdict must be 'sound' or 'needs changes'" }),
  notes: optionalText('notes', 4000),
});

/** A positive integer id from a dynamic route segment, or null. */
export function routeId(raw: string): number | null {
  if (!/^\d{1,10}$/.test(raw)) return null;
  const id = Number(raw);
  return id > 0 && id <= 4_294_967_295 ? id : null;
}
