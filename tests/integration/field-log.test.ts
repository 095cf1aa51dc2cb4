import { readFileSync } from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { GET as list, POST as create } from '@/app/api/field-log/route';
import { GET as getOne } from '@/app/api/field-log/[id]/route';
import { POST as link } from '@/app/api/field-log/[id]/link/route';
import { GET as exportCsvRoute } from '@/app/api/field-log/export/route';
import { POST as importRoute } from '@/app/api/field-log/import/route';
import { POST as moderate } from '@/app/api/review/actions/route';
import { POST as flag } from '@/app/api/flags/route';
import { GET as queue } from '@/app/api/review/route';
import { estimateYield, toSI } from '@/lib/hydraulics';
import { getComparison, getEntry } from '@/lib/field-log/store';
import { entrySiteSheet } from '@/lib/calculators/site-sheet';
import { POST as ask } from '@/app/api/questions/route';
import { demoFieldLog } from '@/migrations/seed/demo-field-log';
import { demoSiteTestCount } from '@/migrations/seed/demo-sites';
import { initModels } from '@/models';
import { newPhotoId } from '@/lib/photos/storage';
import { actAs } from '../support/act-as';
import { freshDemoDatabase } from '../support/db';

const { raw, call } = actAs('10.41');
const fixture = readFileSync(path.join(__dirname, '../support/fixtures/field-log-import.csv'), 'utf8');

/** 2 US gal/min of drive water, 4 ft of fall, 29 ft of lift, three bucket trials averaging 500 mL a minute. */
const entry = {
  siteName: 'Test brook below the ford',
  testedOn: '2026-05-14',
  pumpSize: '1/2',
  fall: '4 ft',
  lift: '29 ft',
  driveLength: '30 ft',
  driveSize: '1/2',
  driveMaterial: 'pvc',
  deliveryLength: '200 ft',
  deliverySize: '1/2',
  deliveryMaterial: 'hdpe',
  driveFlow: '2 gal/min',
  driveFlowMethod: 'measured',
  driveFlowHow: 'all the water caught in a bucket for a minute',
  trials: [
    { volume: '0.49 L', seconds: 60 },
    { volume: '0.5 L', seconds: 60 },
    { volume: '0.51 L', seconds: 60 },
  ],
  bpm: 60,
  wasteValveSetting: 'stroke 8 mm',
  waterTempC: 10,
  notes: 'A test entry.',
};

const count = () => initModels().FieldLogEntry.count();

