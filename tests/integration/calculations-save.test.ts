import { beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { POST as calcPOST } from '@/app/api/calculations/route';
import { POST as askPOST } from '@/app/api/questions/route';
import { calculatorInputNames } from '@/lib/calculators';
import { freshDemoDatabase } from '../support/db';
import { actAs, sessionCookie } from '../support/act-as';

const { call, raw } = actAs('10.13.1');

async function member(handle: string, ageDays: number) {
  const made = new Date(Date.now() - ageDays * 86_400_000);
  await initModels().User.create({
    handle,
    displayName: handle,
    email: `${handle}@calc.example`,
    role: 'member',
    region: null,
    bio: null,
    emailVerifiedAt: made,
    createdAt: made,
  });
}

/** The body exactly as a client wrote it: a JSON text with its own "__proto__" key. */
async function postText(who: string, text: string) {
  const req = new NextRequest('http://localhost/api/calculations', {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-forwarded-for': '10.13.2.1', cookie: await sessionCookie(who) },
    body: text,
  });
  const res = await calcPOST(req);
  return { status: res.status, body: await res.json() };
}

describe('POST /api/calculations keeps only the tool’s fields and has a flood limit (real MariaDB)', () => {
  beforeAll(freshDemoDatabase);

  it('stores none of the keys the calculator does not have, "__proto__" included', async () => {
    const res = await postText(
      'highcrag_shepherd',
      '{"tool":"yield-estimate","inputs":{"fall":"4 ft","lift":"29 ft","driveFlow":"2 gal/min","__proto__":"polluted","colour":"red","results":"99"}}',
    );
    expect(res.status).toBe(201);
    const [row] = await getSequelize().query<{ inputs: string | Record<string, unknown> }>(
      'SELECT inputs FROM worked_calculations WHERE public_id = ?',
      {
        replacements: [res.body.id],
        type: QueryTypes.SELECT,
      },
    );
    const stored = typeof row.inputs === 'string' ? row.inputs : JSON.stringify(row.inputs);
    expect(stored).not.toMatch(/__proto__|colour|results|polluted/);
    const own = new Set(calculatorInputNames('yield-estimate'));
    const keys = Object.keys(JSON.parse(stored));
    expect(keys.length).toBeGreaterThan(0);
    expect(keys.filter((k) => !own.has(k))).toEqual([]);
    expect(JSON.parse(stored)).toMatchObject({ fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' });
  });

  it('an account gets 60 saves an hour, then 429 with Retry-After', async () => {
    await member('calc_flooder', 365);
    const body = { tool: 'yield-estimate', inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' } };
    let accepted = 0;
    // 60 an hour per account: our own allowance (lib/auth/rate-limit.ts), common practice, no source
    for (let i = 0; i < 60; i++)
      if ((await call(calcPOST, 'POST', '/api/calculations', 'calc_flooder', body)).status === 201) accepted++;
    expect(accepted).toBe(60);
    const limited = await raw(calcPOST, 'POST', '/api/calculations', 'calc_flooder', body);
    expect(limited.status).toBe(429);
    expect(Number(limited.headers.get('retry-after'))).toBeGreaterThan(0);
  }, 60_000);

  it('refused saves do not use up the allowance', async () => {
    await member('calc_typo', 365);
    for (let i = 0; i < 60; i++) {
      const bad = await call(calcPOST, 'POST', '/api/calculations', 'calc_typo', {
        tool: 'yield-estimate',
        inputs: { fall: 'four feet', lift: '29 ft', driveFlow: '2 gal/min' },
      });
      expect(bad.status).toBe(422);
    }
    expect(
      (
        await call(calcPOST, 'POST', '/api/calculations', 'calc_typo', {
          tool: 'yield-estimate',
          inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' },
        })
      ).status,
    ).toBe(201);
  }, 60_000);
});

describe('guarded() spends a member’s post allowance only on requests that pass validation and policy (real MariaDB)', () => {
  it('a new member’s refused questions leave the hourly allowance whole', async () => {
    await member('new_asker', 0);
    // a new member gets 6 posts an hour (lib/auth/rate-limit.ts, postNewAccount): common practice, no source
    for (let i = 0; i < 6; i++) {
      const refused = await call(askPOST, 'POST', '/api/questions', 'new_asker', {
        title: 'short',
        body: 'The pump stops after a minute.',
        tags: ['stall'],
      });
      expect(refused.status).toBe(400);
      expect(refused.body.error.field).toBe('title');
    }
    const ok = await call(askPOST, 'POST', '/api/questions', 'new_asker', {
      title: 'Waste valve stops after a minute of beating',
      body: 'On 4 ft of fall the valve beats for a minute and then hangs open. What should I check first?',
      tags: ['stall'],
    });
    expect(ok.status).toBe(201);
  });
});
