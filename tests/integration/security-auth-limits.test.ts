import type { AddressInfo } from 'node:net';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { POST as signUpPOST } from '@/app/api/account/sign-up/route';
import { POST as resetPOST } from '@/app/api/account/password-reset/route';
import { POST as authPOST } from '@/app/api/auth/[...nextauth]/route';
import { authOptions, SIGN_IN_ERRORS } from '@/lib/auth/options';
import { clientIp } from '@/lib/auth/rate-limit';
import { backgroundSettled } from '@/lib/accounts/background';
import { initModels } from '@/models';
import { DEMO_PASSWORD } from '@/migrations/seed/demo-data';
// the production server's own code (plain JavaScript, run by node)
import { peerAwareServer } from '@/scripts/server.mjs';
import { SmtpCatcher } from '../support/smtp-catcher';
import { freshDemoDatabase } from '../support/db';

/**
 * Issue 17, item 2: the per-address limits keyed on the first X-Forwarded-For entry,
 * which the client writes; the per-account limits keyed on the address as typed,
 * while the users table's collation takes several spellings for one account.
 */
const catcher = new SmtpCatcher(Number(process.env.SMTP_PORT));
beforeAll(async () => {
  await freshDemoDatabase();
  await catcher.start();
});
afterAll(() => catcher.stop());
afterEach(() => {
  delete process.env.TRUST_PROXY_HOPS;
});

type Authorize = (c: Record<string, string>, req: { headers: Record<string, string> }) => Promise<unknown>;
const authorize = (
  authOptions.providers.find(
    (x) => (x as unknown as { options?: { id?: string } }).options?.id === 'password',
  ) as unknown as { options: { authorize: Authorize } }
).options.authorize;

/** What the app's server hands a route handler when a client wrote `spoofed` itself: the real peer is appended last. */
const forwarded = (spoofed: string, peer: string) => ({ 'x-forwarded-for': `${spoofed}, ${peer}` });

describe('per-address limits follow the connecting address, not what the client writes', () => {
  it("the server appends the socket's peer to X-Forwarded-For, so a rotated header keys nothing", async () => {
    const server = peerAwareServer(
      (req: import('node:http').IncomingMessage, res: import('node:http').ServerResponse) => {
        res.end(
          JSON.stringify({
            key: clientIp(req.headers as Record<string, string>),
            header: req.headers['x-forwarded-for'],
          }),
        );
      },
    );
    await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
    try {
      const { port } = server.address() as AddressInfo;
      const seen = new Set<string>();
      for (let i = 0; i < 5; i++) {
        const res = await fetch(`http://127.0.0.1:${port}/`, { headers: { 'x-forwarded-for': `198.51.100.${i}` } });
        const body = (await res.json()) as { key: string; header: string };
        expect(body.header).toBe(`198.51.100.${i}, 127.0.0.1`);
        seen.add(body.key);
      }
      const plain = (await (await fetch(`http://127.0.0.1:${port}/`)).json()) as { key: string };
      seen.add(plain.key);
      expect([...seen]).toEqual(['127.0.0.1']);
    } finally {
      await new Promise((r) => server.close(r));
    }
  });

  it('password sign-in: rotating the client-written address still hits the per-address limit (30 in 15 minutes)', async () => {
    const outcomes: string[] = [];
    // a different unknown address each time, so only the per-address limit can refuse
    for (let i = 0; i < 31; i++) {
      const err = await authorize(
        { email: `nobody${i}@nowhere.example`, password: 'not the password at all' },
        { headers: forwarded(`198.51.100.${i}`, '203.0.113.10') },
      ).then(
        () => 'signed in',
        (e: Error) => e.message,
      );
      outcomes.push(err);
    }
    // 30 a quarter hour per address (lib/auth/rate-limit.ts; common practice, no source)
    expect(outcomes.slice(0, 30).every((m) => m === SIGN_IN_ERRORS.wrong)).toBe(true);
    expect(outcomes[30]).toMatch(/Too many attempts/);
  });

  it('password reset requests: the same, 10 an hour per address', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 11; i++) {
      const res = await resetPOST(
        new NextRequest('http://localhost/api/account/password-reset', {
          method: 'POST',
          headers: { 'content-type': 'application/json', ...forwarded(`198.51.100.${i}`, '203.0.113.11') },
          body: JSON.stringify({ email: `ghost${i}@nowhere.example` }),
        }),
      );
      statuses.push(res.status);
    }
    expect(statuses).toEqual([...Array(10).fill(202), 429]);
    await backgroundSettled();
  });

  it('behind TRUST_PROXY_HOPS proxies, the entry each proxy vouches for is the client', () => {
    const headers = { 'x-forwarded-for': 'whatever-the-client-wrote, 192.0.2.44, 10.0.0.2' };
    expect(clientIp(headers)).toBe('10.0.0.2');
    process.env.TRUST_PROXY_HOPS = '1';
    expect(clientIp(headers)).toBe('192.0.2.44');
    // reached directly, around the proxy: the peer itself
    expect(clientIp({ 'x-forwarded-for': '192.0.2.45' })).toBe('192.0.2.45');
  });
});

