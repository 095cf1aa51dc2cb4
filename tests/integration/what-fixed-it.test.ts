import { beforeAll, afterEach, describe, expect, it, vi } from 'vitest';
import { QueryTypes } from 'sequelize';
import { POST as askPOST } from '@/app/api/questions/route';
import { GET as threadGET } from '@/app/api/questions/[id]/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { PUT as fixedPUT } from '@/app/api/questions/[id]/fixed/route';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { listQuestions } from '@/lib/questions/list';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

/**
 * Issue 20: the asker's one line saying what fixed it is saved with the choice of the
 * answer, in one transaction, through the route's zod schema and the policy table.
 */
const { call } = actAs('10.71');
const { Question, MailMessage } = initModels();
const ASKER = 'ferncombe_tamsin';
const LINE = 'Lowered the intake box below the dry-week water level';

const put = (qid: number, who: string | null, body: unknown) =>
  call(fixedPUT, 'PUT', `/api/questions/${qid}/fixed`, who, body, { id: String(qid) });
const stored = async (qid: number) => {
  const q = (await Question.findByPk(qid))!;
  return { fixedAnswerId: q.fixedAnswerId, whatFixedIt: q.whatFixedIt };
};

describe('what fixed it: the asker’s one line, saved with the mark (real MariaDB)', () => {
  let qid: number;
  let aid: number;
  let other: number;
  beforeAll(async () => {
    await freshDemoDatabase();
    const q = await call(askPOST, 'POST', '/api/questions', ASKER, {
      title: 'Pump stalls every evening when the pool drops',
      body: 'The one-inch ram beats all day and stops around dusk, when the pool is at its lowest.',
      tags: ['stall'],
    });
    expect(q.status).toBe(201);
    qid = q.body.id;
    const answer = (who: string, body: string) =>
      call(answerPOST, 'POST', `/api/questions/${qid}/answers`, who, { body }, { id: String(qid) });
    aid = (
      await answer('quarry_lane_valves', 'A vortex at the intake pulls air in when the pool drops; set it deeper.')
    ).body.id;
    other = (await answer('ironwheel_builds', 'Check the waste valve spring: it may weaken as the water cools.')).body
      .id;
  });

  afterEach(async () => {
    await getSequelize().query('DROP TRIGGER IF EXISTS test_refuse_outbox', { type: QueryTypes.UPDATE });
  });

  it('refuses a choice without the line: 400 naming whatFixedIt, nothing saved', async () => {
    for (const body of [
      { answerId: aid },
      { answerId: aid, whatFixedIt: '' },
      { answerId: aid, whatFixedIt: '   fixed   ' },
      { answerId: aid, whatFixedIt: 'x'.repeat(141) },
      { answerId: aid, whatFixedIt: 'Lowered the intake\nand it ran' },
      { answerId: aid, whatFixedIt: 42 },
    ]) {
      const res = await put(qid, ASKER, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.field).toBe('whatFixedIt');
      expect(res.body.error.message).toMatch(/whatFixedIt/);
    }
    expect(await stored(qid)).toEqual({ fixedAnswerId: null, whatFixedIt: null });
  });

  it('saves the line with the mark, trimmed, and the thread carries it', async () => {
    const res = await put(qid, ASKER, { answerId: aid, whatFixedIt: `  ${LINE}  ` });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ fixedAnswerId: aid, whatFixedIt: LINE });
    expect(await stored(qid)).toEqual({ fixedAnswerId: aid, whatFixedIt: LINE });
    const t = await call(threadGET, 'GET', `/api/questions/${qid}`, null, undefined, { id: String(qid) });
    expect(t.body.whatFixedIt).toBe(LINE);
    expect(t.body.answers[0]).toMatchObject({ id: aid, fixed: true });
    // the list reads it too: the question's state is "fixed", with the line and the answer to link to
    const item = (await listQuestions({ page: 1, perPage: 5 })).items.find((i) => i.id === qid)!;
    expect(item.state).toEqual({ kind: 'fixed', line: LINE, answerId: aid });
    // and the answer's author hears what fixed it
    const mail = await MailMessage.findOne({ where: { kind: 'fixed' }, order: [['id', 'DESC']] });
    expect(mail!.textBody).toContain(LINE);
  });

  it('only the asker may: others get 403 (401 signed out) and nothing changes', async () => {
    const change = { answerId: other, whatFixedIt: 'Replaced the waste valve spring with a stiffer one' };
    expect((await put(qid, 'ironwheel_builds', change)).status).toBe(403);
    expect((await put(qid, 'moss_moderator', change)).status).toBe(403);
    expect((await put(qid, null, change)).status).toBe(401);
    expect(await stored(qid)).toEqual({ fixedAnswerId: aid, whatFixedIt: LINE });
  });

  it('a refused change leaves the earlier choice and line whole', async () => {
    // the answer is not on this question: 422 naming answerId, line and mark as before
    const wrong = await put(qid, ASKER, { answerId: 1, whatFixedIt: 'Something else entirely fixed it' });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.field).toBe('answerId');
    // a bad line for another answer: 400, nothing half-saved (not the new answer with the old line)
    expect((await put(qid, ASKER, { answerId: other, whatFixedIt: 'short' })).status).toBe(400);
    expect(await stored(qid)).toEqual({ fixedAnswerId: aid, whatFixedIt: LINE });
  });

  it('rolls the mark and the line back together when the rest of the transaction fails', async () => {
    // the mail to the answer's author is queued in the same transaction: make that insert fail
    await getSequelize().query(
      "CREATE TRIGGER test_refuse_outbox BEFORE INSERT ON mail_outbox FOR EACH ROW SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'refused by the test'",
      { type: QueryTypes.UPDATE },
    );
    const quiet = vi.spyOn(console, 'error').mockImplementation(() => {});
    const res = await put(qid, ASKER, { answerId: other, whatFixedIt: 'Replaced the waste valve spring' });
    quiet.mockRestore();
    expect(res.status).toBe(500);
    expect(await stored(qid)).toEqual({ fixedAnswerId: aid, whatFixedIt: LINE });
  });

  it('taking the choice back clears the line; choosing again needs a new one', async () => {
    expect((await put(qid, ASKER, { answerId: null })).status).toBe(200);
    expect(await stored(qid)).toEqual({ fixedAnswerId: null, whatFixedIt: null });
    const item = (await listQuestions({ page: 1, perPage: 5 })).items.find((i) => i.id === qid)!;
    expect(item.state).toEqual({ kind: 'worked-on' });
    const again = await put(qid, ASKER, { answerId: other, whatFixedIt: 'Replaced the waste valve spring' });
    expect(again.status).toBe(200);
    expect(await stored(qid)).toEqual({ fixedAnswerId: other, whatFixedIt: 'Replaced the waste valve spring' });
  });
});
