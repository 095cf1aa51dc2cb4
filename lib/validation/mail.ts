import { z } from 'zod';
import { DIGEST_FREQUENCIES } from '@/lib/vocabulary';

/** PUT /api/account/mail: the digest, the tags it follows, and each notification switch. */
export const mailSettingsSchema = z.object({
  digest: z.enum(DIGEST_FREQUENCIES, { message: `digest: one of ${DIGEST_FREQUENCIES.join(', ')}` }),
  tags: z
    .array(z.string().regex(/^[a-z0-9-]{1,40}$/, 'tags: tag slugs such as drive-pipe'), {
      message: 'tags: a list of tag slugs',
    })
    .max(40, 'tags: at most 40')
    .default([]),
  notify: z.object(
    {
      answers: z.boolean({ message: 'notify.answers: true or false' }),
      replies: z.boolean({ message: 'notify.replies: true or false' }),
      fixed: z.boolean({ message: 'notify.fixed: true or false' }),
      moderation: z.boolean({ message: 'notify.moderation: true or false' }),
      expert: z.boolean({ message: 'notify.expert: true or false' }),
    },
    { message: 'notify: the five switches answers, replies, fixed, moderation and expert' },
  ),
});
export type MailSettings = z.output<typeof mailSettingsSchema>;
