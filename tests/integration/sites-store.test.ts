import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import {
  addSiteVersion,
  createSite,
  listSites,
  loadSite,
  siteIdForLink,
  SiteError,
  updateSite,
} from '@/lib/sites/store';
import type { Actor } from '@/lib/auth/policy';
import { freshDemoDatabase } from '../support/db';

/**
 * Issue 22: a site belongs to a member. Its survey's versions are kept (a change makes a
 * new one, older ones stay readable), it is private until its owner shares it by link or
 * makes it public, and only its owner attaches questions and tests to it — each rule
 * through the policy table, against the real MariaDB.
 */
const { User, SiteVersion, Site } = initModels();
const survey = (fall: string) => ({
  survey: { fall, lift: '29 ft' },
  plan: { verdict: 'works' },
  engineVersion: '1.0.0',
});

async function actor(handle: string): Promise<Actor> {
  const u = (await User.findOne({ where: { handle } }))!;
  return { id: u.id, role: u.role };
}

const refused = async (p: Promise<unknown>, status: number) => {
  const err = await p.then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(SiteError);
  expect((err as SiteError).status).toBe(status);
};

describe('sites: ownership, versions and who may see them (real MariaDB)', () => {
  let owner: Actor;
  let other: Actor;
  let moderator: Actor;
  beforeAll(async () => {
    await freshDemoDatabase();
    owner = await actor('ferncombe_tamsin');
    other = await actor('ironwheel_builds');
    const mod = (await User.findOne({ where: { role: 'moderator' } }))!;
    moderator = { id: mod.id, role: mod.role };
  });

  it('a new site is private: its owner sees it, nobody else learns it exists', async () => {
    const site = await createSite(owner, { name: 'Lower meadow', ...survey('4 ft') });
    const seen = await loadSite(owner, site.publicId);
    expect(seen).toMatchObject({ name: 'Lower meadow', visibility: 'private', mine: true });
    expect(seen.current).toMatchObject({ version: 1, survey: { fall: '4 ft' } });
    for (const who of [null, other, moderator]) await refused(loadSite(who, site.publicId), 404);
    expect((await listSites(other, owner.id)).map((s) => s.id)).not.toContain(site.publicId);
    expect((await listSites(owner, owner.id)).map((s) => s.id)).toContain(site.publicId);
  });

  it('shared by link anyone with the address sees it; public, it is listed on the owner’s page', async () => {
    const site = await createSite(owner, { name: 'Upper spring', ...survey('6 ft') });
    await updateSite(owner, site.publicId, { visibility: 'link' });
    expect((await loadSite(null, site.publicId)).mine).toBe(false);
    expect((await listSites(null, owner.id)).map((s) => s.id)).not.toContain(site.publicId);
    await updateSite(owner, site.publicId, { visibility: 'public' });
    expect((await listSites(null, owner.id)).map((s) => s.id)).toContain(site.publicId);
  });

  it('a changed survey is a new version; the older one stays readable as it was', async () => {
    const site = await createSite(owner, { name: 'Creek bend', ...survey('4 ft') });
    expect(await addSiteVersion(owner, site.publicId, survey('5 ft'))).toBe(2);
    const now = await loadSite(owner, site.publicId);
    expect(now.current).toMatchObject({ version: 2, survey: { fall: '5 ft' } });
    expect(now.versions.map((v) => v.version)).toEqual([1, 2]);
    expect((await loadSite(owner, site.publicId, 1)).current.survey.fall).toBe('4 ft');
    await refused(loadSite(owner, site.publicId, 3), 404);
  });

  it('saves at once get versions 2, 3, 4 …, never the same number twice', async () => {
    const site = await createSite(owner, { name: 'Race test', ...survey('4 ft') });
    const got = await Promise.all(
      ['4.5 ft', '5 ft', '5.5 ft', '6 ft', '6.5 ft'].map((f) => addSiteVersion(owner, site.publicId, survey(f))),
    );
    expect(got.sort()).toEqual([2, 3, 4, 5, 6]);
  });

  it('only the owner changes it or attaches to it, even when it is public', async () => {
    const site = await createSite(owner, { name: 'Shared ford', ...survey('4 ft') });
    await updateSite(owner, site.publicId, { visibility: 'public' });
    await refused(addSiteVersion(other, site.publicId, survey('9 ft')), 403);
    await refused(updateSite(other, site.publicId, { visibility: 'private' }), 403);
    await refused(siteIdForLink(other, site.publicId), 403);
    await refused(updateSite(moderator, site.publicId, { name: 'Renamed' }), 403);
    expect(await siteIdForLink(owner, site.publicId)).toBe(site.id);
    expect(await SiteVersion.count({ where: { siteId: site.id } })).toBe(1);
  });

  it('a suspended owner still reads their sites but changes nothing', async () => {
    const site = await createSite(owner, { name: 'Before the suspension', ...survey('4 ft') });
    const suspended = { ...owner, suspendedUntil: new Date(Date.now() + 86_400_000) };
    expect((await loadSite(suspended, site.publicId)).mine).toBe(true);
    await refused(addSiteVersion(suspended, site.publicId, survey('5 ft')), 403);
    await refused(createSite(suspended, { name: 'New', ...survey('4 ft') }), 403);
  });

  it('a failed first version leaves no site behind (one transaction)', async () => {
    const before = await Site.count();
    await getSequelize().query(
      `CREATE TRIGGER test_refuse_version BEFORE INSERT ON site_versions FOR EACH ROW
       SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'refused by the test'`,
      { type: QueryTypes.RAW },
    );
    try {
      await expect(createSite(owner, { name: 'Half saved?', ...survey('4 ft') })).rejects.toThrow();
    } finally {
      await getSequelize().query('DROP TRIGGER IF EXISTS test_refuse_version', { type: QueryTypes.RAW });
    }
    expect(await Site.count()).toBe(before);
  });
});