describe('per-account limits hold for every spelling the collation folds onto the account', () => {
  // utf8mb4_unicode_ci compares these equal to cabin@sorrelcreek.example (accent, full-width, case)
  const SPELLINGS = ['cäbin@sorrelcreek.example', 'cabｉn@sorrelcreek.example', 'CÁBIN@sorrelcreek.example'];
  let ip = 0;
  const from = () => ({ headers: { 'x-forwarded-for': `192.0.2.${++ip}` } });

  it('the database does take them for one account (the premise of the test)', async () => {
    const { User } = initModels();
    for (const email of SPELLINGS) expect((await User.findOne({ where: { email } }))?.handle).toBe('sorrel_cabin');
  });

  it('a spelling the collation merely folds onto an account does not sign in to it', async () => {
    for (const email of SPELLINGS)
      await expect(authorize({ email, password: DEMO_PASSWORD }, from())).rejects.toThrow(SIGN_IN_ERRORS.wrong);
  });

  it('wrong passwords under several spellings use up one count; the locked account stays locked under its own spelling', async () => {
    // those three tries above already count: five a quarter hour per account (lib/auth/rate-limit.ts; common practice, no source)
    await expect(authorize({ email: SPELLINGS[0], password: 'not-the-password' }, from())).rejects.toThrow(
      SIGN_IN_ERRORS.wrong,
    );
    await expect(authorize({ email: SPELLINGS[1], password: 'not-the-password' }, from())).rejects.toThrow(
      SIGN_IN_ERRORS.wrong,
    );
    await expect(authorize({ email: SPELLINGS[2], password: DEMO_PASSWORD }, from())).rejects.toThrow(
      /Too many attempts/,
    );
    await expect(authorize({ email: 'cabin@sorrelcreek.example', password: DEMO_PASSWORD }, from())).rejects.toThrow(
      /Too many attempts/,
    );
  });

  it('sign-in links: one count per account however it is spelt, and no link to a spelling that is not the account', async () => {
    const email = 'valves@quarrylane.example';
    const spellings = [email, 'välves@quarrylane.example', 'VALVEＳ@quarrylane.example', 'vâlves@quarrylane.example'];
    const limited: boolean[] = [];
    for (const [i, e] of spellings.entries()) {
      const r = await authPOST(
        new NextRequest('http://127.0.0.1:3100/api/auth/signin/email', {
          method: 'POST',
          headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-forwarded-for': `192.0.2.${100 + i}` },
          body: new URLSearchParams({ email: e }).toString(),
        }) as never,
        { params: Promise.resolve({ nextauth: ['signin', 'email'] }) },
      ).then(
        (res) => res.status === 429,
        () => false, // not limited: next-auth itself ran (and needs a real request scope)
      );
      limited.push(r);
    }
    // three an hour per account (lib/auth/rate-limit.ts; common practice, no source)
    expect(limited).toEqual([false, false, false, true]);

    const send = (
      authOptions.providers.find((x) => x.id === 'email') as unknown as {
        options: { sendVerificationRequest: (p: { identifier: string; url: string }) => Promise<void> };
      }
    ).options.sendVerificationRequest;
    const before = catcher.countTo(email);
    await send({
      identifier: 'välves@quarrylane.example',
      url: 'http://127.0.0.1:3100/api/auth/callback/email?token=x',
    });
    await backgroundSettled();
    expect(catcher.countTo(email)).toBe(before);
  });

  it('sign-up refuses an address that only the collation makes equal to a member’s, naming the field, and creates nothing', async () => {
    const { User } = initModels();
    const before = await User.count();
    for (const email of SPELLINGS) {
      const res = await signUpPOST(
        new NextRequest('http://localhost/api/account/sign-up', {
          method: 'POST',
          headers: { 'content-type': 'application/json', 'x-forwarded-for': `192.0.2.${++ip}` },
          body: JSON.stringify({
            email,
            password: 'kettle moss heron ladder',
            handle: `cabin_twin_${ip}`,
            displayName: 'Cabin twin',
          }),
        }),
      );
      expect(res.status).toBe(400);
      expect((await res.json()).error.field).toBe('email');
    }
    expect(await User.count()).toBe(before);
  });
});
