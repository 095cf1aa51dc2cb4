import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { POST as signUpPOST } from '@/app/api/account/sign-up/route';
import { POST as verifyPOST } from '@/app/api/account/verify-email/route';
import { POST as resendPOST } from '@/app/api/account/verify-email/resend/route';
import { SmtpCatcher, linkIn } from '../support/smtp-catcher';
import { freshDemoDatabase } from '../support/db';

const catcher = new SmtpCatcher(Number(process.env.SMTP_PORT));
let ip = 0;
/** Each call from its own address, so per-address limits do not leak between tests. */
const post = (handler: (r: Request) => Promise<Response>, url: string, body: unknown, from = `10.7.0.${++ip}`) =>
  handler(
    new NextRequest(`http://localhost${url}`, {
      method: 'POST',
      body: JSON.stringify(body),
      headers: { 'content-type': 'application/json', 'x-forwarded-for': from },
    }),
  );
const resend = (email: string, from?: string) => post(resendPOST, '/api/account/verify-email/resend', { email }, from);

beforeAll(async () => {
  await freshDemoDatabase();
  await catcher.start();
});
afterAll(() => catcher.stop());

describe('"confirm your e-mail first": a new confirmation link on request', () => {
  const member = {
    email: 'heron@otterbrook.example',
    password: 'gravel sluice kettle alder',
    handle: 'otterbrook_heron',
    displayName: 'Heron at Otterbrook',
  };

  it('mails an unconfirmed account a new link that confirms it', async () => {
    expect((await post(signUpPOST, '/api/account/sign-up', member)).status).toBe(202);
    await catcher.waitFor(member.email, /Confirm your e-mail/);
    expect(catcher.countTo(member.email)).toBe(1);

    const res = await resend(member.email);
    expect(res.status).toBe(202);
    // the mail goes out after the answer
    for (let i = 0; i < 50 && catcher.countTo(member.email) < 2; i++) await new Promise((r) => setTimeout(r, 100));
    expect(catcher.countTo(member.email)).toBe(2);
    const second = await catcher.waitFor(member.email, /Confirm your e-mail/);
    const { token } = linkIn(second, '/verify-email?token=');
    expect((await post(verifyPOST, '/api/account/verify-email', { token })).status).toBe(200);
  });

  it('answers the same for an unknown address, a confirmed account and a waiting one', async () => {
    const other = { ...member, email: 'waiting@otterbrook.example', handle: 'otterbrook_waiting' };
    expect((await post(signUpPOST, '/api/account/sign-up', other)).status).toBe(202);
    const waiting = await resend(other.email);
    const unknown = await resend('nobody@otterbrook.example');
    const confirmed = await resend('cabin@sorrelcreek.example');
    const bodies = [await waiting.json(), await unknown.json(), await confirmed.json()];
    expect([waiting.status, unknown.status, confirmed.status]).toEqual([202, 202, 202]);
    expect(bodies[1]).toEqual(bodies[0]);
    expect(bodies[2]).toEqual(bodies[0]);
  });

  it('names the field when the address is not one', async () => {
    const res = await resend('not an address');
    expect(res.status).toBe(400);
    expect((await res.json()).error.field).toBe('email');
  });

  it('limits requests per account', async () => {
    const email = 'limit-me@otterbrook.example';
    // 3 an hour per account: lib/auth/rate-limit.ts (product choice, common practice, no source)
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await resend(email)).status);
    expect(statuses).toEqual([202, 202, 202, 429]);
  });
});
