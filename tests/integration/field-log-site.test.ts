import { beforeAll, describe, expect, it } from 'vitest';
import { POST as create } from '@/app/api/field-log/route';
import { POST as savePOST } from '@/app/api/sites/route';
import { PATCH as sitePATCH } from '@/app/api/sites/[id]/route';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

/**
 * Issue 22: a field log test recorded on a site. Only the owner's own site takes it; a
 * site that is someone else's (shared, public or private) or that does not exist is a
 * 4xx naming siteId, and nothing of the entry is written (real MariaDB).
 */
const { call } = actAs('10.88');
const { FieldLogEntry, FieldLogTrial } = initModels();
const OWNER = 'sorrel_cabin';
const OTHER = 'quarry_lane_valves';

// an invented brook: 4 ft of fall, 10 US gal/min to spare, a house 29 ft up (invented demo numbers)
const SURVEY = { fall: '4 ft', lift: '29 ft', sourceRun: '30 ft', tankRun: '150 ft', spareFlow: '10 gal/min' };

/** 2 US gal/min of drive water, 4 ft of fall, 29 ft of lift: the field log test's own invented entry. */
const entry = {
  siteName: 'Creek below the cabin',
  testedOn: '2026-06-02',
  pumpSize: '1',
  fall: '4 ft',
  lift: '29 ft',
  driveLength: '30 ft',
  driveSize: '1',
  driveMaterial: 'pvc',
  driveFlow: '2 gal/min',
  driveFlowMethod: 'measured',
  trials: [
    { volume: '0.5 L', seconds: 60 },
    { volume: '0.5 L', seconds: 61 },
  ],
};

const saveSite = async (who: string, name: string, visibility?: 'link' | 'public') => {
  const res = await call(savePOST, 'POST', '/api/sites', who, { name, survey: SURVEY });
  expect(res.status).toBe(201);
  const id = res.body.id as string;
  if (visibility) {
    const patched = await call(sitePATCH, 'PATCH', `/api/sites/${id}`, who, { visibility }, { id });
    expect(patched.status).toBe(200);
  }
  return id;
};
const record = (who: string, body: unknown) => call(create, 'POST', '/api/field-log', who, body);
const counts = async () => [await FieldLogEntry.count(), await FieldLogTrial.count()];

describe('field log tests on a site (real MariaDB)', () => {
  let own: string;
  let othersPublic: string;
  let othersShared: string;
  let othersPrivate: string;
  beforeAll(async () => {
    await freshDemoDatabase();
    own = await saveSite(OWNER, 'Cabin creek');
    othersPublic = await saveSite(OTHER, 'Quarry spring', 'public');
    othersShared = await saveSite(OTHER, 'Quarry pond', 'link');
    othersPrivate = await saveSite(OTHER, 'Quarry seep');
  });

  it('a test on the member’s own site is stored with the site', async () => {
    const res = await record(OWNER, { ...entry, siteId: own });
    expect(res.status).toBe(201);
    const row = await FieldLogEntry.findByPk(res.body.id, { include: ['site'] });
    expect((row as unknown as { site: { publicId: string } }).site.publicId).toBe(own);
    expect(await FieldLogTrial.count({ where: { entryId: res.body.id } })).toBe(2);
  });

  it('a test without a site is stored with none, as before', async () => {
    const res = await record(OWNER, entry);
    expect(res.status).toBe(201);
    expect((await FieldLogEntry.findByPk(res.body.id))!.siteId).toBeNull();
  });

  it('another member’s site, public, shared or private, or no such site: a 4xx naming siteId, nothing saved', async () => {
    const before = await counts();
    const cases: [string, number][] = [
      [othersPublic, 403],
      [othersShared, 403],
      // a private site is nobody else's business: it does not exist for them
      [othersPrivate, 404],
      ['Nosuchsite42', 404],
    ];
    for (const [siteId, status] of cases) {
      const res = await record(OWNER, { ...entry, siteId });
      expect(res.status, siteId).toBe(status);
      expect(res.body.error.field).toBe('siteId');
    }
    const malformed = await record(OWNER, { ...entry, siteId: '../x' });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.field).toBe('siteId');
    expect(await counts()).toEqual(before);
  });

  it('nor can a moderator: the site is its owner’s alone, private or public', async () => {
    const before = await counts();
    const hidden = await record('moss_moderator', { ...entry, siteId: own });
    expect([hidden.status, hidden.body.error.field]).toEqual([404, 'siteId']);
    const patched = await call(sitePATCH, 'PATCH', `/api/sites/${own}`, OWNER, { visibility: 'public' }, { id: own });
    expect(patched.status).toBe(200);
    const seen = await record('moss_moderator', { ...entry, siteId: own });
    expect([seen.status, seen.body.error.field]).toEqual([403, 'siteId']);
    expect(await counts()).toEqual(before);
  });
});
