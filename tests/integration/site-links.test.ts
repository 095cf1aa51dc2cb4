import { beforeAll, describe, expect, it } from 'vitest';
import { POST as sitePOST } from '@/app/api/sites/route';
import { PATCH as sitePATCH } from '@/app/api/sites/[id]/route';
import { POST as askPOST } from '@/app/api/questions/route';
import { GET as threadGET } from '@/app/api/questions/[id]/route';
import { POST as calcPOST } from '@/app/api/calculations/route';
import { initModels } from '@/models';
import { loadThread } from '@/lib/questions/thread';
import { askFromSite, siteLinks, sitesOnProfile } from '@/lib/sites/links';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

/**
 * Issue 22: a site's links. A question or worked calculation names the site it is about by
 * its address; only the site's owner may link to it, checked in the write's own transaction
 * (a refusal names `siteId` and leaves nothing behind). Readers see the link only when they
 * may see the site (real MariaDB).
 */
const { call } = actAs('10.143');
const OWNER = 'ferncombe_tamsin';
const OTHER = 'ironwheel_builds';
const MODERATOR = 'moss_moderator';
// an invented brook: 4 ft of fall, 10 US gal/min to spare, a house 29 ft up (common practice, no source)
const SURVEY = {
  fall: '4 ft',
  lift: '29 ft',
  sourceRun: '30 ft',
  tankRun: '150 ft',
  spareFlow: '10 gal/min',
  people: '2',
};
const QUESTION = {
  title: 'Planned ram on the lower brook: will a 3/4 inch pump do?',
  body: 'The plan says one 3/4 inch pump; I would like a second opinion before buying pipe.',
  tags: ['stall'],
};

const newSite = async (who: string, name: string) => {
  const res = await call(sitePOST, 'POST', '/api/sites', who, { name, survey: SURVEY });
  expect(res.status).toBe(201);
  return res.body.id as string;
};
const setVisibility = (who: string, id: string, visibility: string) =>
  call(sitePATCH, 'PATCH', `/api/sites/${id}`, who, { visibility }, { id });
const ask = (who: string, body: unknown) => call(askPOST, 'POST', '/api/questions', who, body);
const saveCalc = (who: string, body: unknown) => call(calcPOST, 'POST', '/api/calculations', who, body);
const userId = async (handle: string) => (await initModels().User.findOne({ where: { handle } }))!.id;

/** Every table a question or a calculation writes to: a refused request must leave each as it was. */
async function counts() {
  const { Question, QuestionTag, Revision, QuestionFollow, WorkedCalculation } = initModels();
  return {
    questions: await Question.count(),
    tags: await QuestionTag.count(),
    revisions: await Revision.count(),
    follows: await QuestionFollow.count(),
    calculations: await WorkedCalculation.count(),
  };
}

