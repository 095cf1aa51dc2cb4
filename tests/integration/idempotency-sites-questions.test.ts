import { beforeAll, describe, expect, it } from 'vitest';
import { POST as saveSite } from '@/app/api/sites/route';
import { POST as addVersion } from '@/app/api/sites/[id]/versions/route';
import { POST as ask } from '@/app/api/questions/route';
import { initModels } from '@/models';
import { actAs } from '../support/act-as';
import { freshDemoDatabase } from '../support/db';

/**
 * Issue 24: a site's survey and a question made with no signal wait in the phone's outbox
 * and are sent when it is back online, each with its own Idempotency-Key. A send cut off
 * after the server wrote, then sent again, is still one site, one version, one question.
 */
const { call } = actAs('10.144');
const OWNER = 'ferncombe_tamsin';
// an invented brook: 4 ft of fall, 10 US gal/min to spare, a house 29 ft up (common practice, no source)
const SURVEY = {
  fall: '4 ft',
  lift: '29 ft',
  sourceRun: '30 ft',
  tankRun: '150 ft',
  spareFlow: '10 gal/min',
  people: '2',
};
const withKey = (key: string | undefined): Record<string, string> => (key ? { 'Idempotency-Key': key } : {});

const site = (key: string | undefined, name: string, who = OWNER) =>
  call(saveSite, 'POST', '/api/sites', who, { name, survey: SURVEY }, {}, withKey(key));
const version = (key: string | undefined, id: string, survey: Record<string, string>) =>
  call(addVersion, 'POST', `/api/sites/${id}/versions`, OWNER, { survey }, { id }, withKey(key));
const question = (key: string | undefined, title: string, body = 'The ram beats a few times and stops after dark.') =>
  call(ask, 'POST', '/api/questions', OWNER, { title, body, tags: ['stall'] }, {}, withKey(key));

const { Site, SiteVersion, Question } = initModels();
const sitesNamed = (name: string) => Site.count({ where: { name } });
const versionsOf = async (publicId: string) =>
  SiteVersion.count({ where: { siteId: (await Site.findOne({ where: { publicId } }))!.id } });
const questionsTitled = (title: string) => Question.count({ where: { title } });

describe('a site sent more than once is saved once (POST /api/sites)', () => {
  beforeAll(freshDemoDatabase);

  it('answers a repeat with the first answer and saves nothing more', async () => {
    const first = await site('site-repeat-0001', 'Sent twice, the answer lost');
    expect(first.status).toBe(201);
    const again = await site('site-repeat-0001', 'Sent twice, the answer lost');
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(await sitesNamed('Sent twice, the answer lost')).toBe(1);
  });

  it('saves one when two sends with one key arrive at once', async () => {
    const [a, b] = await Promise.all([site('site-twin-0002', 'Twin sends'), site('site-twin-0002', 'Twin sends')]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).toBe(b.body.id);
    expect(await sitesNamed('Twin sends')).toBe(1);
  });

  it('refuses a key reused for another site, naming the header, and saves nothing', async () => {
    expect((await site('site-reused-0003', 'The first site')).status).toBe(201);
    const other = await site('site-reused-0003', 'Another site');
    expect(other.status).toBe(422);
    expect(other.body.error.field).toBe('Idempotency-Key');
    expect(await sitesNamed('Another site')).toBe(0);
    const bad = await site('short', 'A malformed key');
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('Idempotency-Key');
    expect(await sitesNamed('A malformed key')).toBe(0);
  });
});

describe('a changed survey sent more than once is one version (POST /api/sites/:id/versions)', () => {
  let id: string;
  beforeAll(async () => {
    const made = await site(undefined, 'Versions sent from the creek');
    id = made.body.id as string;
  });

  it('answers a repeat with the first answer and adds one version', async () => {
    const changed = { ...SURVEY, fall: '5 ft' };
    const first = await version('version-repeat-0001', id, changed);
    expect(first.status).toBe(201);
    expect(first.body.version).toBe(2);
    const again = await version('version-repeat-0001', id, changed);
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(await versionsOf(id)).toBe(2);
  });

  it('adds one when two sends with one key arrive at once', async () => {
    const changed = { ...SURVEY, fall: '6 ft' };
    const [a, b] = await Promise.all([
      version('version-twin-0002', id, changed),
      version('version-twin-0002', id, changed),
    ]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.version).toBe(b.body.version);
    expect(await versionsOf(id)).toBe(3);
  });

  it('refuses a key reused for another survey, naming the header, and adds nothing', async () => {
    expect((await version('version-reused-0003', id, { ...SURVEY, fall: '7 ft' })).status).toBe(201);
    const other = await version('version-reused-0003', id, { ...SURVEY, fall: '8 ft' });
    expect(other.status).toBe(422);
    expect(other.body.error.field).toBe('Idempotency-Key');
    expect(await versionsOf(id)).toBe(4);
  });

  it('keeps no key for a survey the planner refused, so the fixed one goes with the same key', async () => {
    // lift below the fall: a ram cannot deliver below its own drive (common practice, no source)
    const refused = await version('version-fixed-0004', id, { ...SURVEY, lift: '2 ft' });
    expect(refused.status).toBe(422);
    const fixed = await version('version-fixed-0004', id, { ...SURVEY, fall: '9 ft' });
    expect(fixed.status).toBe(201);
    expect(await versionsOf(id)).toBe(5);
  });
});

describe('a question sent more than once is one thread (POST /api/questions)', () => {
  it('answers a repeat with the first answer and asks nothing more', async () => {
    const title = 'Ram stops after dark, sent twice';
    const first = await question('question-repeat-0001', title);
    expect(first.status).toBe(201);
    const again = await question('question-repeat-0001', title);
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(await questionsTitled(title)).toBe(1);
  });

  it('asks one when two sends with one key arrive at once', async () => {
    const title = 'Ram stops after dark, twin sends';
    const [a, b] = await Promise.all([question('question-twin-0002', title), question('question-twin-0002', title)]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).toBe(b.body.id);
    expect(await questionsTitled(title)).toBe(1);
  });

  it('refuses a key reused for another question, naming the header', async () => {
    expect((await question('question-reused-0003', 'Ram stops after dark, the first')).status).toBe(201);
    const other = await question('question-reused-0003', 'Ram stops after dark, another');
    expect(other.status).toBe(422);
    expect(other.body.error.field).toBe('Idempotency-Key');
    expect(await questionsTitled('Ram stops after dark, another')).toBe(0);
  });

  it('keeps no key for a question refused as too short, so the fixed one goes with the same key', async () => {
    const title = 'Ram stops after dark, fixed';
    const refused = await question('question-fixed-0004', title, 'Too short.');
    expect(refused.status).toBe(400);
    expect(refused.body.error.field).toBe('body');
    const fixed = await question('question-fixed-0004', title);
    expect(fixed.status).toBe(201);
    expect(await questionsTitled(title)).toBe(1);
  });
});
