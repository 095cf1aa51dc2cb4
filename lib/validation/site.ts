import { z } from 'zod';
import { SITE_VISIBILITIES } from '@/lib/vocabulary';
import { BROKEN_TEXT_MESSAGE, isWellFormedText } from './text';

/** A survey as the planner's share link carries it: each input as typed, with its unit. */
const survey = z
  .record(
    z.string().max(40).refine(isWellFormedText, BROKEN_TEXT_MESSAGE),
    z
      .string()
      .max(200, 'each survey value must be at most 200 characters')
      .refine(isWellFormedText, BROKEN_TEXT_MESSAGE),
  )
  .refine((r) => Object.keys(r).length <= 60, 'at most 60 survey values');

const name = z
  .string()
  .trim()
  .min(1, 'name the site (e.g. “Lower meadow”)')
  .max(80, 'name must be at most 80 characters')
  .refine(isWellFormedText, BROKEN_TEXT_MESSAGE);

/** POST /api/sites: a new site from a survey. */
export const saveSiteSchema = z.object({ name, survey });

/** POST /api/sites/:id/versions: the survey changed. */
export const siteVersionSchema = z.object({ survey });

/** PATCH /api/sites/:id: the owner renames it or changes who may see it. */
export const updateSiteSchema = z
  .object({
    name: name.optional(),
    visibility: z.enum(SITE_VISIBILITIES, { error: 'visibility must be private, link or public' }).optional(),
  })
  .refine((v) => v.name !== undefined || v.visibility !== undefined, 'send a new name or visibility');

/** A site a question or worked calculation is about, by its address; the server checks it is the caller's own. */
export const siteIdField = z
  .string({ error: 'siteId must be a site’s id' })
  .regex(/^[0-9A-Za-z]{6,16}$/, 'siteId must be a site’s id');
