import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { POST as signUpPOST } from '@/app/api/account/sign-up/route';
import { POST as verifyPOST } from '@/app/api/account/verify-email/route';
import { POST as resetPOST } from '@/app/api/account/password-reset/route';
import { POST as resetConfirmPOST } from '@/app/api/account/password-reset/confirm/route';
import { POST as authPOST } from '@/app/api/auth/[...nextauth]/route';
import { authOptions, SIGN_IN_ERRORS } from '@/lib/auth/options';
import { issueToken } from '@/lib/auth/tokens';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { DEMO_PASSWORD } from '@/migrations/seed/demo-data';
import { SmtpCatcher, linkIn } from '../support/smtp-catcher';
import { freshDemoDatabase } from '../support/db';

const catcher = new SmtpCatcher(Number(process.env.SMTP_PORT));
let ip = 0;
/** Each call from its own address, so per-address limits do not leak between tests. */
const post = (handler: (r: Request) => Promise<Response>, url: string, body: unknown, from = `10.9.0.${++ip}`) =>
  handler(
    new NextRequest(`http://localhost${url}`, {
      method: 'POST',
      body: JSON.stringify(body),
      headers: { 'content-type': 'application/json', 'x-forwarded-for': from },
    }),
  );

type Authorize = (c: Record<string, string>, req: { headers: Record<string, string> }) => Promise<unknown>;
const provider = (id: string) => {
  // next-auth applies a provider's own options (its id among them) when it runs; the raw entry keeps them under `options`
  const p = authOptions.providers.find(
    (x) => (x as unknown as { options?: { id?: string } }).options?.id === id,
  ) as unknown as { options: { authorize: Authorize } };
  return (c: Record<string, string>, from = `10.8.0.${++ip}`) =>
    p.options.authorize(c, { headers: { 'x-forwarded-for': from } });
};
const passwordSignIn = provider('password');

beforeAll(async () => {
  await freshDemoDatabase();
  await catcher.start();
});
afterAll(() => catcher.stop());

describe('sign-up and e-mail verification', () => {
  const member = {
    email: 'wren@linnetmill.example',
    password: 'kettle moss heron ladder',
    handle: 'linnet_mill_wren',
    displayName: 'Wren at Linnet Mill',
  };

  it('creates an unverified member, mails a link that confirms the address once', async () => {
    const res = await post(signUpPOST, '/api/account/sign-up', member);
    expect(res.status).toBe(202);
    await expect(passwordSignIn({ email: member.email, password: member.password })).rejects.toThrow(
      SIGN_IN_ERRORS.unverified,
    );

    const mail = await catcher.waitFor(member.email, /Confirm your e-mail/);
    const { token } = linkIn(mail, '/verify-email?token=');
    expect((await post(verifyPOST, '/api/account/verify-email', { token })).status).toBe(200);
    const again = await post(verifyPOST, '/api/account/verify-email', { token });
    expect(again.status).toBe(410);
    expect((await again.json()).error.message).toMatch(/already been used/);

    const user = (await passwordSignIn({ email: member.email, password: member.password })) as {
      handle: string;
      role: string;
    };
    expect(user).toMatchObject({ handle: member.handle, role: 'member' });
  });

  it('answers the same for an address that already has an account', async () => {
    const fresh = await post(signUpPOST, '/api/account/sign-up', {
      ...member,
      email: 'new-reader@sorrelcreek.example',
      handle: 'new_reader_1',
    });
    const taken = await post(signUpPOST, '/api/account/sign-up', { ...member, handle: 'someone_else_2' });
    expect(taken.status).toBe(fresh.status);
    expect(await taken.json()).toEqual(await fresh.json());
  });

  it('refuses weak passwords, malformed e-mail and a taken handle, naming the field', async () => {
    const weak = await post(signUpPOST, '/api/account/sign-up', {
      ...member,
      email: 'a@b.example',
      handle: 'weak_one',
      password: 'password123',
    });
    expect(weak.status).toBe(422);
    expect((await weak.json()).error).toMatchObject({ field: 'password' });
    const short = await post(signUpPOST, '/api/account/sign-up', {
      ...member,
      email: 'c@d.example',
      handle: 'short_one',
      password: 'brook',
    });
    expect((await short.json()).error.message).toMatch(/at least 10 characters/);
    const bad = await post(signUpPOST, '/api/account/sign-up', { ...member, email: 'not an email' });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.field).toBe('email');
    const handle = await post(signUpPOST, '/api/account/sign-up', {
      ...member,
      email: 'e@f.example',
      handle: 'ferncombe_tamsin',
    });
    expect(handle.status).toBe(409);
    expect((await handle.json()).error.field).toBe('handle');
  });
});

describe('password sign-in', () => {
  it('refuses a wrong password, then limits an account after five tries in 15 minutes', async () => {
    const email = 'shepherd@highcrag.example';
    expect(await passwordSignIn({ email, password: DEMO_PASSWORD })).toMatchObject({ handle: 'highcrag_shepherd' });
    for (let i = 0; i < 5; i++) {
      await expect(passwordSignIn({ email, password: 'not-the-password' })).rejects.toThrow(SIGN_IN_ERRORS.wrong);
    }
    // The sixth try, even with the right password and from another address, waits.
    await expect(passwordSignIn({ email, password: DEMO_PASSWORD })).rejects.toThrow(/Too many attempts/);
  });

  it('gives the same message for an unknown address as for a wrong password', async () => {
    await expect(passwordSignIn({ email: 'nobody@nowhere.example', password: 'whatever-it-is' })).rejects.toThrow(
      SIGN_IN_ERRORS.wrong,
    );
  });
});

