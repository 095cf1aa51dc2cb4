import { z } from 'zod';
import { MAX_PER_PAGE } from './pagination';

/**
 * Pages reached by number: the first few, read by offset over an index (a few hundred
 * entries at most). Further back the lists go by place (`after`), so a page 50,000
 * questions back costs what the first one does.
 */
export const MAX_NUMBERED_PAGE = 10;

/** A place in a newest-first list: the creation time (ms) and id of the question a page starts after or before. */
const CURSOR = /^(\d{1,15})-(\d{1,10})$/;

const whole = (field: string, max: number, tooBig: string) =>
  z
    .string()
    .regex(/^\d+$/, `${field} must be a whole number`)
    .transform(Number)
    .pipe(z.number().int().min(1, `${field} must be at least 1`).max(max, tooBig));

const place = (field: string) =>
  z
    .string()
    .regex(CURSOR, `${field} must be a place in the list, as the list's own links give it`)
    .transform((s) => {
      const [, ms, id] = CURSOR.exec(s)!;
      return { createdAt: new Date(Number(ms)), id: Number(id) };
    });

/** `?page=&perPage=` or `?after=`/`?before=` with `perPage`, as the question lists take them. */
export const listPageSchema = z
  .object({
    page: whole(
      'page',
      MAX_NUMBERED_PAGE,
      `page must be at most ${MAX_NUMBERED_PAGE}; older questions are reached with the list's "Older" link`,
    )
      .optional()
      .default(1),
    perPage: whole('perPage', MAX_PER_PAGE, `perPage must be at most ${MAX_PER_PAGE}`).optional().default(20),
    after: place('after').optional(),
    before: place('before').optional(),
  })
  .refine((v) => !(v.after && v.before), { path: ['before'], message: 'before and after cannot both be given' });
export type ListPage = z.output<typeof listPageSchema>;
export type ListPlace = NonNullable<ListPage['after']>;

/** The text of a place, as `after`/`before` take it. */
export function placeText(p: { createdAt: Date | string; id: number }): string {
  return `${new Date(p.createdAt).getTime()}-${p.id}`;
}
