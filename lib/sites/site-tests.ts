import 'server-only';
import { initModels } from '@/models';
import type { Actor } from '@/lib/auth/policy';
import { entriesOnSite } from '@/lib/field-log/store';
import { maySee } from './store';
import { measureAgainstPlan, planLayout, trendOf, type MeasuredTest, type PlanLayout, type Trend } from './measured';

export interface SiteTests {
  rows: MeasuredTest[];
  trend: Trend;
  /** the newest plan's pumps and pipes, for the words beside the table */
  newest: PlanLayout | null;
}

/**
 * The field log tests recorded on a site, each against the plan in force on its day,
 * as the viewer may see them: hidden and deleted tests only for moderators, as in the
 * field log itself. Null when the site is not the viewer's to see.
 */
export async function siteTests(viewer: Actor | null, publicId: string): Promise<SiteTests | null> {
  const { Site, SiteVersion } = initModels();
  const site = await Site.findOne({ where: { publicId }, attributes: ['id', 'ownerId', 'visibility'] });
  if (!site || !maySee(viewer, site)) return null;
  const [versions, entries] = await Promise.all([
    SiteVersion.findAll({
      where: { siteId: site.id },
      attributes: ['version', 'createdAt', 'plan'],
      order: [['version', 'ASC']],
    }),
    entriesOnSite(site.id, viewer),
  ]);
  const refs = versions.map((v) => ({ version: v.version, createdAt: v.createdAt.toISOString(), plan: v.plan }));
  const rows = measureAgainstPlan(
    entries.map((e) => ({ ...e, hidden: e.hidden || e.deleted })),
    refs,
  );
  const last = refs[refs.length - 1];
  // a test a moderator hid is shown to them, marked, but does not sway the trend
  return { rows, trend: trendOf(rows.filter((r) => !r.hidden)), newest: last ? planLayout(last.plan) : null };
}
