import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { NextRequest } from 'next/server';
import { initModels } from '@/models';
import { siteUrl } from '@/lib/site';
import { sessionCookie } from '../support/act-as';
import { freshDemoDatabase } from '../support/db';
import { SmtpCatcher } from '../support/smtp-catcher';

/**
 * Throws arbitrary JSON at every route handler that takes a body, as anonymous and as
 * signed-in members, and asserts no answer is a 5xx (issue 17, item 9): bad input is
 * always a 4xx naming the field. Bodies are well-formed samples with one value
 * replaced by an arbitrary string, number or nesting, or arbitrary JSON outright;
 * route ids are arbitrary too. Bounded: a fixed seed and a few runs per route.
 */
const API_DIR = path.resolve(__dirname, '../../app/api');
const WRITE_METHODS = ['POST', 'PUT', 'PATCH', 'DELETE'] as const;
/** next-auth's own endpoints take its forms, not JSON; the photo upload is multipart. */
const SKIP = new Set(['POST /api/auth/[...nextauth]']);

type Route = {
  key: string;
  method: string;
  route: string;
  handler: (r: NextRequest, ctx: unknown) => Promise<Response>;
  params: string[];
};

async function routes(): Promise<Route[]> {
  const files: string[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const full = path.join(dir, name);
      if (statSync(full).isDirectory()) walk(full);
      else if (name === 'route.ts') files.push(full);
    }
  };
  walk(API_DIR);
  const out: Route[] = [];
  for (const file of files) {
    const mod = (await import(file)) as Record<string, unknown>;
    const route = `/api/${path.relative(API_DIR, path.dirname(file)).split(path.sep).join('/')}`;
    const params = [...route.matchAll(/\[(?:\.\.\.)?([^\]]+)\]/g)].map((m) => m[1]);
    for (const m of WRITE_METHODS) {
      const key = `${m} ${route}`;
      if (typeof mod[m] === 'function' && !SKIP.has(key))
        out.push({ key, method: m, route, handler: mod[m] as Route['handler'], params });
    }
  }
  return out;
}

/** A plausible body per route, so one replaced value gets past the outer schema. */
const SAMPLE: Record<string, Record<string, unknown>> = {
  '/api/calculations': { tool: 'yield-estimate', inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' } },
  '/api/questions': {
    title: 'Waste valve sticks open after rain',
    body: 'Since the brook rose the valve hangs open and will not restart.',
    tags: ['stall'],
    siteSheet: { fall: '4 ft', lift: '29 ft', driveLength: '30 ft', symptoms: 'stops after a minute' },
  },
  '/api/questions/[id]': {
    title: 'Half-inch pump beats for a minute, then stops',
    body: 'The drive pipe is 12 ft of 3/4 inch PVC on 4 ft of fall.',
    tags: ['stall'],
  },
  '/api/questions/[id]/answers': { body: 'Drain the drive pipe and the pump body before the first frost.' },
  '/api/questions/[id]/replies': { body: 'Same here on our creek.', answerId: 1 },
  '/api/questions/[id]/fixed': { answerId: 1, whatFixedIt: 'Lowered the intake below the dry-week level' },
  '/api/answers/[id]': { body: 'We run two side by side; size the line for both.' },
  '/api/replies/[id]': { body: 'Thanks, that did it.' },
  '/api/helpful': { postType: 'question', postId: 1 },
  '/api/flags': { postType: 'answer', postId: 1, reason: 'spam' },
  '/api/appeals': { postType: 'answer', postId: 1, text: 'Please look at this decision again.' },
  '/api/review/actions': { action: 'warn', postType: 'answer', postId: 1, reason: 'checking' },
  '/api/expert-applications': {
    pumpsBuilt: 3,
    years: 2,
    region: 'Linnet valley',
    experience: 'Three rams on a spring-fed brook, tuned by ear.',
    links: ['https://example.org/build'],
  },
  '/api/expert-applications/[id]/decision': { decision: 'decline', note: 'not yet' },
  '/api/admin/users/[id]/role': { role: 'member' },
  '/api/account/settings': { displayName: 'Same Name', region: '', bio: '', units: 'US' },
  '/api/account/mail': {
    digest: 'weekly',
    tags: ['tuning'],
    notify: { answers: true, replies: true, fixed: true, moderation: true, expert: true },
  },
  '/api/account/sign-up': {
    handle: 'fuzz_member',
    email: 'fuzz@example.test',
    password: 'a long and unusual passphrase 42',
    displayName: 'Fuzz',
  },
  '/api/account/password-reset': { email: 'fuzz@example.test' },
  '/api/account/password-reset/confirm': { token: 'x'.repeat(43), password: 'a long and unusual passphrase 42' },
  '/api/account/verify-email': { token: 'x'.repeat(43) },
  '/api/account/verify-email/resend': { email: 'fuzz@example.test' },
  '/api/guides/[slug]/safety-checks': { verdict: 'sound', notes: '' },
  '/api/field-log': {
    siteName: 'Fuzz spring',
    testedOn: '2026-06-01',
    pumpSize: '1',
    fall: '2 m',
    lift: '10 m',
    driveLength: '12 m',
    driveSize: '1',
    driveMaterial: 'pvc',
    driveFlow: '20 L/min',
    driveFlowMethod: 'measured',
    trials: [{ volume: '2 L', seconds: 40 }],
  },
  '/api/field-log/[id]/link': { beforeId: 1, whatChanged: 'outlet moved higher' },
  '/api/field-log/import': { csv: 'site_name,tested_on\r\nFuzz,2026-06-01\r\n' },
};

/** Strings with what breaks parsers: lone surrogates, controls, numbers with units, huge and tiny exponents. */
const nastyString = fc.oneof(
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 40 }) },
  { weight: 1, arbitrary: fc.string({ unit: 'grapheme', maxLength: 40 }) },
  {
    weight: 3,
    arbitrary: fc.constantFrom(
      '\ud800',
      'a\udc00b',
      '\u0000',
      '1e-320 m',
      '1e-320 ft',
      '1e308 ft',
      '-0 m',
      'NaN m',
      'Infinity gal/min',
      '0000-00-00',
      '2026-02-30',
      '2026-99-99',
      '9'.repeat(400),
      '__proto__',
      'constructor',
      'https://example.org/\ud800',
    ),
  },
  { weight: 1, arbitrary: fc.stringMatching(/^-?\d{1,4}(\.\d{1,3})?(e-?\d{1,3})? ?(m|ft|in|gal\/min|L\/min|psi)?$/) },
);
const nastyNumber = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer(),
  fc.constantFrom(0, -1, 1e-320, 1e308, 2 ** 53, -(2 ** 31)),
);
const leaf = fc.oneof(nastyString, nastyNumber, fc.boolean(), fc.constant(null));
const nested = fc.letrec((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    leaf,
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(nastyString, tie('value'), { maxKeys: 4 }),
  ),
})).value;

