import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { NextRequest } from 'next/server';
import { encode } from 'next-auth/jwt';
import { createRequire } from 'node:module';
import path from 'node:path';

// Pages read the request's cookies through next/headers; here they are the test's.
const pageRequest = vi.hoisted(() => ({ cookie: '' }));
vi.mock('next/headers', () => ({
  cookies: async () => {
    const jar = new Map(
      pageRequest.cookie
        ? pageRequest.cookie
            .split('; ')
            .map((c) => [c.slice(0, c.indexOf('=')), c.slice(c.indexOf('=') + 1)] as [string, string])
        : [],
    );
    return {
      getAll: () => [...jar].map(([name, value]) => ({ name, value })),
      get: (n: string) => (jar.has(n) ? { name: n, value: jar.get(n)! } : undefined),
    };
  },
  headers: async () => new Headers(pageRequest.cookie ? { cookie: pageRequest.cookie } : {}),
}));

import { GET as settingsGET } from '@/app/api/account/settings/route';
import { POST as signOutEverywherePOST } from '@/app/api/account/sign-out-everywhere/route';
import { POST as resetConfirmPOST } from '@/app/api/account/password-reset/confirm/route';
import { POST as reviewPOST } from '@/app/api/review/actions/route';
import { POST as answerPOST } from '@/app/api/questions/[id]/answers/route';
import SignInPage from '@/app/(account)/sign-in/page';
import { authOptions } from '@/lib/auth/options';
import { authSecret } from '@/lib/auth/secret';
import { currentUser, currentUserInPage } from '@/lib/auth/session';
import { safeReturnPath } from '@/lib/auth/return-path';
import { issueToken } from '@/lib/auth/tokens';
import { changeRole } from '@/lib/accounts/roles';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';

/**
 * Issue 17, items 4, 5 and 18: sessions that outlive a reset, a suspension or a
 * role change; "sign out everywhere"; junk session cookies; where the browser goes
 * after sign-in.
 */
beforeAll(freshDemoDatabase);
afterEach(() => vi.restoreAllMocks());

/** The cookie a browser got at its sign-in: the jwt callback's token, as next-auth encodes it. */
async function signedInCookie(handle: string): Promise<string> {
  const u = (await initModels().User.findOne({ where: { handle } }))!;
  const token = await authOptions.callbacks!.jwt!({
    token: {},
    user: { id: String(u.id) } as never,
    account: null,
  } as never);
  return `next-auth.session-token=${await encode({ token, secret: authSecret() })}`;
}