describe('password reset', () => {
  it('mails a single-use link; the same answer for unknown addresses', async () => {
    const email = 'cabin@sorrelcreek.example';
    const known = await post(resetPOST, '/api/account/password-reset', { email });
    const unknown = await post(resetPOST, '/api/account/password-reset', { email: 'ghost@sorrelcreek.example' });
    expect(await known.json()).toEqual(await unknown.json());
    const { token } = linkIn(
      await catcher.waitFor(email, /Reset your Clackwater password/),
      '/reset-password/new?token=',
    );
    const newPassword = 'alder sluice gravel lantern';
    expect(
      (await post(resetConfirmPOST, '/api/account/password-reset/confirm', { token, password: newPassword })).status,
    ).toBe(200);
    const reused = await post(resetConfirmPOST, '/api/account/password-reset/confirm', {
      token,
      password: 'another one entirely new',
    });
    expect(reused.status).toBe(410);
    expect(await passwordSignIn({ email, password: newPassword })).toMatchObject({ handle: 'sorrel_cabin' });
  });

  it('refuses an expired token', async () => {
    const { User } = initModels();
    const user = (await User.findOne({ where: { handle: 'ferncombe_tamsin' } }))!;
    // issued two hours ago; reset tokens last one hour
    const token = await getSequelize().transaction((t) =>
      issueToken(user.id, 'reset-password', t, new Date(Date.now() - 2 * 3_600_000)),
    );
    const res = await post(resetConfirmPOST, '/api/account/password-reset/confirm', {
      token,
      password: 'alder sluice gravel lantern',
    });
    expect(res.status).toBe(410);
    expect((await res.json()).error.message).toMatch(/expired/);
  });
});

type EmailProviderOptions = { sendVerificationRequest: (p: { identifier: string; url: string }) => Promise<void> };
const emailProvider = () =>
  (authOptions.providers.find((x) => x.id === 'email') as unknown as { options: EmailProviderOptions }).options;

describe('sign-in link (next-auth e-mail provider, tokens kept by the Sequelize adapter)', () => {
  // The whole click-through runs in the browser tests (tests/e2e/account.spec.ts);
  // next-auth's handler needs a real request scope, so here its parts are checked.
  it('mails the link only to an address with an account', async () => {
    const before = catcher.messages.length;
    const url = 'http://127.0.0.1:3100/api/auth/callback/email?token=abc&email=x';
    await emailProvider().sendVerificationRequest({ identifier: 'stranger@ironwheel.example', url });
    await emailProvider().sendVerificationRequest({ identifier: 'builds@ironwheel.example', url });
    const mail = await catcher.waitFor('builds@ironwheel.example', /sign-in link/);
    expect(mail.text).toContain(url);
    expect(catcher.messages.slice(before).filter((m) => m.to.includes('stranger@ironwheel.example'))).toEqual([]);
  });

  it('keeps each link token in verification_tokens and lets it be used once', async () => {
    const adapter = authOptions.adapter!;
    const expires = new Date(Date.now() + 15 * 60_000);
    await adapter.createVerificationToken!({
      identifier: 'builds@ironwheel.example',
      token: 'hashed-token-1',
      expires,
    });
    const rows = await getSequelize().query('SELECT identifier FROM verification_tokens', { type: 'SELECT' as never });
    expect(rows).toEqual([{ identifier: 'builds@ironwheel.example' }]);
    expect(
      await adapter.useVerificationToken!({ identifier: 'builds@ironwheel.example', token: 'hashed-token-1' }),
    ).toMatchObject({ identifier: 'builds@ironwheel.example' });
    expect(
      await adapter.useVerificationToken!({ identifier: 'builds@ironwheel.example', token: 'hashed-token-1' }),
    ).toBeNull();
    // a link never creates an account: sign-up does
    await expect(adapter.createUser!({ email: 'x@y.example', emailVerified: null } as never)).rejects.toThrow(
      /Sign up first/,
    );
    expect(await adapter.getUserByEmail!('builds@ironwheel.example')).toMatchObject({ name: 'Ironwheel Builds' });
  });

  it('limits link requests per account before next-auth sees them', async () => {
    const email = 'valves@quarrylane.example';
    const seen: boolean[] = [];
    for (let i = 0; i < 4; i++) {
      const r = await authPOST(
        new NextRequest('http://127.0.0.1:3100/api/auth/signin/email', {
          method: 'POST',
          headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-forwarded-for': `10.5.0.${i}` },
          body: new URLSearchParams({ email }).toString(),
        }) as never,
        { params: Promise.resolve({ nextauth: ['signin', 'email'] }) },
      ).then(
        (res) => res.status === 429,
        () => false, // not limited: next-auth itself ran (and needs a real request scope)
      );
      seen.push(r);
    }
    // three an hour per account (lib/auth/rate-limit.ts); the fourth is refused
    expect(seen).toEqual([false, false, false, true]);
  });
});
