import { z } from 'zod';
import { GUIDE_LEVELS } from '@/lib/guides/frontmatter';
import { SEARCH_KINDS } from '@/lib/search/documents';

/** GET /api/search and the /search page's query: each bad value is a 400 naming it. */
export const searchQuerySchema = z.object({
  q: z.string().trim().max(200, 'q: at most 200 characters').default(''),
  kind: z
    .string()
    .default('')
    .transform((s) =>
      s
        .split(',')
        .map((k) => k.trim())
        .filter(Boolean),
    )
    .pipe(
      z
        .array(
          z.enum(SEARCH_KINDS, { message: `kind: one or more of ${SEARCH_KINDS.join(', ')}, separated by commas` }),
        )
        .max(SEARCH_KINDS.length),
    ),
  tag: z
    .string()
    .regex(/^[a-z0-9-]{1,40}$/, 'tag: a tag slug such as drive-pipe')
    .optional(),
  solved: z
    .enum(['true', 'false'], { message: 'solved: true or false' })
    .transform((s) => s === 'true')
    .optional(),
  level: z.enum(GUIDE_LEVELS, { message: `level: one of ${GUIDE_LEVELS.join(', ')}` }).optional(),
  limit: z.coerce
    .number({ message: 'limit: a whole number' })
    .int('limit: a whole number')
    .min(1, 'limit: at least 1')
    .max(50, 'limit: at most 50')
    .default(10),
  offset: z.coerce
    .number({ message: 'offset: a whole number' })
    .int('offset: a whole number')
    .min(0, 'offset: 0 or more')
    .max(990, 'offset: at most 990')
    .default(0),
});
export type SearchQuery = z.output<typeof searchQuerySchema>;