/** A sample with one top-level or second-level value replaced, or arbitrary JSON outright. */
function bodyFor(route: string) {
  const sample = SAMPLE[route] ?? {};
  const keys = Object.keys(sample);
  const replaced = keys.length
    ? fc
        .tuple(
          fc.constantFrom(...keys),
          fc.oneof(
            { weight: 3, arbitrary: nastyString },
            { weight: 1, arbitrary: nastyNumber },
            { weight: 1, arbitrary: nested },
          ),
          fc.boolean(),
          fc.nat(),
        )
        .map(([k, v, deep, pick]) => {
          const inner = sample[k];
          if (deep && inner && typeof inner === 'object' && Object.keys(inner).length) {
            // one value inside: a site sheet's field, a calculation's input, a list's item
            const innerKeys = Object.keys(inner);
            const ik = innerKeys[pick % innerKeys.length];
            return {
              ...sample,
              [k]: Array.isArray(inner) ? Object.assign([...inner], { [ik]: v }) : { ...(inner as object), [ik]: v },
            };
          }
          return { ...sample, [k]: v };
        })
    : nested;
  return fc.oneof({ weight: 4, arbitrary: replaced }, { weight: 1, arbitrary: nested });
}

const idArb = fc.oneof(
  fc.constantFrom('1', '2', '999999', '0', '-1', '4294967296', '1e3', 'how-a-ram-pump-works'),
  nastyString.filter((s) => s.length > 0),
);

let sequence = 0;
async function callOnce(r: Route, who: string | null, body: unknown, params: Record<string, string>) {
  const headers: Record<string, string> = {
    'content-type': 'application/json',
    origin: new URL(siteUrl()).origin,
    'x-forwarded-for': `10.77.${(++sequence >> 8) & 255}.${sequence & 255}`,
  };
  if (who) headers.cookie = await sessionCookie(who);
  const url = `http://localhost${r.route.replace(/\[(?:\.\.\.)?[^\]]+\]/g, (m) => encodeURIComponent((params[m.replace(/[[\].]/g, '')] ?? '1').toWellFormed()))}`;
  // the flood limits would turn every later write into a 429 and hide the handlers'
  // own answers; a fresh set per call (lib/auth/rate-limit.ts keeps them on globalThis)
  (globalThis as { __clackwaterLimits?: unknown }).__clackwaterLimits = undefined;
  const res = await r.handler(new NextRequest(url, { method: r.method, headers, body: JSON.stringify(body) }), {
    params: Promise.resolve(params),
  });
  return { status: res.status, text: res.status >= 500 ? await res.text() : '' };
}

const catcher = new SmtpCatcher(Number(process.env.SMTP_PORT));

describe('no JSON route answers 5xx to arbitrary input (fast-check)', () => {
  let all: Route[] = [];
  beforeAll(async () => {
    await freshDemoDatabase();
    await catcher.start();
    all = await routes();
    await initModels().User.count();
  });
  afterAll(() => catcher.stop());

  it('finds the write routes', () => {
    expect(all.length).toBeGreaterThan(20);
  });

  for (const who of [null, 'highcrag_shepherd', 'clack_admin'] as const) {
    it(`as ${who ?? 'anonymous'}: every write route answers below 500`, async () => {
      const failures: string[] = [];
      for (const r of all) {
        await fc
          .assert(
            fc.asyncProperty(
              bodyFor(r.route),
              fc.array(idArb, { minLength: r.params.length, maxLength: r.params.length }),
              async (body, ids) => {
                const params = Object.fromEntries(r.params.map((p, i) => [p, ids[i]]));
                let res: { status: number; text: string };
                try {
                  res = await callOnce(r, who, body, params);
                } catch (err) {
                  // a handler that throws is a 500 in Next
                  res = { status: 500, text: String(err) };
                }
                if (res.status >= 500)
                  failures.push(
                    `${r.key} ${res.status} ${JSON.stringify(body).slice(0, 200)} ${JSON.stringify(params)} → ${res.text.slice(0, 200)}`,
                  );
                return res.status < 500;
              },
            ),
            { numRuns: 40, seed: 17, endOnFailure: true },
          )
          .catch(() => undefined); // the failure is listed below, with its input
      }
      expect(failures).toEqual([]);
    }, 120_000);
  }
});
