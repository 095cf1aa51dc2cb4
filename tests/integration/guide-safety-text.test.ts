import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { initModels } from '@/models';
import { contentHash, listGuides, readGuideFile } from '@/lib/guides/content';
import { checkedVersion, safetyStates } from '@/lib/guides/safety';
import { GET as getChecks, POST as postCheck } from '@/app/api/guides/[slug]/safety-checks/route';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.21.1');

describe('a safety check keeps the text it was made on', () => {
  beforeAll(freshDemoDatabase);

  it('the seed keeps each demo check’s text, and the text hashes to the check’s hash', async () => {
    const rows = await initModels().SafetyCheck.findAll();
    expect(rows.length).toBeGreaterThan(0);
    for (const r of rows) {
      expect(r.checkedText).not.toBeNull();
      expect(contentHash(r.checkedText!)).toBe(r.contentHash);
    }
  });

  it('tells the four states apart on the guide list', async () => {
    const states = await safetyStates(listGuides());
    // migrations/seed/demo-data.ts demoSafetyChecks: one "needs changes" on the text now, the drive
    // pipe's two on earlier wordings, no check on the survey guide, a sound one on how a ram works
    expect(states['will-a-ram-meet-my-demand']).toBe('needs changes');
    expect(states['the-drive-pipe']).toBe('changed');
    expect(states['surveying-fall-and-flow']).toBe('not checked');
    expect(states['how-a-ram-pump-works']).toBe('checked');
  });

  it('the route says "needs changes" for a guide whose only check asked for changes', async () => {
    const res = await call(getChecks, 'GET', '/api/guides/will-a-ram-meet-my-demand/safety-checks', null, undefined, {
      slug: 'will-a-ram-meet-my-demand',
    });
    expect(res.status).toBe(200);
    expect(res.body.status.state).toBe('needs changes');
    expect(res.body.status.latest.verdict).toBe('needs changes');
  });

  it('dates a stale demo check before the guide’s "updated" day and shows what changed since it', async () => {
    const guide = readGuideFile('the-drive-pipe')!;
    const v = await checkedVersion(guide);
    expect(v).not.toBeNull();
    expect(v!.check.current).toBe(false);
    expect(v!.check.checkedAt.slice(0, 10) < guide.meta.updated).toBe(true);
    expect(v!.check.checkedVersionUpdated! < guide.meta.updated).toBe(true);
    expect(v!.before).not.toBe(v!.after);
    expect(v!.after).toContain('Two elbows cost more still.');
    expect(v!.before).not.toContain('Two elbows cost more still.');
    // the older check came before the water hammer section was written
    const oldest = (
      await initModels().SafetyCheck.findAll({ where: { guideSlug: 'the-drive-pipe' }, order: [['createdAt', 'ASC']] })
    )[0]!;
    const older = await checkedVersion(guide, oldest.id);
    expect(older!.before).not.toContain('## Water hammer');
    expect(older!.after).toContain('## Water hammer');
    expect(await checkedVersion(guide, 999_999)).toBeNull();
  });
});

describe('an expert’s check, then an edit to the guide', () => {
  let dir = '';
  const slug = 'surveying-fall-and-flow';
  const url = `/api/guides/${slug}/safety-checks`;
  beforeAll(async () => {
    await freshDemoDatabase();
    dir = mkdtempSync(path.join(tmpdir(), 'cw-guides-'));
    cpSync(path.join(process.cwd(), 'content/guides'), dir, { recursive: true });
    process.env.GUIDES_DIR = dir;
  });
  afterAll(() => {
    delete process.env.GUIDES_DIR;
  });

  it('stores the file as the expert read it; an edit then says changed and the diff names the edit', async () => {
    const file = path.join(dir, `${slug}.mdx`);
    const read = readFileSync(file, 'utf8');
    const res = await call(
      postCheck,
      'POST',
      url,
      'ironwheel_builds',
      { verdict: 'needs changes', notes: 'Say where to stand.' },
      { slug },
    );
    expect(res.status).toBe(201);
    const stored = await initModels().SafetyCheck.findByPk(res.body.id);
    expect(stored?.checkedText).toBe(read);
    expect(stored?.contentHash).toBe(contentHash(read));

    const now = await call(getChecks, 'GET', url, null, undefined, { slug });
    expect(now.body.status.state).toBe('needs changes');

    writeFileSync(file, `${read}\nStand on the bank, never in the stream, while you time the bucket.\n`);
    const after = await call(getChecks, 'GET', url, null, undefined, { slug });
    expect(after.body.status.state).toBe('changed');
    expect(after.body.status.latest.hasText).toBe(true);
    const v = await checkedVersion(readGuideFile(slug)!);
    expect(v!.check.id).toBe(res.body.id);
    expect(v!.after).toContain('Stand on the bank, never in the stream');
    expect(v!.before).not.toContain('Stand on the bank');

    const sound = await call(postCheck, 'POST', url, 'ironwheel_builds', { verdict: 'sound' }, { slug });
    expect(sound.status).toBe(201);
    expect((await call(getChecks, 'GET', url, null, undefined, { slug })).body.status.state).toBe('checked');
  });
});
