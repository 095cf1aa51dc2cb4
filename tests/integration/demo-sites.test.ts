import { beforeAll, describe, expect, it } from 'vitest';
import { initModels } from '@/models';
import { ENGINE_VERSION } from '@/lib/hydraulics';
import { siteTests } from '@/lib/sites/site-tests';
import { demoSites, plannedVersion } from '@/migrations/seed/demo-sites';
import { freshDemoDatabase } from '../support/db';

/**
 * Issue 22: the demo scenario has sites, each planned by the engine. A plan stored by
 * the seed must be what planFromSurvey makes of its survey now, so a seed left behind
 * by an engine change fails here rather than showing readers a stale plan.
 */
const { Site, SiteVersion, FieldLogEntry, Question, User } = initModels();

describe('the demo sites (real MariaDB)', () => {
  beforeAll(freshDemoDatabase);

  it('one public, one shared by link, one private; invented owners of the scenario', async () => {
    expect(new Set(demoSites.map((s) => s.visibility))).toEqual(new Set(['public', 'link', 'private']));
    for (const s of demoSites) {
      const row = await Site.findOne({ where: { publicId: s.publicId }, include: ['owner'] });
      expect(row, s.name).not.toBeNull();
      expect([row!.name, row!.visibility, row!.owner!.handle]).toEqual([s.name, s.visibility, s.owner]);
    }
  });

  it('every version’s plan is what planFromSurvey makes of its survey with today’s engine', async () => {
    for (const s of demoSites) {
      const site = (await Site.findOne({ where: { publicId: s.publicId } }))!;
      const stored = await SiteVersion.findAll({ where: { siteId: site.id }, order: [['version', 'ASC']] });
      expect(stored.map((v) => v.version)).toEqual(s.versions.map((_, i) => i + 1));
      stored.forEach((v, i) => {
        const now = plannedVersion(s, s.versions[i]!.survey);
        expect(v.engineVersion).toBe(ENGINE_VERSION);
        expect(v.survey).toEqual(now.survey);
        // through JSON, as the column keeps it
        expect(v.plan).toEqual(JSON.parse(JSON.stringify(now.plan)));
      });
    }
  });

  it('the public site has its versions, its tests against the plan and the question about it', async () => {
    const pub = demoSites.find((s) => s.visibility === 'public')!;
    expect(pub.versions.length).toBeGreaterThanOrEqual(2);
    const site = (await Site.findOne({ where: { publicId: pub.publicId } }))!;
    const owner = (await User.findOne({ where: { handle: pub.owner } }))!;
    const entries = await FieldLogEntry.findAll({ where: { siteId: site.id } });
    expect(entries.length).toBe(pub.tests!.length);
    expect(entries.every((e) => e.authorId === owner.id)).toBe(true);
    const asked = await Question.findAll({ where: { siteId: site.id } });
    expect(asked.map((q) => q.title)).toEqual([pub.question]);
    // every test has the plan's figure beside it, and the invented story reads as a fall after the flood
    const tests = (await siteTests(null, pub.publicId))!;
    expect(tests.rows.every((r) => r.ratio !== null && r.differs.length === 0)).toBe(true);
    expect(tests.trend.kind).toBe('falling');
  });

  it('the private site is its owner’s only; the others are not shown its tests', async () => {
    const priv = demoSites.find((s) => s.visibility === 'private')!;
    expect(await siteTests(null, priv.publicId)).toBeNull();
    const owner = (await User.findOne({ where: { handle: priv.owner } }))!;
    expect(await siteTests({ id: owner.id, role: owner.role }, priv.publicId)).not.toBeNull();
  });
});
