import { beforeAll, describe, expect, it } from 'vitest';
import { initModels } from '@/models';
import { POST as flagPOST } from '@/app/api/flags/route';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { GET as reviewGET } from '@/app/api/review/route';
import { GET as threadGET } from '@/app/api/questions/[id]/route';
import { GET as photoGET } from '@/app/api/photos/[id]/route';
import { GET as thumbGET } from '@/app/api/photos/[id]/thumb/route';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { raw, call } = actAs('10.5.0');
const act = (body: Record<string, unknown>) => call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', body);
const question = async (title: string) => (await initModels().Question.findOne({ where: { title } }))!;
const firstAnswer = async (title: string) =>
  (await initModels().Answer.findOne({ where: { questionId: (await question(title)).id }, order: [['id', 'ASC']] }))!;

/** The newest audit row and notice, and how many of each there are. */
async function trail() {
  const { AuditEntry, Notice } = initModels();
  return {
    audits: await AuditEntry.count(),
    notices: await Notice.count({ where: { kind: 'moderation' } }),
    lastAudit: await AuditEntry.findOne({ order: [['id', 'DESC']] }),
    lastNotice: await Notice.findOne({ where: { kind: 'moderation' }, order: [['id', 'DESC']] }),
  };
}
async function expectOneMoreRow(before: Awaited<ReturnType<typeof trail>>, action: string, reason: string) {
  const after = await trail();
  expect(after.audits).toBe(before.audits + 1);
  expect(after.notices).toBe(before.notices + 1);
  expect(after.lastAudit).toMatchObject({ action, reason });
  expect(after.lastNotice?.message).toContain(reason);
}

