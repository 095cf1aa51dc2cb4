import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { listQuestions } from '@/lib/questions/list';
import { initModels } from '@/models';
import { POST as askPOST } from '@/app/api/questions/route';
import { PUT as questionPUT } from '@/app/api/questions/[id]/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

/**
 * The lists' counts are kept in question_list_counts by the database, in each write's
 * transaction (migration 017). After every kind of write they must equal a count made
 * from scratch: asking, answering, retagging (by the asker and by a moderator), hiding,
 * restoring and deleting a question or an answer, and a write that fails half-way.
 */
const { call } = actAs('10.23.0');
const act = (body: Record<string, unknown>) => call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', body);

async function fromScratch() {
  const q = <T extends object>(sql: string) => getSequelize().query<T>(sql, { type: QueryTypes.SELECT });
  const visible = 'q.hidden_at IS NULL AND q.deleted_at IS NULL';
  const rows = [
    ...(await q<{ list: string; n: number }>(`SELECT 'all' AS list, COUNT(*) AS n FROM questions q WHERE ${visible}`)),
    ...(await q<{ list: string; n: number }>(
      `SELECT 'unanswered' AS list, COUNT(*) AS n FROM questions q WHERE ${visible} AND q.answer_count = 0`,
    )),
    ...(await q<{ list: string; n: number }>(
      `SELECT CONCAT('tag:', t.id) AS list, COUNT(q.id) AS n FROM tags t
         LEFT JOIN question_tags qt ON qt.tag_id = t.id LEFT JOIN questions q ON q.id = qt.question_id AND ${visible}
        GROUP BY t.id`,
    )),
  ];
  return Object.fromEntries(rows.map((r) => [r.list, Number(r.n)]));
}

async function kept() {
  const rows = await getSequelize().query<{ list: string; questions: number }>(
    'SELECT list, questions FROM question_list_counts',
    { type: QueryTypes.SELECT },
  );
  const all = Object.fromEntries(rows.map((r) => [r.list, Number(r.questions)]));
  // a tag nobody has used yet has no row: it counts as 0
  return Object.fromEntries(Object.keys(await fromScratch()).map((k) => [k, all[k] ?? 0]));
}

async function expectCountsRight() {
  expect(await kept()).toEqual(await fromScratch());
}

const ask = {
  title: 'Pump stalls each evening when the spring drops',
  body: 'Three-quarter pump on 5 ft of fall; it runs all day and stops shut around dusk.',
  tags: ['stall', 'frost'],
};

describe('the question lists’ counts stay right through every write (real MariaDB)', () => {
  let qid: number;
  beforeAll(freshDemoDatabase);

  it('start right after the demo seed', expectCountsRight);

  it('a new question counts in all, waiting and each of its tags', async () => {
    const before = await kept();
    const res = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', ask);
    expect(res.status).toBe(201);
    qid = res.body.id;
    const after = await kept();
    expect(after.all).toBe(before.all + 1);
    expect(after.unanswered).toBe(before.unanswered + 1);
    const frost = (await initModels().Tag.findOne({ where: { slug: 'frost' } }))!.id;
    expect(after[`tag:${frost}`]).toBe(before[`tag:${frost}`] + 1);
    await expectCountsRight();
    expect((await listQuestions({ page: 1, perPage: 5 })).total).toBe(after.all);
  });

  it('its first answer takes it off the waiting list', async () => {
    const before = await kept();
    const res = await call(
      answerPOST,
      'POST',
      `/api/questions/${qid}/answers`,
      'quarry_lane_valves',
      {
        body: 'Check the intake: a falling spring pulls air at the screen long before it runs dry.',
      },
      { id: String(qid) },
    );
    expect(res.status).toBe(201);
    expect((await kept()).unanswered).toBe(before.unanswered - 1);
    await expectCountsRight();
  });

  it('retagging by the asker and by a moderator moves it between tags', async () => {
    const res = await call(
      questionPUT,
      'PUT',
      `/api/questions/${qid}`,
      'ferncombe_tamsin',
      { ...ask, tags: ['drive-pipe'] },
      {
        id: String(qid),
      },
    );
    expect(res.status).toBe(200);
    await expectCountsRight();
    expect(
      (
        await act({
          action: 'retag',
          postType: 'question',
          postId: qid,
          reason: 'Frost too.',
          tags: ['frost', 'stall'],
        })
      ).status,
    ).toBe(200);
    await expectCountsRight();
  });

  it('hiding, restoring and deleting the question, and deleting its answer', async () => {
    expect(
      (await act({ action: 'hide', postType: 'question', postId: qid, reason: 'Checking the photos.' })).status,
    ).toBe(200);
    await expectCountsRight();
    const tagged = await listQuestions({ page: 1, perPage: 100 }, { kind: 'tag', tag: 'frost' });
    expect(tagged.items.map((i) => i.id)).not.toContain(qid);
    expect(tagged.total).toBe(
      (await kept())[`tag:${(await initModels().Tag.findOne({ where: { slug: 'frost' } }))!.id}`],
    );
    expect(
      (await act({ action: 'restore', postType: 'question', postId: qid, reason: 'Photos are fine.' })).status,
    ).toBe(200);
    await expectCountsRight();
    expect(
      (await listQuestions({ page: 1, perPage: 100 }, { kind: 'tag', tag: 'frost' })).items.map((i) => i.id),
    ).toContain(qid);
    const answer = (await initModels().Answer.findOne({ where: { questionId: qid } }))!;
    expect((await act({ action: 'delete', postType: 'answer', postId: answer.id, reason: 'Advert.' })).status).toBe(
      200,
    );
    await expectCountsRight();
    expect((await act({ action: 'delete', postType: 'question', postId: qid, reason: 'Duplicate.' })).status).toBe(200);
    await expectCountsRight();
  });

  it('a write that fails half-way leaves the counts as they were', async () => {
    const before = await kept();
    await expect(
      getSequelize().transaction(async (transaction) => {
        const { Question } = initModels();
        const author = (await initModels().User.findOne({ where: { handle: 'ferncombe_tamsin' } }))!;
        await Question.create({ authorId: author.id, title: 'Half-saved', body: 'Never committed.' }, { transaction });
        throw new Error('the rest of the write failed');
      }),
    ).rejects.toThrow('the rest of the write failed');
    expect(await kept()).toEqual(before);
  });

  it('a question removed outright takes its counts with it', async () => {
    const res = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
      ...ask,
      title: 'Removed outright',
    });
    await initModels().Question.destroy({ where: { id: res.body.id } });
    await expectCountsRight();
  });
});
