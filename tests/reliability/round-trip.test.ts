import { beforeAll, describe, expect, it } from 'vitest';
import { POST as askPOST } from '@/app/api/questions/route';
import { GET as threadGET } from '@/app/api/questions/[id]/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import { PUT as settingsPUT, GET as settingsGET } from '@/app/api/account/settings/route';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.9.5');

/** Strings that break careless SQL building, escaping or encoding (common practice, no source). */
const NASTY = [
  "Robert'); DROP TABLE questions;-- and 1=1",
  '" OR ""="" -- \\ \\\' %_ ` $1 ?',
  "UNION SELECT password_hash FROM users WHERE '1'='1",
  '½" pump — 1¼″ drive, 30 m·s⁻¹, ≥ 3×fall, ±5 %, °C',
  'Ünïcödé: 水撃ポンプ, гидротаран, مضخة, पंप, 🐑💧🚰, e\u0301 vs é',
  'zero\u200bwidth \u202eright-to-left\u202c and \u00a0non-breaking',
  '𝔉𝔞𝔩𝔩 𝟒 𝐟𝐭 — four-byte characters outside the BMP 𠜎',
];

describe('SQL-like and Unicode-heavy text round-trips verbatim (real MariaDB)', () => {
  beforeAll(freshDemoDatabase);

  it('in a question’s title and body and an answer', async () => {
    for (const [i, s] of NASTY.entries()) {
      const title = `Round trip ${i}: ${s}`.slice(0, 160);
      const body = `${s}\n\n${s}`;
      const asked = await call(askPOST, 'POST', '/api/questions', 'sorrel_cabin', { title, body, tags: ['survey'] });
      expect(asked.status, s).toBe(201);
      const id = String(asked.body.id);
      expect(
        (
          await call(
            answerPOST,
            'POST',
            `/api/questions/${id}/answers`,
            'ironwheel_builds',
            { body: `Answer: ${s}` },
            { id },
          )
        ).status,
      ).toBe(201);
      const thread = await call(threadGET, 'GET', `/api/questions/${id}`, null, undefined, { id });
      expect(thread.body.title, s).toBe(title.trim());
      expect(thread.body.body, s).toBe(body.trim());
      expect(thread.body.answers[0].body, s).toBe(`Answer: ${s}`.trim());
    }
  });

  it('in a member’s profile', async () => {
    const s = NASTY[4].slice(0, 70);
    const put = await call(settingsPUT, 'PUT', '/api/account/settings', 'sorrel_cabin', {
      displayName: s,
      region: NASTY[0].slice(0, 80),
      bio: NASTY.join('\n'),
      units: 'metric',
    });
    expect(put.status).toBe(200);
    const got = await call(settingsGET, 'GET', '/api/account/settings', 'sorrel_cabin');
    expect(got.body).toMatchObject({
      displayName: s.trim(),
      region: NASTY[0].slice(0, 80).trim(),
      bio: NASTY.join('\n').trim(),
      units: 'metric',
    });
  });
});
