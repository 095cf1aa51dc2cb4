import { beforeAll, describe, expect, it } from 'vitest';
import { initModels } from '@/models';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { GET as threadGET } from '@/app/api/questions/[id]/route';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.21.3');

/** A calculation chosen in the answer form goes with the answer, saved in the same transaction. */
describe('POST /api/questions/:id/answers with the calculation shown in the form (real MariaDB)', () => {
  let qid: number;
  const counts = async () => {
    const { Answer, WorkedCalculation } = initModels();
    return { answers: await Answer.count(), calculations: await WorkedCalculation.count() };
  };
  const post = (body: unknown) =>
    call(answerPOST, 'POST', `/api/questions/${qid}/answers`, 'ironwheel_builds', body, { id: String(qid) });

  beforeAll(async () => {
    await freshDemoDatabase();
    const q = await initModels().Question.findOne({ where: { lockedAt: null }, order: [['id', 'ASC']] });
    qid = q!.id;
  });

  it('saves the calculation, recomputed by the server, and links it to the answer', async () => {
    const before = await counts();
    const res = await post({
      body: 'Worked with the numbers from your site sheet; see the calculation below.',
      calculation: {
        tool: 'yield-estimate',
        // a result sent by the browser is never stored: the server computes its own
        inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min', results: 'sent-by-the-browser' },
      },
    });
    expect(res.status).toBe(201);
    expect(await counts()).toEqual({ answers: before.answers + 1, calculations: before.calculations + 1 });
    const t = await call(threadGET, 'GET', `/api/questions/${qid}`, null, undefined, { id: String(qid) });
    const answer = t.body.answers.find((a: { id: number }) => a.id === res.body.id);
    expect(answer.calculation).toMatchObject({
      tool: 'yield-estimate',
      inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' },
    });
    expect(answer.calculation.inputs).not.toHaveProperty('results');
    const saved = await initModels().WorkedCalculation.findOne({ where: { publicId: answer.calculation.id } });
    const author = await initModels().User.findOne({ where: { handle: 'ironwheel_builds' } });
    expect(saved!.authorId).toBe(author!.id);
    // lift over fall, 29 ft / 4 ft: arithmetic on the inputs, no source needed
    expect((saved!.results as { liftRatio: number }).liftRatio).toBeCloseTo(7.25, 6);
    expect(JSON.stringify(saved!.results)).not.toContain('sent-by-the-browser');
  });

  it('refuses inputs the calculator cannot work with, naming the input, and saves nothing', async () => {
    const before = await counts();
    const res = await post({
      body: 'Worked with the numbers from your site sheet; see the calculation below.',
      calculation: { tool: 'yield-estimate', inputs: { fall: 'a lot', lift: '29 ft', driveFlow: '2 gal/min' } },
    });
    expect(res.status).toBe(422);
    expect(res.body.error.field).toBe('calculation.inputs.fall');
    expect(await counts()).toEqual(before);
  });

  it('saves no calculation when the answer itself is refused', async () => {
    const before = await counts();
    const res = await post({
      body: 'Too short.',
      calculation: { tool: 'yield-estimate', inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' } },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('body');
    expect(await counts()).toEqual(before);
  });

  it('takes a saved calculation or a new one, not both', async () => {
    const res = await post({
      body: 'Worked with the numbers from your site sheet; see the calculation below.',
      calculationId: 'FerncombeY1',
      calculation: { tool: 'yield-estimate', inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' } },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('calculation');
  });
});