let ip = 0;
const request = (url: string, cookie: string, method = 'GET', body?: unknown) =>
  new NextRequest(`http://localhost${url}`, {
    method,
    headers: { 'content-type': 'application/json', cookie, 'x-forwarded-for': `192.0.2.${++ip}` },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const settingsAs = async (cookie: string) => (await settingsGET(request('/api/account/settings', cookie))).status;

// next-auth's core handler, which its route handler calls (not in the package's exports map)
const { AuthHandler } = createRequire(import.meta.url)(
  path.resolve(__dirname, '../../node_modules/next-auth/core/index.js'),
) as {
  AuthHandler: (p: { req: Request; options: typeof authOptions }) => Promise<unknown>;
};

/** next-auth's own /api/auth/session, as the browser's SessionProvider asks it. */
async function sessionEndpoint(cookie: string) {
  const res = await AuthHandler({
    req: new Request('http://127.0.0.1:3100/api/auth/session', { headers: { cookie } }),
    options: authOptions,
  });
  return res as {
    status?: number;
    body?: Record<string, unknown>;
    cookies?: { name: string; value: string; options?: { maxAge?: number; expires?: Date } }[];
  };
}

describe('a session ends when the account says so', () => {
  it('a password reset signs out every earlier session, route handlers and pages alike', async () => {
    const cookie = await signedInCookie('ferncombe_tamsin');
    expect(await settingsAs(cookie)).toBe(200);
    pageRequest.cookie = cookie;
    expect((await currentUserInPage())?.handle).toBe('ferncombe_tamsin');

    const user = (await initModels().User.findOne({ where: { handle: 'ferncombe_tamsin' } }))!;
    const token = await getSequelize().transaction((t) => issueToken(user.id, 'reset-password', t));
    expect(
      (
        await resetConfirmPOST(
          request('/api/account/password-reset/confirm', '', 'POST', {
            token,
            password: 'alder sluice gravel lantern',
          }),
        )
      ).status,
    ).toBe(200);

    expect(await settingsAs(cookie)).toBe(401);
    expect(await currentUserInPage()).toBeNull();
    // next-auth's own session read says signed out and clears the cookie
    const s = await sessionEndpoint(cookie);
    expect(s.body?.user).toBeUndefined();
    expect(s.cookies?.some((c) => c.name === 'next-auth.session-token' && c.value === '')).toBe(true);
    // a sign-in after the reset works
    expect(await settingsAs(await signedInCookie('ferncombe_tamsin'))).toBe(200);
  });

  it('"sign out everywhere" ends this session and every copy of it', async () => {
    const laptop = await signedInCookie('highcrag_shepherd');
    const phone = await signedInCookie('highcrag_shepherd');
    const other = await signedInCookie('sorrel_cabin');
    const res = await signOutEverywherePOST(request('/api/account/sign-out-everywhere', laptop, 'POST', {}));
    expect(res.status).toBe(200);
    expect(res.headers.get('set-cookie')).toMatch(/next-auth\.session-token=;/);
    expect(await settingsAs(laptop)).toBe(401);
    expect(await settingsAs(phone)).toBe(401);
    // another member is untouched
    expect(await settingsAs(other)).toBe(200);
    // signed out, it cannot be called
    expect((await signOutEverywherePOST(request('/api/account/sign-out-everywhere', '', 'POST', {}))).status).toBe(401);
  });

  it('a suspension ends the member’s sessions; signed in again, the member is told of the suspension', async () => {
    const { Answer, Question } = initModels();
    const author = (await initModels().User.findOne({ where: { handle: 'quarry_lane_valves' } }))!;
    const answer = (await Answer.findOne({ where: { authorId: author.id } }))!;
    const before = await signedInCookie('quarry_lane_valves');
    const moss = await signedInCookie('moss_moderator');
    const act = await reviewPOST(
      request('/api/review/actions', moss, 'POST', {
        action: 'suspend',
        postType: 'answer',
        postId: answer.id,
        reason: 'testing session ends',
        until: '2099-01-31',
      }),
    );
    expect(act.status).toBeLessThan(300);
    expect(await settingsAs(before)).toBe(401);
    const question = (await Question.findOne({ where: { id: answer.questionId } }))!;
    const again = await answerPOST(
      request(`/api/questions/${question.id}/answers`, await signedInCookie('quarry_lane_valves'), 'POST', {
        body: 'Trying to answer while suspended.',
      }),
      { params: Promise.resolve({ id: String(question.id) }) },
    );
    expect(again.status).toBe(403);
    expect((await again.json()).error.code).toBe('suspended');
  });

  it('a role change ends the member’s sessions, so a demoted moderator keeps no open session', async () => {
    const { User } = initModels();
    const admin = (await User.findOne({ where: { handle: 'clack_admin' } }))!;
    const builder = (await User.findOne({ where: { handle: 'ironwheel_builds' } }))!;
    const before = await signedInCookie('ironwheel_builds');
    expect(await currentUser(request('/', before))).not.toBeNull();
    expect(await changeRole(admin.id, builder.id, 'moderator')).toMatchObject({ ok: true, changed: true });
    expect(await currentUser(request('/', before))).toBeNull();
  });
});

describe('junk session cookies read as signed out, with at most one short log line', () => {
  const JUNK = [
    'next-auth.session-token=not-a-jwt-at-all',
    'next-auth.session-token=eyJhbGciOiJkaXIiLCJlbmMiOiJBMjU2R0NNIn0..AAAAAAAAAAAAAAAA.forged.AAAAAAAAAAAAAAAAAAAAAA',
  ];

  it.each(JUNK)('%s', async (cookie) => {
    const lines: string[] = [];
    for (const level of ['error', 'warn', 'log', 'info'] as const) {
      vi.spyOn(console, level).mockImplementation((...args: unknown[]) => {
        lines.push(
          args
            .map((a) =>
              a instanceof Error ? `${a.message}\n${a.stack}` : typeof a === 'string' ? a : JSON.stringify(a),
            )
            .join(' '),
        );
      });
    }
    expect(await currentUser(request('/', cookie))).toBeNull();
    pageRequest.cookie = cookie;
    expect(await currentUserInPage()).toBeNull();
    const s = await sessionEndpoint(cookie);
    expect(s.body?.user).toBeUndefined();

    expect(lines.length).toBeLessThanOrEqual(1);
    for (const line of lines) {
      expect(line).not.toMatch(/\n\s+at /);
      // one line a person can read at a glance (common practice, no source)
      expect(line.length).toBeLessThan(200);
    }
  });
});

describe('after sign-in the browser goes only to a path on this site', () => {
  // "\t" is what the page receives for callbackUrl=/%09/host: the query is decoded before it gets it
  const OFF_SITE = [
    '//evil.example',
    '/\\evil.example',
    '/\t/evil.example',
    '/.//evil.example',
    'https://evil.example/x',
    'javascript:alert(1)',
    '\\\\evil.example',
  ];

  it.each(OFF_SITE)('refuses %j', (raw) => {
    expect(safeReturnPath(raw)).toBe('/');
    // and what a browser would make of the path handed back stays here
    expect(new URL(safeReturnPath(raw), 'https://clackwater.example').origin).toBe('https://clackwater.example');
  });

  it('keeps a path on this site, with its query and fragment', () => {
    expect(safeReturnPath('/questions/3?tab=answers#a12')).toBe('/questions/3?tab=answers#a12');
    expect(safeReturnPath('/settings')).toBe('/settings');
  });

  it('the sign-in page hands the form only a safe path', async () => {
    type El = { type?: unknown; props?: { callbackUrl?: string; children?: unknown } };
    const find = (node: unknown): El | null => {
      if (!node || typeof node !== 'object') return null;
      const el = node as El;
      if (el.props && 'callbackUrl' in el.props) return el;
      const kids = el.props?.children;
      for (const k of Array.isArray(kids) ? kids : [kids]) {
        const hit = find(k);
        if (hit) return hit;
      }
      return null;
    };
    for (const raw of OFF_SITE) {
      const page = await SignInPage({ searchParams: Promise.resolve({ callbackUrl: raw }) });
      expect(find(page)?.props?.callbackUrl).toBe('/');
    }
    const page = await SignInPage({ searchParams: Promise.resolve({ callbackUrl: '/questions/ask' }) });
    expect(find(page)?.props?.callbackUrl).toBe('/questions/ask');
  });

  it("next-auth's redirect callback keeps to this origin", async () => {
    const redirect = authOptions.callbacks!.redirect!;
    const base = 'http://127.0.0.1:3100';
    for (const url of [
      '//evil.example',
      '/\\evil.example',
      '/\t/evil.example',
      'https://evil.example/',
      `${base}.evil.example/`,
    ]) {
      expect(new URL(await redirect({ url, baseUrl: base })).origin).toBe(base);
    }
    expect(await redirect({ url: '/settings', baseUrl: base })).toBe(`${base}/settings`);
    expect(await redirect({ url: `${base}/questions/2`, baseUrl: base })).toBe(`${base}/questions/2`);
  });
});