describe('each moderation action changes its state and writes its audit row and notice together (real MariaDB)', () => {
  beforeAll(freshDemoDatabase);

  it('dismiss: the flags close and a post hidden by the threshold returns', async () => {
    const q = await question('Snifter valve: how big a hole?');
    const author = (await initModels().User.findByPk(q.authorId))!.handle;
    const flaggers = ['ferncombe_tamsin', 'sorrel_cabin', 'quarry_lane_valves', 'highcrag_shepherd']
      .filter((h) => h !== author)
      .slice(0, 3); // the default threshold of 3 (lib/moderation/flags.ts)
    for (const who of flaggers)
      expect(
        (await call(flagPOST, 'POST', '/api/flags', who, { postType: 'question', postId: q.id, reason: 'spam' }))
          .status,
      ).toBe(201);
    await q.reload();
    expect(q.hiddenAt).not.toBeNull();
    const before = await trail();
    expect(
      (await act({ action: 'dismiss', postType: 'question', postId: q.id, reason: 'Not spam: a fair question.' }))
        .status,
    ).toBe(200);
    await q.reload();
    expect(q.hiddenAt).toBeNull();
    expect(await initModels().Flag.count({ where: { postType: 'question', postId: q.id, status: 'open' } })).toBe(0);
    expect(await initModels().Flag.count({ where: { postType: 'question', postId: q.id, status: 'dismissed' } })).toBe(
      3,
    );
    await expectOneMoreRow(before, 'dismiss', 'Not spam: a fair question.');
  });

  it('delete, then restore: readers lose the answer and get it back', async () => {
    const a = await firstAnswer('Tank overflow pipe size');
    const url = `/api/questions/${a.questionId}`;
    const ids = async () =>
      (await call(threadGET, 'GET', url, null, undefined, { id: String(a.questionId) })).body.answers.map(
        (x: { id: number }) => x.id,
      );
    let before = await trail();
    expect(
      (await act({ action: 'delete', postType: 'answer', postId: a.id, reason: 'Advert for a shop.' })).status,
    ).toBe(200);
    await a.reload();
    expect(a.deletedAt).not.toBeNull();
    expect(await ids()).not.toContain(a.id);
    await expectOneMoreRow(before, 'delete', 'Advert for a shop.');
    before = await trail();
    expect(
      (await act({ action: 'restore', postType: 'answer', postId: a.id, reason: 'Deleted in error.' })).status,
    ).toBe(200);
    await a.reload();
    expect(a.deletedAt).toBeNull();
    expect(await ids()).toContain(a.id);
    await expectOneMoreRow(before, 'restore', 'Deleted in error.');
  });

  it('retag: the tags change and the audit row keeps the old ones', async () => {
    const q = await question('Best time of year to build');
    const before = await trail();
    const res = await act({
      action: 'retag',
      postType: 'question',
      postId: q.id,
      reason: 'Belongs under frost.',
      tags: ['frost'],
    });
    expect(res.status).toBe(200);
    const tags = await initModels().QuestionTag.findAll({ where: { questionId: q.id } });
    const frost = (await initModels().Tag.findOne({ where: { slug: 'frost' } }))!;
    expect(tags.map((t) => t.tagId)).toEqual([frost.id]);
    await expectOneMoreRow(before, 'retag', 'Belongs under frost.');
    expect((await trail()).lastAudit?.details).toMatchObject({ tags: ['frost'] });
  });

  it('a refused action leaves no change, no audit row and no notice', async () => {
    const q = await question('Flood took the intake screen — what now?');
    const tagsBefore = (await initModels().QuestionTag.findAll({ where: { questionId: q.id } }))
      .map((t) => t.tagId)
      .sort();
    const before = await trail();
    const unknown = await act({
      action: 'retag',
      postType: 'question',
      postId: q.id,
      reason: 'Tidy the tags.',
      tags: ['no-such-tag'],
    });
    expect(unknown.status).toBe(422);
    expect(unknown.body.error.field).toBe('tags');
    const onAnswer = await act({
      action: 'lock',
      postType: 'answer',
      postId: (await firstAnswer('Flood took the intake screen — what now?')).id,
      reason: 'Lock it.',
    });
    expect(onAnswer.status).toBe(422);
    const past = await act({
      action: 'suspend',
      postType: 'question',
      postId: q.id,
      reason: 'Too long ago.',
      until: '2001-01-01',
    });
    expect(past.status).toBe(422);
    expect(past.body.error.field).toBe('until');
    const after = await trail();
    expect([after.audits, after.notices]).toEqual([before.audits, before.notices]);
    expect(
      (await initModels().QuestionTag.findAll({ where: { questionId: q.id } })).map((t) => t.tagId).sort(),
    ).toEqual(tagsBefore);
  });

  it('warn: the author gets a notice and the audit row names the member', async () => {
    const a = await firstAnswer('Burying the delivery line: how deep for frost?');
    const before = await trail();
    expect(
      (await act({ action: 'warn', postType: 'answer', postId: a.id, reason: 'Keep it civil, please.' })).status,
    ).toBe(200);
    await expectOneMoreRow(before, 'warn', 'Keep it civil, please.');
    const after = await trail();
    expect(after.lastAudit).toMatchObject({ targetType: 'member', targetId: String(a.authorId) });
    expect(after.lastNotice?.userId).toBe(a.authorId);
  });

  it('lock, then unlock: the thread takes answers again', async () => {
    const q = await question('Pump never starts after I moved it');
    expect((await act({ action: 'lock', postType: 'question', postId: q.id, reason: 'Cooling off.' })).status).toBe(
      200,
    );
    await q.reload();
    expect(q.lockedAt).not.toBeNull();
    const before = await trail();
    expect((await act({ action: 'unlock', postType: 'question', postId: q.id, reason: 'Calm again.' })).status).toBe(
      200,
    );
    await q.reload();
    expect(q.lockedAt).toBeNull();
    await expectOneMoreRow(before, 'unlock', 'Calm again.');
  });

  it('photos: a flagged photo is in the queue, and once hidden only moderators are served it', async () => {
    const { Photo } = initModels();
    const photo = (await Photo.findOne({ where: { hiddenAt: null }, order: [['id', 'ASC']] }))!;
    const owner = (await initModels().User.findByPk(photo.ownerId))!;
    const flagger = owner.handle === 'sorrel_cabin' ? 'highcrag_shepherd' : 'sorrel_cabin';
    expect(
      (
        await call(flagPOST, 'POST', '/api/flags', owner.handle, {
          postType: 'photo',
          postId: photo.id,
          reason: 'spam',
        })
      ).status,
    ).toBe(403);
    expect(
      (await call(flagPOST, 'POST', '/api/flags', flagger, { postType: 'photo', postId: photo.id, reason: 'rude' }))
        .status,
    ).toBe(201);
    const queue = await call(reviewGET, 'GET', '/api/review', 'moss_moderator');
    const item = queue.body.items.find(
      (i: { post: { type: string; id: number } }) => i.post.type === 'photo' && i.post.id === photo.id,
    );
    expect(item.post.photoId).toBe(photo.publicId);
    const params = { id: photo.publicId };
    expect((await raw(photoGET, 'GET', `/api/photos/${photo.publicId}`, null, undefined, params)).status).toBe(200);
    const before = await trail();
    expect(
      (await act({ action: 'hide', postType: 'photo', postId: photo.id, reason: 'Shows a neighbour’s house.' })).status,
    ).toBe(200);
    await expectOneMoreRow(before, 'hide', 'Shows a neighbour’s house.');
    for (const get of [photoGET, thumbGET]) {
      expect((await raw(get, 'GET', `/api/photos/${photo.publicId}`, null, undefined, params)).status).toBe(404);
      expect((await raw(get, 'GET', `/api/photos/${photo.publicId}`, flagger, undefined, params)).status).toBe(404);
      const mod = await raw(get, 'GET', `/api/photos/${photo.publicId}`, 'moss_moderator', undefined, params);
      expect(mod.status).toBe(200);
      expect(mod.headers.get('cache-control')).toBe('private, no-store');
    }
    const qid = photo.questionId ?? (await initModels().Answer.findByPk(photo.answerId!))!.questionId;
    const thread = (await call(threadGET, 'GET', `/api/questions/${qid}`, null, undefined, { id: String(qid) })).body;
    const shown = [...thread.photos, ...thread.answers.flatMap((a: { photos: unknown[] }) => a.photos)].map(
      (p: { id: string }) => p.id,
    );
    expect(shown).not.toContain(photo.publicId);
  });
});
