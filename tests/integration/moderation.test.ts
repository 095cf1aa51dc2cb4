import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { POST as flagPOST } from '@/app/api/flags/route';
import { GET as reviewGET } from '@/app/api/review/route';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { GET as auditGET } from '@/app/api/admin/audit/route';
import { GET as threadGET } from '@/app/api/questions/[id]/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { GET as listGET } from '@/app/api/questions/route';
import { changeRole } from '@/lib/accounts/roles';
import { hideThreshold } from '@/lib/moderation/flags';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.4.0');
const answerBy = async (handle: string, questionTitle: string) => {
  const { User, Question, Answer } = initModels();
  const u = (await User.findOne({ where: { handle } }))!;
  const q = (await Question.findOne({ where: { title: questionTitle } }))!;
  return { answer: (await Answer.findOne({ where: { authorId: u.id, questionId: q.id } }))!, question: q };
};
const auditCount = async () => initModels().AuditEntry.count();

describe('moderation (real MariaDB)', () => {
  beforeAll(freshDemoDatabase);

  it('one open flag per member per post; never on one’s own post', async () => {
    const { answer } = await answerBy(
      'ironwheel_builds',
      'Creek only runs March to October — how do I drain the pump for winter?',
    );
    const flag = { postType: 'answer', postId: answer.id, reason: 'rude' };
    expect((await call(flagPOST, 'POST', '/api/flags', 'highcrag_shepherd', flag)).status).toBe(201);
    expect((await call(flagPOST, 'POST', '/api/flags', 'highcrag_shepherd', flag)).status).toBe(409);
    expect((await call(flagPOST, 'POST', '/api/flags', 'ironwheel_builds', flag)).status).toBe(403);
    const other = await call(flagPOST, 'POST', '/api/flags', 'sorrel_cabin', { ...flag, reason: 'other' });
    expect(other.status).toBe(400);
    expect(other.body.error.field).toBe('note');
    expect((await call(flagPOST, 'POST', '/api/flags', null, flag)).status).toBe(401);
  });

  it('hides a post at the flag threshold, with an audit row, and lists and threads drop it', async () => {
    const title = 'Overflow from the paddock tank is washing out the track';
    const q = (await initModels().Question.findOne({ where: { title } }))!;
    const before = await auditCount();
    // the threshold is FLAG_HIDE_THRESHOLD, default 3 (lib/moderation/flags.ts)
    expect(hideThreshold()).toBe(3);
    const flaggers = ['ferncombe_tamsin', 'sorrel_cabin', 'quarry_lane_valves'];
    const results = [];
    for (const who of flaggers)
      results.push(
        (await call(flagPOST, 'POST', '/api/flags', who, { postType: 'question', postId: q.id, reason: 'off-topic' }))
          .body.hidden,
      );
    expect(results).toEqual([false, false, true]);
    expect(await auditCount()).toBe(before + 1);
    expect((await call(threadGET, 'GET', `/api/questions/${q.id}`, null, undefined, { id: String(q.id) })).status).toBe(
      404,
    );
    expect(
      (await call(threadGET, 'GET', `/api/questions/${q.id}`, 'moss_moderator', undefined, { id: String(q.id) })).body
        .hiddenAt,
    ).not.toBeNull();
    const list = await call(listGET, 'GET', '/api/questions?perPage=100', null);
    expect(list.body.items.map((i: { title: string }) => i.title)).not.toContain(title);
  });

  it('an expert’s unsafe flag hides at once; a member’s shows readers a caution', async () => {
    const { answer: a1, question: q1 } = await answerBy(
      'quarry_lane_valves',
      'Is brook water from the ram safe for the house?',
    );
    await call(flagPOST, 'POST', '/api/flags', 'ferncombe_tamsin', {
      postType: 'answer',
      postId: a1.id,
      reason: 'unsafe',
      note: 'says the water is fine untreated',
    });
    const seen = await call(threadGET, 'GET', `/api/questions/${q1.id}`, null, undefined, { id: String(q1.id) });
    expect(seen.body.answers.find((a: { id: number }) => a.id === a1.id).cautionUnsafe).toBe(true);
    const { answer: a2, question: q2 } = await answerBy(
      'quarry_lane_valves',
      'What weight on the waste valve for 4 ft of fall?',
    );
    const byExpert = await call(flagPOST, 'POST', '/api/flags', 'ironwheel_builds', {
      postType: 'answer',
      postId: a2.id,
      reason: 'unsafe',
    });
    expect(byExpert.body.hidden).toBe(true);
    const gone = await call(threadGET, 'GET', `/api/questions/${q2.id}`, null, undefined, { id: String(q2.id) });
    expect(gone.body.answers.map((a: { id: number }) => a.id)).not.toContain(a2.id);
  });

  it('the review queue shows the flags in context; actions need a reason and write their audit row and notice', async () => {
    expect((await call(reviewGET, 'GET', '/api/review', 'highcrag_shepherd')).status).toBe(403);
    const queue = await call(reviewGET, 'GET', '/api/review?reason=unsafe', 'moss_moderator');
    expect(queue.status).toBe(200);
    const item = queue.body.items.find(
      (i: { post: { questionTitle: string } }) =>
        i.post.questionTitle === 'Is brook water from the ram safe for the house?',
    );
    expect(item.flags[0]).toMatchObject({ reason: 'unsafe', note: 'says the water is fine untreated' });
    const noReason = await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
      action: 'hide',
      postType: 'answer',
      postId: item.post.id,
      reason: '',
    });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.field).toBe('reason');
    const before = await auditCount();
    const hid = await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
      action: 'hide',
      postType: 'answer',
      postId: item.post.id,
      reason: 'Untreated surface water must be tested and treated.',
    });
    expect(hid.status).toBe(200);
    expect(await auditCount()).toBe(before + 1);
    const { Notice, Flag } = initModels();
    const notice = await Notice.findOne({
      where: { userId: item.post.author.id, kind: 'moderation' },
      order: [['id', 'DESC']],
    });
    expect(notice?.message).toMatch(/hid your post.*Untreated surface water/);
    expect(await Flag.count({ where: { postType: 'answer', postId: item.post.id, status: 'open' } })).toBe(0);
  });

  it('moderators cannot act on their own posts, and a suspended member cannot post', async () => {
    const { answer, question } = await answerBy('moss_moderator', 'Do I need a permit to take water from the beck?');
    const own = await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
      action: 'hide',
      postType: 'answer',
      postId: answer.id,
      reason: 'testing',
    });
    expect(own.status).toBe(403);
    const { answer: tamsins } = await answerBy(
      'ferncombe_tamsin',
      'Two small pumps side by side or one bigger one for the far paddock?',
    );
    const sus = await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
      action: 'suspend',
      postType: 'answer',
      postId: tamsins.id,
      reason: 'repeated rude replies',
      until: '2099-01-31',
    });
    expect(sus.status).toBe(200);
    const refused = await call(
      answerPOST,
      'POST',
      `/api/questions/${question.id}/answers`,
      'ferncombe_tamsin',
      { body: 'Trying to answer while suspended here.' },
      { id: String(question.id) },
    );
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/suspended until 31 Jan 2099/);
  });

  it('a locked thread takes no new answers', async () => {
    const q = (await initModels().Question.findOne({
      where: { title: 'How do I measure the fall without a surveyor’s level?' },
    }))!;
    expect(
      (
        await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
          action: 'lock',
          postType: 'question',
          postId: q.id,
          reason: 'answered fully',
        })
      ).status,
    ).toBe(200);
    const res = await call(
      answerPOST,
      'POST',
      `/api/questions/${q.id}/answers`,
      'sorrel_cabin',
      { body: 'One more idea for measuring the fall.' },
      { id: String(q.id) },
    );
    expect(res.status).toBe(409);
  });

  it('role changes are audited, admins read the log, and nobody can edit an entry', async () => {
    const { User } = initModels();
    const admin = (await User.findOne({ where: { handle: 'clack_admin' } }))!;
    const cabin = (await User.findOne({ where: { handle: 'sorrel_cabin' } }))!;
    await changeRole(admin.id, cabin.id, 'expert');
    const log = await call(auditGET, 'GET', '/api/admin/audit?action=role-change', 'clack_admin');
    expect(log.body.items[0]).toMatchObject({
      action: 'role-change',
      targetId: String(cabin.id),
      actor: { handle: 'clack_admin' },
    });
    expect((await call(auditGET, 'GET', '/api/admin/audit', 'moss_moderator')).status).toBe(403);
    await expect(
      getSequelize().query('UPDATE audit_log SET reason = ? WHERE id = ?', {
        replacements: ['rewritten', log.body.items[0].id],
        type: QueryTypes.UPDATE,
      }),
    ).rejects.toThrow(/cannot be changed/);
    await expect(getSequelize().query('DELETE FROM audit_log', { type: QueryTypes.DELETE })).rejects.toThrow(
      /cannot be changed/,
    );
  });
});