describe('field log API', () => {
  beforeAll(freshDemoDatabase);

  it('lists the demo entries with their engine view, paged and sortable', async () => {
    const res = await call(list, 'GET', '/api/field-log?perPage=100&sort=efficiency&dir=asc', null);
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(demoFieldLog().length + demoSiteTestCount());
    const etas: number[] = res.body.items.map((e: { performance: { dAubuisson: number } }) => e.performance.dAubuisson);
    expect(etas).toEqual([...etas].sort((a, b) => a - b));
    const page2 = await call(list, 'GET', '/api/field-log?perPage=10&page=2', null);
    expect(page2.body.items.length).toBe(10);
    expect(page2.body.totalPages).toBe(Math.ceil((demoFieldLog().length + demoSiteTestCount()) / 10));
    const bad = await call(list, 'GET', '/api/field-log?material=bamboo', null);
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('material');
  });

  it('records an entry with three bucket trials and computes both efficiencies as the engine does', async () => {
    const res = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', entry);
    expect(res.status).toBe(201);
    const got = await call(getOne, 'GET', `/api/field-log/${res.body.id}`, null, undefined, {
      id: String(res.body.id),
    });
    expect(got.status).toBe(200);
    const e = got.body;
    expect(e.trials.map((t: { volumeL: number }) => t.volumeL)).toEqual([0.49, 0.5, 0.51]);
    expect(e.fallM).toBeCloseTo(1.2192, 6); // 4 ft × 0.3048 m/ft, exact by definition (NIST SP 811, 2008)
    expect(e.typed.fall).toBe('4 ft');
    // Hand calculation from the definitions (η_D = q·h/(Q·H), η_R = q·(h−H)/((Q−q)·H), Krol 1951,
    // "The automatic hydraulic ram", Proc. IMechE — from memory): q/Q = 500 mL/min ÷ 2 US gal/min
    // = 8.333e-6 / 1.2618e-4 = 0.06604; η_D = 0.06604 × 29/4 = 0.479; η_R = 8.333e-6 × 25 / (1.1785e-4 × 4) = 0.442.
    expect(e.performance.dAubuisson).toBeCloseTo(0.479, 3);
    expect(e.performance.rankine).toBeCloseTo(0.442, 3);
    expect(e.performance.liftRatio).toBeCloseTo(7.25, 6); // 29 ft / 4 ft
    // The entry's prediction is the engine's yield estimate for the same numbers, not a copy of its formula.
    const engine = estimateYield({
      driveFlowM3s: toSI(2, 'gal/min', 'flow'),
      fallM: 1.2192,
      liftM: 8.8392,
      pumpType: 'homemade',
      waterTempC: 10,
    }).results;
    expect(e.performance.predictedDeliveredFlowM3s).toBeCloseTo(engine.deliveredFlowM3s, 12);
    // and that estimate is the engine's documented worked example: typical homemade η 0.2769 at h/H = 7.25
    // (Building Trades Pocketbook table × 0.33/0.66 from Water for the World RWS.4.D.5, efficiency.ts; was 0.514
    // from memory) → q = 4.819e-6 m³/s, 289 mL/min
    expect(e.performance.predictedDeliveredFlowM3s * 6e7).toBeCloseTo(289.1, 0);
    expect(e.performance.measuredOverPredicted).toBeCloseTo(500 / 289.1, 2); // 500 mL/min measured ÷ 289 predicted
  });

  it('refuses bad entries naming the field, and saves nothing', async () => {
    const before = await count();
    const lowLift = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', { ...entry, lift: '3 ft' });
    expect(lowLift.status).toBe(422);
    expect(lowLift.body.error.field).toBe('lift');
    const badUnit = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', { ...entry, fall: '4 bananas' });
    expect(badUnit.status).toBe(422);
    expect(badUnit.body.error.field).toBe('fall');
    const noTrials = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', { ...entry, trials: [] });
    expect(noTrials.status).toBe(400);
    expect(noTrials.body.error.field).toBe('trials');
    // 5 L a minute up 29 ft from 2 gal/min falling 4 ft would be an efficiency far above 1
    const tooGood = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', {
      ...entry,
      trials: [{ volume: '5 L', seconds: 60 }],
    });
    expect(tooGood.status).toBe(422);
    expect(tooGood.body.error.field).toBe('trials');
    const badTrial = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', {
      ...entry,
      trials: [
        { volume: '0.5 L', seconds: 60 },
        { volume: 'half a bucket', seconds: 60 },
      ],
    });
    expect(badTrial.status).toBe(422);
    expect(badTrial.body.error.field).toBe('trials.1.volume');
    expect(await count()).toBe(before);
  });

  it("attaches the member's own uploaded photos to the entry, and refuses someone else's with nothing saved", async () => {
    const { Photo, User } = initModels();
    const cabin = (await User.findOne({ where: { handle: 'sorrel_cabin' } }))!.id;
    const shepherd = (await User.findOne({ where: { handle: 'highcrag_shepherd' } }))!.id;
    const photo = (ownerId: number, publicId: string) =>
      Photo.create({
        publicId,
        ownerId,
        questionId: null,
        answerId: null,
        mime: 'image/webp',
        width: 640,
        height: 480,
        bytes: 1000,
        alt: 'the pump',
      });
    const mine = (await photo(cabin, newPhotoId())).publicId;
    const theirs = (await photo(shepherd, newPhotoId())).publicId;
    const before = await count();
    const refused = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', { ...entry, photoIds: [theirs] });
    expect(refused.status).toBe(422);
    expect(refused.body.error.field).toBe('photoIds');
    expect(await count()).toBe(before);
    const ok = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', {
      ...entry,
      siteName: 'Photo test site',
      photoIds: [mine],
    });
    expect(ok.status).toBe(201);
    expect((await Photo.findOne({ where: { publicId: mine } }))?.fieldLogEntryId).toBe(ok.body.id);
    expect((await Photo.findOne({ where: { publicId: theirs } }))?.fieldLogEntryId).toBeNull();
  });

  it('imports all or nothing by default, naming each bad row and column', async () => {
    const before = await count();
    const res = await call(importRoute, 'POST', '/api/field-log/import', 'sorrel_cabin', { csv: fixture });
    expect(res.status).toBe(422);
    expect(res.body.error.field).toBe('csv');
    expect(res.body.imported).toBe(0);
    expect(res.body.errors.map((e: { line: number; column: string }) => [e.line, e.column])).toEqual([
      [4, 'lift_m'],
      [5, 'pump_size_in'],
      [6, 'trial_seconds'],
      [7, 'tested_on'],
    ]);
    expect(await count()).toBe(before);
  });

  it('imports the valid rows only when asked, listing the skipped ones', async () => {
    const before = await count();
    const res = await call(importRoute, 'POST', '/api/field-log/import', 'sorrel_cabin', {
      csv: fixture,
      mode: 'valid-only',
    });
    expect(res.status).toBe(201);
    expect(res.body.imported).toBe(3);
    expect(res.body.skipped).toBe(4);
    expect(await count()).toBe(before + 3);
    const spring = await initModels().FieldLogEntry.findOne({
      where: { siteName: 'Import test spring' },
      include: ['trials'],
    });
    expect(spring?.trials?.length).toBe(3);
    expect(spring?.driveFlowM3s).toBeCloseTo(80 / 60_000, 12); // 80 L/min ÷ 60 000 = m³/s, by definition
  });

  it('refuses a file that is not our CSV, and a bad mode', async () => {
    const wrong = await call(importRoute, 'POST', '/api/field-log/import', 'sorrel_cabin', {
      csv: 'name,height\nfoo,3\n',
    });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.field).toBe('file');
    const mode = await call(importRoute, 'POST', '/api/field-log/import', 'sorrel_cabin', {
      csv: fixture,
      mode: 'some',
    });
    expect(mode.status).toBe(400);
    expect(mode.body.error.field).toBe('mode');
  });

  it('export round-trips through import', async () => {
    const first = await raw(exportCsvRoute, 'GET', '/api/field-log/export?material=steel', null);
    expect(first.status).toBe(200);
    expect(first.headers.get('content-type')).toContain('text/csv');
    const text = await first.text();
    const rows = text.trim().split('\r\n');
    expect(rows[0].split(',').slice(0, 3)).toEqual(['site_name', 'tested_on', 'pump_type']);
    const n = rows.length - 1;
    expect(n).toBeGreaterThan(0);
    const imported = await call(importRoute, 'POST', '/api/field-log/import', 'highcrag_shepherd', { csv: text });
    expect(imported.status).toBe(201);
    expect(imported.body.imported).toBe(n);
    const second = await (await raw(exportCsvRoute, 'GET', '/api/field-log/export?material=steel', null)).text();
    const again = second.trim().split('\r\n');
    expect(again.length - 1).toBe(2 * n);
    // every row, computed columns included, comes back exactly, twice over
    expect([...again.slice(1)].sort()).toEqual([...rows.slice(1), ...rows.slice(1)].sort());
  });

  it('links an after to a before on the same site and reads the ratio with the spread of the trials', async () => {
    const a = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', {
      ...entry,
      siteName: 'Linked test site',
      testedOn: '2026-06-01',
    });
    const b = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', {
      ...entry,
      siteName: 'Linked test site',
      testedOn: '2026-06-08',
      pumpCount: 2,
      arrangement: 'parallel',
      driveFlow: '3.8 gal/min',
      trials: [
        { volume: '0.9 L', seconds: 60 },
        { volume: '0.88 L', seconds: 60 },
        { volume: '0.92 L', seconds: 60 },
      ],
    });
    const other = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', {
      ...entry,
      siteName: 'Somewhere else',
      testedOn: '2026-06-09',
    });
    const wrongSite = await call(
      link,
      'POST',
      `/api/field-log/${other.body.id}/link`,
      'sorrel_cabin',
      { beforeId: a.body.id, whatChanged: 'moved' },
      { id: String(other.body.id) },
    );
    expect(wrongSite.status).toBe(422);
    expect(wrongSite.body.error.field).toBe('beforeId');
    const notMine = await call(
      link,
      'POST',
      `/api/field-log/${b.body.id}/link`,
      'highcrag_shepherd',
      { beforeId: a.body.id, whatChanged: 'second pump' },
      { id: String(b.body.id) },
    );
    expect(notMine.status).toBe(403);
    const ok = await call(
      link,
      'POST',
      `/api/field-log/${b.body.id}/link`,
      'sorrel_cabin',
      { beforeId: a.body.id, whatChanged: 'a second pump in parallel' },
      { id: String(b.body.id) },
    );
    expect(ok.status).toBe(201);
    expect(ok.body.url).toBe(`/field-log/compare/${a.body.id}/${b.body.id}`);
    const twice = await call(
      link,
      'POST',
      `/api/field-log/${b.body.id}/link`,
      'sorrel_cabin',
      { beforeId: a.body.id, whatChanged: 'again' },
      { id: String(b.body.id) },
    );
    expect(twice.status).toBe(409);
    const cmp = (await getComparison(a.body.id, b.body.id, null))!;
    // ratio of means: 0.9 L/min ÷ 0.5 L/min = 1.8; spread: 0.88/0.51 = 1.725 to 0.92/0.49 = 1.878 (hand calculation)
    expect(cmp.measured.ratio).toBeCloseTo(1.8, 6);
    expect(cmp.measured.low).toBeCloseTo(0.88 / 0.51, 6);
    expect(cmp.measured.high).toBeCloseTo(0.92 / 0.49, 6);
    expect(cmp.planner).not.toBeNull();
  });

  it('the demo one-pump against two-pump comparison reads like a real test: clearly more, less than double', async () => {
    const { FieldLogEntry } = initModels();
    const [one, two] = await FieldLogEntry.findAll({
      where: { siteName: 'Ferncombe lower meadow' },
      order: [['id', 'ASC']],
    });
    const cmp = (await getComparison(one.id, two.id, null))!;
    expect(cmp.before.pumpCount).toBe(1);
    expect(cmp.after.pumpCount).toBe(2);
    // two pumps sharing one intake and one delivery line: more than one pump, less than two (common practice, no source)
    expect(cmp.measured.low).toBeGreaterThan(1.3);
    expect(cmp.measured.high).toBeLessThan(2);
    // the planner, given the one pump's drive flow for each, expects close to double; the test fell short of it
    expect(cmp.planner!.ratio).toBeGreaterThan(cmp.measured.high);
    expect(cmp.planner!.ratio).toBeLessThanOrEqual(2);
    for (const e of [cmp.before, cmp.after]) {
      expect(e.performance.dAubuisson).toBeGreaterThanOrEqual(e.performance.band.low);
      expect(e.performance.dAubuisson).toBeLessThanOrEqual(e.performance.band.high);
    }
  });

  it('a question can be asked with its site sheet filled from an entry, and links to it', async () => {
    const { FieldLogEntry, Question } = initModels();
    const one = (await FieldLogEntry.findOne({
      where: { siteName: 'Ferncombe lower meadow' },
      order: [['id', 'ASC']],
    }))!;
    const view = (await getEntry(one.id, null))!;
    const siteSheet = entrySiteSheet(view);
    expect(siteSheet.fall).toBe('2.4 m');
    expect(siteSheet.driveMaterial).toBe('steel-sch40');
    const question = {
      title: 'Second pump gave less than double',
      body: 'Two 1 inch pumps in parallel deliver about 1.7 times one pump. Is the intake the limit?',
      tags: ['stall'],
      siteSheet,
      fieldLogEntryId: one.id,
    };
    const res = await call(ask, 'POST', '/api/questions', 'ferncombe_tamsin', question);
    expect(res.status).toBe(201);
    expect((await Question.findByPk(res.body.id))?.fieldLogEntryId).toBe(one.id);
    const bad = await call(ask, 'POST', '/api/questions', 'ferncombe_tamsin', { ...question, fieldLogEntryId: 999999 });
    expect(bad.status).toBe(422);
    expect(bad.body.error.field).toBe('fieldLogEntryId');
  });

  it('a hidden entry is shown only to moderators', async () => {
    const res = await call(create, 'POST', '/api/field-log', 'sorrel_cabin', {
      ...entry,
      siteName: 'To be hidden',
      testedOn: '2026-07-01',
    });
    const id = String(res.body.id);
    const flagged = await call(flag, 'POST', '/api/flags', 'highcrag_shepherd', {
      postType: 'field-log',
      postId: res.body.id,
      reason: 'other',
      note: 'numbers look copied',
    });
    expect(flagged.status).toBeLessThan(300);
    const q = await call(queue, 'GET', '/api/review', 'moss_moderator');
    expect(
      q.body.items.some(
        (i: { post: { type: string; id: number } }) => i.post.type === 'field-log' && i.post.id === res.body.id,
      ),
    ).toBe(true);
    const hide = await call(moderate, 'POST', '/api/review/actions', 'moss_moderator', {
      action: 'hide',
      postType: 'field-log',
      postId: res.body.id,
      reason: 'made-up numbers',
    });
    expect(hide.status).toBe(200);
    expect((await call(getOne, 'GET', `/api/field-log/${id}`, null, undefined, { id })).status).toBe(404);
    expect((await call(getOne, 'GET', `/api/field-log/${id}`, 'highcrag_shepherd', undefined, { id })).status).toBe(
      404,
    );
    const mod = await call(getOne, 'GET', `/api/field-log/${id}`, 'moss_moderator', undefined, { id });
    expect(mod.status).toBe(200);
    expect(mod.body.hidden).toBe(true);
    const listed = await call(list, 'GET', '/api/field-log?perPage=100&sort=site&dir=desc', null);
    expect(listed.body.items.some((e: { id: number }) => e.id === res.body.id)).toBe(false);
  });
});
