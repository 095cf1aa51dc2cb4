/** E-mails carry every number in the recipient's saved units (real MariaDB, the outbox). */
import { beforeAll, describe, expect, it } from 'vitest';
import { POST as askPOST } from '@/app/api/questions/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { runDigests } from '@/lib/mail/digest';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.57');
const { MailMessage, User } = initModels();
const user = async (handle: string) => (await User.findOne({ where: { handle } }))!;

async function askAndAnswer(title: string, answer: string) {
  const q = await call(askPOST, 'POST', '/api/questions', 'ferncombe_tamsin', {
    title,
    body: 'The pump beats but the tank stays low; the measurements are in the title.',
    tags: ['stall'],
  });
  expect(q.status).toBe(201);
  const a = await call(
    answerPOST,
    'POST',
    `/api/questions/${q.body.id}/answers`,
    'quarry_lane_valves',
    { body: answer },
    {
      id: String(q.body.id),
    },
  );
  expect(a.status).toBe(201);
  const tamsin = await user('ferncombe_tamsin');
  const [m] = await MailMessage.findAll({
    where: { userId: tamsin.id, kind: 'answer', dedupeKey: `answer:${a.body.id}:to:${tamsin.id}` },
  });
  return m;
}

describe('notifications and digests in the recipient’s units', () => {
  beforeAll(async () => {
    await freshDemoDatabase();
  });

  it('a metric recipient reads a question asked in feet and an answer in gallons in metres and litres', async () => {
    await User.update({ units: 'metric' }, { where: { handle: 'ferncombe_tamsin' } });
    const m = await askAndAnswer(
      'Units check: ram stalls on 29 ft of lift',
      'Give it 4 gal/min of drive and keep the delivery line under 300 ft.',
    );
    // 29 ft × 0.3048 = 8.839 m; 300 ft = 91.44 m; 4 gal/min × 3.785411784 = 15.14 L/min (NIST SP 811, 2008)
    expect(m.subject).toBe('New answer: Units check: ram stalls on 8.84 m of lift');
    expect(m.textBody).toContain('15.1 L/min of drive');
    expect(m.textBody).toContain('under 91.4 m');
    expect(m.textBody).not.toMatch(/29 ft|4 gal\/min|300 ft/);
    expect(m.htmlBody).toContain('8.84 m of lift');
  });

  it('a US recipient reads metres and litres in feet and gallons', async () => {
    await User.update({ units: 'US' }, { where: { handle: 'ferncombe_tamsin' } });
    const m = await askAndAnswer('Units check: ram stalls on 9 m of lift', 'It needs about 20 L/min of drive.');
    // 9 m ÷ 0.3048 = 29.53 ft; 20 L/min ÷ 3.785411784 = 5.283 US gal/min (NIST SP 811, 2008)
    expect(m.subject).toBe('New answer: Units check: ram stalls on 29.5 ft of lift');
    expect(m.textBody).toContain('about 5.28 US gal/min of drive');
  });

  it('a digest lists a question’s title in the member’s units', async () => {
    // highcrag_shepherd takes the weekly digest and follows stall in the demo seed
    await User.update({ units: 'metric' }, { where: { handle: 'highcrag_shepherd' } });
    const q = await call(askPOST, 'POST', '/api/questions', 'sorrel_cabin', {
      title: 'Digest units check: 2 gal/min of drive at 12 ft of fall',
      body: 'Is this enough drive for a one-inch pump?',
      tags: ['stall'],
    });
    expect(q.status).toBe(201);
    await runDigests('weekly');
    const shepherd = await user('highcrag_shepherd');
    const [d] = await MailMessage.findAll({ where: { userId: shepherd.id, kind: 'digest-weekly' } });
    // 2 gal/min × 3.785411784 = 7.571 L/min; 12 ft × 0.3048 = 3.658 m (NIST SP 811, 2008)
    expect(d.textBody).toContain('Digest units check: 7.57 L/min of drive at 3.66 m of fall');
  });
});