describe('a site’s questions and worked calculations (real MariaDB)', () => {
  let mine: string;
  let othersPrivate: string;
  let othersPublic: string;
  beforeAll(async () => {
    await freshDemoDatabase();
    mine = await newSite(OWNER, 'Lower brook');
    othersPrivate = await newSite(OTHER, 'Quarry spring');
    othersPublic = await newSite(OTHER, 'Mill leat');
    expect((await setVisibility(OTHER, othersPublic, 'public')).status).toBe(200);
  });

  it('a question about the owner’s own site is stored with it; the thread names it only to those who may see the site', async () => {
    const res = await ask(OWNER, { ...QUESTION, siteId: mine });
    expect(res.status).toBe(201);
    const q = (await initModels().Question.findByPk(res.body.id))!;
    const { Site } = initModels();
    expect(q.siteId).toBe((await Site.findOne({ where: { publicId: mine } }))!.id);

    // private: the owner reads the link, the cached page (no reader) and anyone else do not
    expect((await loadThread(q.id, null)).site).toBeNull();
    const owner = await call(threadGET, 'GET', `/api/questions/${q.id}`, OWNER, undefined, { id: String(q.id) });
    expect(owner.body.site).toEqual({ id: mine, name: 'Lower brook' });
    const other = await call(threadGET, 'GET', `/api/questions/${q.id}`, OTHER, undefined, { id: String(q.id) });
    expect(other.status).toBe(200);
    expect(other.body.site).toBeNull();
    expect(JSON.stringify(other.body)).not.toContain('Lower brook');

    // shared by link: every reader may see it, so the page names it
    expect((await setVisibility(OWNER, mine, 'link')).status).toBe(200);
    expect((await loadThread(q.id, null)).site).toEqual({ id: mine, name: 'Lower brook' });
    expect((await setVisibility(OWNER, mine, 'private')).status).toBe(200);
    expect((await loadThread(q.id, null)).site).toBeNull();
  });

  it.each([
    ['another member’s private site', () => othersPrivate, 404],
    ['another member’s public site', () => othersPublic, 403],
    ['a site that does not exist', () => 'NoSuchSite01', 404],
  ])('a question about %s is refused naming siteId, and nothing is half-saved', async (_, site, status) => {
    const before = await counts();
    const res = await ask(OWNER, { ...QUESTION, siteId: site() });
    expect(res.status).toBe(status);
    expect(res.body.error.field).toBe('siteId');
    expect(await counts()).toEqual(before);
  });

  it('a site id that is no id is a 400 naming siteId', async () => {
    const before = await counts();
    for (const siteId of ['../etc', 12, '']) {
      const res = await ask(OWNER, { ...QUESTION, siteId });
      expect(res.status).toBe(400);
      expect(res.body.error.field).toBe('siteId');
    }
    expect(await counts()).toEqual(before);
  });

  it('a worked calculation from the owner’s site is linked to it; anyone else’s site is refused naming siteId', async () => {
    // 4 ft of fall, 29 ft of lift, 4 US gal/min of drive flow (invented, common practice, no source)
    const calc = { tool: 'yield-estimate', inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '4 gal/min' } };
    const ok = await saveCalc(OWNER, { ...calc, siteId: mine, title: 'Yield at the lower brook' });
    expect(ok.status).toBe(201);
    const { WorkedCalculation, Site } = initModels();
    const row = (await WorkedCalculation.findOne({ where: { publicId: ok.body.id } }))!;
    expect(row.siteId).toBe((await Site.findOne({ where: { publicId: mine } }))!.id);
    // without a site it is saved as before, linked to none
    const plain = await saveCalc(OWNER, calc);
    expect((await WorkedCalculation.findOne({ where: { publicId: plain.body.id } }))!.siteId ?? null).toBeNull();

    for (const [siteId, status] of [
      [othersPrivate, 404],
      [othersPublic, 403],
      ['NoSuchSite01', 404],
      ['not an id!', 400],
    ] as const) {
      const before = await counts();
      const res = await saveCalc(OWNER, { ...calc, siteId });
      expect(res.status).toBe(status);
      expect(res.body.error.field).toBe('siteId');
      expect(await counts()).toEqual(before);
    }
    expect((await saveCalc(OTHER, { ...calc, siteId: mine })).body.error.field).toBe('siteId');
  });

  it('the site lists its visible questions and its worked calculations; a hidden question only for moderators', async () => {
    const id = (await ask(OWNER, { ...QUESTION, title: 'Where should the lower brook’s tank stand?', siteId: mine }))
      .body.id as number;
    const { Question } = initModels();
    const owner = { id: await userId(OWNER), role: 'member' as const };
    let links = (await siteLinks(owner, mine))!;
    expect(links.questions.map((q) => q.id)).toContain(id);
    expect(links.questions.every((q) => q.state === 'waiting' && !q.takenDown)).toBe(true);
    expect(links.calculations.map((c) => c.title)).toContain('Yield at the lower brook');

    await Question.update({ hiddenAt: new Date() }, { where: { id } });
    links = (await siteLinks(owner, mine))!;
    expect(links.questions.map((q) => q.id)).not.toContain(id);
    const moderator = { id: await userId(MODERATOR), role: 'moderator' as const };
    // a moderator may not see a private site at all; shared, they see the hidden question marked
    expect(await siteLinks(moderator, mine)).toBeNull();
    await setVisibility(OWNER, mine, 'link');
    const seen = (await siteLinks(moderator, mine))!.questions.find((q) => q.id === id);
    expect(seen?.takenDown).toBe(true);
    expect((await siteLinks(null, mine))!.questions.map((q) => q.id)).not.toContain(id);
    await setVisibility(OWNER, mine, 'private');
    expect(await siteLinks(null, mine)).toBeNull();
  });

  it('the ask form fills from the asker’s own site only', async () => {
    const owner = { id: await userId(OWNER), role: 'member' as const };
    const other = { id: await userId(OTHER), role: 'expert' as const };
    const from = await askFromSite(owner, mine, 'US');
    expect(from?.name).toBe('Lower brook');
    expect(from?.siteSheet).toMatchObject({ fall: '4 ft', lift: '29 ft', sourceFlow: '10 gal/min' });
    expect(await askFromSite(other, mine, 'US')).toBeNull();
    expect(await askFromSite(owner, othersPublic, 'US')).toBeNull();
    expect(await askFromSite(owner, 'NoSuchSite01', 'US')).toBeNull();
  });

  it('a member’s page lists their public sites to everyone, and all of their own, with who may see each, to them', async () => {
    const otherId = await userId(OTHER);
    const other = { id: otherId, role: 'expert' as const };
    const owner = { id: await userId(OWNER), role: 'member' as const };
    for (const viewer of [null, owner]) {
      const shown = await sitesOnProfile(viewer, otherId);
      expect(shown.own).toBe(false);
      expect(shown.sites.map((s) => s.name)).toEqual(['Mill leat']);
    }
    const themself = await sitesOnProfile(other, otherId);
    expect(themself.own).toBe(true);
    expect(themself.sites.map((s) => [s.name, s.visibility]).sort()).toEqual([
      ['Mill leat', 'public'],
      ['Quarry spring', 'private'],
    ]);
    // a site shared by link is not listed: only the link leads to it
    await setVisibility(OTHER, othersPrivate, 'link');
    expect((await sitesOnProfile(owner, otherId)).sites.map((s) => s.name)).toEqual(['Mill leat']);
    await setVisibility(OTHER, othersPrivate, 'private');
  });
});
