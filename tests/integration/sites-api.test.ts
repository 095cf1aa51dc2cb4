import { beforeAll, describe, expect, it } from 'vitest';
import { POST as savePOST } from '@/app/api/sites/route';
import { GET as siteGET, PATCH as sitePATCH } from '@/app/api/sites/[id]/route';
import { POST as versionPOST } from '@/app/api/sites/[id]/versions/route';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

/**
 * Issue 22: saving a planned site through the API. The server plans the survey itself,
 * a survey it cannot plan is a 422 naming the input, bad bodies a 400 naming the field,
 * and a private site answers 404 to anyone but its owner (real MariaDB).
 */
const { call } = actAs('10.72');
const { Site, SiteVersion } = initModels();
const OWNER = 'ferncombe_tamsin';
const OTHER = 'ironwheel_builds';
// an invented brook: 4 ft of fall, 10 US gal/min to spare, a house 29 ft up (common practice, no source)
const SURVEY = {
  fall: '4 ft',
  lift: '29 ft',
  sourceRun: '30 ft',
  tankRun: '150 ft',
  spareFlow: '10 gal/min',
  people: '2',
};

const save = (who: string | null, body: unknown) => call(savePOST, 'POST', '/api/sites', who, body);
const get = (id: string, who: string | null, q = '') =>
  call(siteGET, 'GET', `/api/sites/${id}${q}`, who, undefined, { id });

describe('the sites API (real MariaDB)', () => {
  beforeAll(async () => {
    await freshDemoDatabase();
  });

  it('saves a site with the plan the server made, private to its owner', async () => {
    const res = await save(OWNER, { name: 'Lower meadow', survey: { ...SURVEY, results: 'forged', injected: 'x' } });
    expect(res.status).toBe(201);
    const id = res.body.id as string;
    const mine = await get(id, OWNER);
    expect(mine.status).toBe(200);
    expect(mine.body.current.plan.verdict.verdict).toBe('works');
    // only the planner's own inputs are kept
    expect(Object.keys(mine.body.current.survey)).not.toContain('results');
    expect(Object.keys(mine.body.current.survey)).not.toContain('injected');
    for (const who of [null, OTHER]) expect((await get(id, who)).status).toBe(404);
  });

  it('signed out, it asks to sign in; a bad body names its field; nothing is saved', async () => {
    const before = await Site.count();
    expect((await save(null, { name: 'x', survey: SURVEY })).status).toBe(401);
    const noName = await save(OWNER, { name: '  ', survey: SURVEY });
    expect(noName.status).toBe(400);
    expect(noName.body.error.field).toBe('name');
    const long = await save(OWNER, { name: 'x', survey: { fall: 'x'.repeat(201) } });
    expect(long.status).toBe(400);
    expect(String(long.body.error.field)).toMatch(/^survey/);
    expect(await Site.count()).toBe(before);
  });

  it('a survey the planner refuses is a 422 naming the input, nothing saved', async () => {
    const before = await SiteVersion.count();
    const res = await save(OWNER, { name: 'Downhill?', survey: { ...SURVEY, lift: '2 ft' } });
    expect(res.status).toBe(422);
    expect(res.body.error.field).toBe('survey.lift');
    expect(await SiteVersion.count()).toBe(before);
  });

  it('the owner shares it by link and saves a changed survey as version 2; others may not', async () => {
    const id = (await save(OWNER, { name: 'Upper spring', survey: SURVEY })).body.id as string;
    const patch = (who: string, body: unknown) => call(sitePATCH, 'PATCH', `/api/sites/${id}`, who, body, { id });
    expect((await patch(OTHER, { visibility: 'public' })).status).toBe(404);
    const bad = await patch(OWNER, { visibility: 'everyone' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('visibility');
    expect((await patch(OWNER, { visibility: 'link' })).status).toBe(200);
    expect((await get(id, null)).status).toBe(200);

    const version = (who: string, survey: unknown) =>
      call(versionPOST, 'POST', `/api/sites/${id}/versions`, who, { survey }, { id });
    expect((await version(OTHER, { ...SURVEY, fall: '6 ft' })).status).toBe(403);
    const v2 = await version(OWNER, { ...SURVEY, fall: '6 ft' });
    expect(v2.status).toBe(201);
    expect(v2.body.version).toBe(2);
    expect((await get(id, null)).body.current.survey.fall).toBe('6 ft');
    expect((await get(id, null, '?version=1')).body.current.survey.fall).toBe('4 ft');
    expect((await get(id, null, '?version=0')).status).toBe(400);
  });
});
