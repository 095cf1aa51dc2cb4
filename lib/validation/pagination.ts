import { z } from 'zod';

export const MAX_PER_PAGE = 100;

const positiveInt = (field: string, max?: number) =>
  z
    .string()
    .regex(/^\d+$/, `${field} must be a whole number`)
    .transform(Number)
    .pipe(
      max
        ? z.number().int().min(1, `${field} must be at least 1`).max(max, `${field} must be at most ${max}`)
        : z.number().int().min(1, `${field} must be at least 1`).max(1_000_000, `${field} is too large`),
    );

/** `?page=&perPage=` as the list pages and GET /api/questions take them. */
export const paginationSchema = z.object({
  page: positiveInt('page').optional().default(1),
  perPage: positiveInt('perPage', MAX_PER_PAGE).optional().default(20),
});
export type Pagination = z.output<typeof paginationSchema>;
