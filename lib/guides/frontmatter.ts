import { z } from 'zod';
import { CALCULATOR_IDS } from '@/lib/calculators/ids';

export const GUIDE_LEVELS = ['first build', 'working system', 'advanced'] as const;
export type GuideLevel = (typeof GUIDE_LEVELS)[number];

/** What every content/guides/*.mdx must declare; a guide that fails this breaks the build. */
export const guideFrontmatterSchema = z.object({
  title: z.string().min(3).max(120),
  summary: z.string().min(10).max(300),
  level: z.enum(GUIDE_LEVELS),
  tags: z.array(z.string().regex(/^[a-z0-9-]+$/)).min(1),
  updated: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'updated must be YYYY-MM-DD'),
  order: z.number().int().min(1),
  calculators: z.array(z.enum(CALCULATOR_IDS)).default([]),
});
export type GuideFrontmatter = z.output<typeof guideFrontmatterSchema>;
