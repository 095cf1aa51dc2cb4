import { z } from 'zod';
import { FLAG_REASONS, MODERATED_TYPES, MODERATION_ACTIONS } from '@/lib/vocabulary';

const postRef = {
  postType: z.enum(MODERATED_TYPES, { error: 'postType must be question, answer, reply, photo or field-log' }),
  postId: z.number({ error: 'postId must be a number' }).int().positive(),
};

export const flagSchema = z
  .object({
    ...postRef,
    reason: z.enum(FLAG_REASONS, { error: 'reason must be spam, unsafe, rude, off-topic or other' }),
    note: z.string().trim().max(1000, 'note must be at most 1,000 characters').optional(),
  })
  .refine((f) => f.reason !== 'other' || (f.note ?? '').length >= 3, {
    message: 'note: say what is wrong (at least 3 characters)',
    path: ['note'],
  });

export const moderationActionSchema = z.object({
  ...postRef,
  action: z.enum(MODERATION_ACTIONS, { error: 'action is not one of the review queue’s actions' }),
  reason: z
    .string({ error: 'reason is required' })
    .trim()
    .min(3, 'reason: every action needs a reason (at least 3 characters)')
    .max(1000, 'reason must be at most 1,000 characters'),
  tags: z
    .array(z.string().regex(/^[a-z0-9-]{2,40}$/))
    .max(5)
    .optional(),
  until: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'until must be a date like 2027-01-31')
    .optional(),
});

export const appealSchema = z.object({
  ...postRef,
  text: z
    .string({ error: 'text is required' })
    .trim()
    .min(10, 'text: say why the moderators should look again (at least 10 characters)')
    .max(1000, 'text must be at most 1,000 characters'),
});

export const reviewFilterSchema = z.object({
  reason: z.enum(FLAG_REASONS).optional(),
  olderThanHours: z
    .string()
    .regex(/^\d{1,5}$/, 'olderThanHours must be a whole number')
    .transform(Number)
    .optional(),
});

export const auditFilterSchema = z.object({
  action: z.string().max(40).optional(),
  actor: z.string().max(40).optional(),
  from: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'from must be a date like 2026-11-01')
    .optional(),
  to: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'to must be a date like 2026-11-30')
    .optional(),
  page: z
    .string()
    .regex(/^\d{1,6}$/, 'page must be a whole number')
    .transform(Number)
    .optional(),
});

export const liftSuspensionSchema = z.object({
  reason: z
    .string({ error: 'reason is required' })
    .trim()
    .min(3, 'reason: lifting a suspension needs a reason (at least 3 characters)')
    .max(1000, 'reason must be at most 1,000 characters'),
});
