import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { encode } from 'next-auth/jwt';
import { API_ROUTES } from '@/lib/auth/routes';
import { POLICY, type Action } from '@/lib/auth/policy';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { authSecret } from '@/lib/auth/secret';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';

const API_DIR = path.resolve(__dirname, '../../app/api');
const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;

/** Every exported handler under app/api, as "METHOD /api/path". */
async function discoverHandlers(): Promise<{ key: string; file: string; method: string }[]> {
  const found: { key: string; file: string; method: string }[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const full = path.join(dir, name);
      if (statSync(full).isDirectory()) walk(full);
      else if (name === 'route.ts') found.push({ key: '', file: full, method: '' });
    }
  };
  walk(API_DIR);
  const out: { key: string; file: string; method: string }[] = [];
  for (const f of found) {
    const mod = (await import(f.file)) as Record<string, unknown>;
    const route = `/api/${path.relative(API_DIR, path.dirname(f.file)).split(path.sep).join('/')}`;
    for (const m of METHODS)
      if (typeof mod[m] === 'function') out.push({ key: `${m} ${route}`, file: f.file, method: m });
  }
  return out;
}

type Persona =
  | 'anonymous'
  | 'member'
  | 'owner'
  | 'expert'
  | 'moderator'
  | 'admin'
  | 'suspendedMember'
  | 'suspendedExpert'
  | 'suspendedAdmin';
const PERSONAS: Persona[] = [
  'anonymous',
  'member',
  'owner',
  'expert',
  'moderator',
  'admin',
  'suspendedMember',
  'suspendedExpert',
  'suspendedAdmin',
];
const PERSONA_HANDLE: Record<Exclude<Persona, 'anonymous'>, string> = {
  member: 'highcrag_shepherd',
  owner: 'ferncombe_tamsin',
  expert: 'ironwheel_builds',
  moderator: 'moss_moderator',
  admin: 'clack_admin',
  // accounts the matrix creates, suspended until 2099
  suspendedMember: 'matrix_suspended_member',
  suspendedExpert: 'matrix_suspended_expert',
  suspendedAdmin: 'matrix_suspended_admin',
};
const SUSPENDED: Partial<Record<Persona, 'member' | 'expert' | 'admin'>> = {
  suspendedMember: 'member',
  suspendedExpert: 'expert',
  suspendedAdmin: 'admin',
};

/**
 * A request each protected route accepts when the caller is allowed: the matrix
 * checks that callers the policy refuses get 401/403 and allowed ones do not.
 * `params` fills the dynamic segments; `owner` marks the persona that owns the resource.
 */
type Sample = { params?: Record<string, string>; body?: unknown; url?: string };
// an invented brook the planner accepts (common practice, no source)
const SITE_SURVEY = {
  fall: '4 ft',
  lift: '29 ft',
  sourceRun: '30 ft',
  tankRun: '150 ft',
  spareFlow: '10 gal/min',
  people: '2',
};
const OWNER_SITE = 'MatrixSite01';
const SAMPLES: Record<string, (ids: Record<string, number>) => Sample> = {
  'POST /api/calculations': () => ({
    body: { tool: 'yield-estimate', inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' } },
  }),
  'POST /api/guides/[slug]/safety-checks': () => ({
    params: { slug: 'surveying-fall-and-flow' },
    body: { verdict: 'sound', notes: '' },
  }),
  'GET /api/expert-applications': () => ({}),
  'POST /api/expert-applications': () => ({
    body: {
      pumpsBuilt: 3,
      years: 2,
      region: 'Linnet valley',
      experience: 'Three rams on a spring-fed brook, tuned by ear.',
      links: [],
    },
  }),
  'POST /api/expert-applications/[id]/decision': () => ({
    params: { id: '999999' },
    body: { decision: 'approve', note: 'looks good' },
  }),
  'PUT /api/admin/users/[id]/role': (ids) => ({ params: { id: String(ids.member) }, body: { role: 'member' } }),
  'GET /api/account/settings': () => ({}),
  'PUT /api/account/settings': () => ({ body: { displayName: 'Same Name', region: '', bio: '', units: 'US' } }),
  'PUT /api/account/units': () => ({ body: { units: 'US' } }),
  'POST /api/account/sign-out-everywhere': () => ({}),
  // multipart cannot be sent as JSON: an allowed caller gets 400 for the JSON body, never 401/403
  'POST /api/photos': () => ({ body: {} }),
  'POST /api/questions': () => ({
    body: {
      title: 'Waste valve sticks open after rain',
      body: 'Since the brook rose the valve hangs open and the pump will not restart.',
      tags: ['stall'],
    },
  }),
  'PUT /api/questions/[id]': (ids) => ({
    params: { id: String(ids.ownerQuestion) },
    body: {
      title: 'Half-inch pump beats for a minute, then stops',
      body: 'Edited: the drive pipe is 12 ft of 3/4 inch PVC on 4 ft of fall.',
      tags: ['stall'],
    },
  }),
  'POST /api/questions/[id]/answers': (ids) => ({
    params: { id: String(ids.otherQuestion) },
    body: { body: 'Drain the drive pipe and the pump body before the first frost.' },
  }),
  'POST /api/questions/[id]/replies': (ids) => ({
    params: { id: String(ids.otherQuestion) },
    body: { body: 'Same here on our creek.' },
  }),
  'PUT /api/questions/[id]/fixed': (ids) => ({ params: { id: String(ids.ownerQuestion) }, body: { answerId: null } }),
  'POST /api/questions/[id]/follow': (ids) => ({ params: { id: String(ids.otherQuestion) } }),
  'DELETE /api/questions/[id]/follow': (ids) => ({ params: { id: String(ids.otherQuestion) } }),
  'PUT /api/answers/[id]': (ids) => ({
    params: { id: String(ids.ownerAnswer) },
    body: { body: 'We run two side by side at Ferncombe; size the line for both.' },
  }),
  'PUT /api/replies/[id]': (ids) => ({
    params: { id: String(ids.ownerReply) },
    body: { body: 'Thanks, that did it.' },
  }),
  'POST /api/helpful': (ids) => ({ body: { postType: 'question', postId: ids.otherQuestion } }),
  'DELETE /api/helpful': (ids) => ({ body: { postType: 'question', postId: ids.otherQuestion } }),
  'POST /api/flags': (ids) => ({ body: { postType: 'answer', postId: ids.flagTarget, reason: 'spam' } }),
  // the owner's answer is shown to readers: an allowed caller gets 422, never 401/403
  'POST /api/appeals': (ids) => ({
    body: { postType: 'answer', postId: ids.ownerAnswer, text: 'checking the matrix: please look again' },
  }),
  'GET /api/review': () => ({}),
  'POST /api/review/actions': (ids) => ({
    body: { action: 'warn', postType: 'answer', postId: ids.ownerAnswer, reason: 'checking the matrix' },
  }),
  'GET /api/review/suspensions': () => ({}),
  // no member 999999: an allowed caller gets 404, never 401/403
  'POST /api/review/suspensions/[id]/lift': () => ({ params: { id: '999999' }, body: { reason: 'served the time' } }),
  'GET /api/admin/audit': () => ({}),
  // no failed message 999999: an allowed caller gets 404, never 401/403
  'POST /api/admin/outbox/[id]/retry': () => ({ params: { id: '999999' } }),
  'GET /api/account/mail': () => ({}),
  'PUT /api/account/mail': () => ({
    body: {
      digest: 'weekly',
      tags: ['tuning'],
      notify: { answers: true, replies: true, fixed: true, moderation: true, expert: true },
    },
  }),
  'POST /api/field-log': () => ({
    body: {
      siteName: 'Matrix test spring',
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
  }),
  'POST /api/field-log/[id]/link': (ids) => ({
    params: { id: String(ids.ownerEntryAfter) },
    body: { beforeId: ids.ownerEntryBefore, whatChanged: 'outlet moved higher' },
  }),
  // a header with no rows: an allowed caller gets 422 for the empty file, never 401/403
  'POST /api/field-log/import': () => ({ body: { csv: 'site_name,tested_on\r\n' } }),
  'POST /api/sites': () => ({ body: { name: 'Matrix brook', survey: SITE_SURVEY } }),
  // a public site: anyone sees it, so a refusal to change it is a 403, not the 404 a private one gives
  'PATCH /api/sites/[id]': () => ({ params: { id: OWNER_SITE }, body: { visibility: 'public' } }),
  'POST /api/sites/[id]/versions': () => ({ params: { id: OWNER_SITE }, body: { survey: SITE_SURVEY } }),
};

/** Routes that only ever act on the caller's own account: every signed-in persona is the owner. */
const SELF_ONLY = new Set([
  'GET /api/account/settings',
  'PUT /api/account/settings',
  'PUT /api/account/units',
  'GET /api/account/mail',
  'PUT /api/account/mail',
]);

async function cookieFor(persona: Persona): Promise<string | undefined> {
  if (persona === 'anonymous') return undefined;
  const { User } = initModels();
  const u = (await User.findOne({ where: { handle: PERSONA_HANDLE[persona] } }))!;
  const token = await encode({
    token: { uid: u.id, role: u.role, handle: u.handle, sv: u.sessionVersion },
    secret: authSecret(),
  });
  return `next-auth.session-token=${token}`;
}

function allowed(action: Action, persona: Persona, selfOnly: boolean): boolean {
  const roleOf: Record<Persona, 'anonymous' | 'member' | 'expert' | 'moderator' | 'admin'> = {
    anonymous: 'anonymous',
    member: 'member',
    owner: 'member',
    expert: 'expert',
    moderator: 'moderator',
    admin: 'admin',
    suspendedMember: 'member',
    suspendedExpert: 'expert',
    suspendedAdmin: 'admin',
  };
  // a suspended account keeps only the rows the table marks as kept (reads)
  if (SUSPENDED[persona] && !POLICY[action].keptWhenSuspended) return false;
  const rule = POLICY[action][roleOf[persona]];
  // 'own' rules: the samples act on the owner's own resource
  return rule === 'own' ? persona === 'owner' || (selfOnly && persona !== 'anonymous') : rule;
}

/** The text of the function `name` in `text`, from its declaration to the next top-level declaration. */
function functionText(text: string, name: string): string | null {
  const start = text.search(new RegExp(`^(export\\s+)?(async\\s+)?function\\s+${name}\\b`, 'm'));
  if (start < 0) return null;
  const next = text.slice(start + 1).search(/\n(export|async|function|const|let)\s/);
  return next < 0 ? text.slice(start) : text.slice(start, start + 1 + next);
}

/**
 * The source of one exported handler: `export async function METHOD`, or
 * `export const METHOD = (…) => helper(…)` with the helper's own text.
 */
function handlerSource(file: string, method: string): string | null {
  const text = readFileSync(file, 'utf8');
  const direct = functionText(text, method);
  if (direct) return direct;
  const arrow = text.match(new RegExp(`^export\\s+const\\s+${method}\\s*=\\s*\\([^)]*\\)\\s*=>\\s*(\\w+)\\(`, 'm'));
  return arrow ? functionText(text, arrow[1]) : null;
}

describe('permission matrix: every API route × every persona, against the policy table', () => {
  let handlers: Awaited<ReturnType<typeof discoverHandlers>>;
  beforeAll(async () => {
    await freshDemoDatabase();
    const { User } = initModels();
    for (const [persona, role] of Object.entries(SUSPENDED)) {
      const handle = PERSONA_HANDLE[persona as Exclude<Persona, 'anonymous'>];
      await User.create({
        handle,
        displayName: handle,
        email: `${handle}@matrix.example`,
        role,
        region: null,
        bio: null,
        emailVerifiedAt: new Date(),
        suspendedUntil: new Date('2099-01-31T23:59:59Z'),
      });
    }
    handlers = await discoverHandlers();
  });

  it('every protected handler goes through guarded() with the action lib/auth/routes.ts names; the rest are listed public', () => {
    const failures: string[] = [];
    for (const h of handlers) {
      const action = API_ROUTES[h.key];
      if (!action || action === 'session') continue;
      const src = handlerSource(h.file, h.method);
      if (src === null) {
        failures.push(
          `${h.key}: write it as \`export async function ${h.method}\` (or \`export const ${h.method} = (…) => helper(…)\`) so this check can read it`,
        );
        continue;
      }
      if (action === 'public') continue;
      const calls = [...src.matchAll(/guarded\(\s*\w+\s*,\s*'([\w.]+)'/g)].map((m) => m[1]);
      if (calls.length === 0) failures.push(`${h.key}: protected (${action}) but never calls guarded()`);
      else if (!calls.includes(action))
        failures.push(`${h.key}: routes.ts says ${action}, guarded() is called with ${calls.join(', ')}`);
      if (/\bcurrentUser\(/.test(src))
        failures.push(`${h.key}: reads the session itself; guarded() hands the work its user`);
    }
    expect(failures).toEqual([]);
  });

  it('rank: a moderator cannot act on an admin’s or another moderator’s post; an admin acts on a moderator’s or another admin’s, never on their own', async () => {
    const { User, Question, Answer } = initModels();
    const admin = (await User.findOne({ where: { handle: 'clack_admin' } }))!;
    const moderator = (await User.findOne({ where: { handle: 'moss_moderator' } }))!;
    const q = (await Question.findOne({ order: [['id', 'ASC']] }))!;
    const otherAdmin = await User.create({
      handle: 'matrix_second_admin',
      displayName: 'Second admin',
      email: 'second-admin@matrix.example',
      role: 'admin',
      region: null,
      bio: null,
      emailVerifiedAt: new Date(),
    });
    const otherModerator = await User.create({
      handle: 'matrix_second_mod',
      displayName: 'Second moderator',
      email: 'second-mod@matrix.example',
      role: 'moderator',
      region: null,
      bio: null,
      emailVerifiedAt: new Date(),
    });
    const post = async (authorId: number) =>
      (await Answer.create({ questionId: q.id, authorId, body: 'Keep the drive pipe straight and rigid.' })).id;
    const act = async (persona: Persona, body: Record<string, unknown>) => {
      const cookie = (await cookieFor(persona))!;
      const req = new NextRequest('http://localhost/api/review/actions', {
        method: 'POST',
        headers: { 'content-type': 'application/json', cookie },
        body: JSON.stringify(body),
      });
      return actionPOST(req);
    };
    const adminPost = await post(admin.id);
    expect(
      (await act('moderator', { action: 'hide', postType: 'answer', postId: adminPost, reason: 'testing rank' }))
        .status,
    ).toBe(403);
    expect(
      (
        await act('moderator', {
          action: 'suspend',
          postType: 'answer',
          postId: adminPost,
          reason: 'testing rank',
          until: '2099-01-31',
        })
      ).status,
    ).toBe(403);
    expect((await Answer.findByPk(adminPost))!.hiddenAt).toBeNull();
    expect((await admin.reload()).suspendedUntil).toBeNull();
    const modPost = await post(otherModerator.id);
    expect(
      (await act('moderator', { action: 'hide', postType: 'answer', postId: modPost, reason: 'testing rank' })).status,
    ).toBe(403);
    expect(
      (await act('admin', { action: 'hide', postType: 'answer', postId: modPost, reason: 'testing rank' })).status,
    ).toBe(200);
    // another admin, never oneself
    expect(
      (
        await act('admin', {
          action: 'hide',
          postType: 'answer',
          postId: await post(otherAdmin.id),
          reason: 'testing rank',
        })
      ).status,
    ).toBe(200);
    expect(
      (await act('admin', { action: 'hide', postType: 'answer', postId: await post(admin.id), reason: 'testing rank' }))
        .status,
    ).toBe(403);
    expect(
      (
        await act('admin', {
          action: 'hide',
          postType: 'answer',
          postId: await post(moderator.id),
          reason: 'testing rank',
        })
      ).status,
    ).toBe(200);
  });

  it('finds the route handlers, and every one has an entry in lib/auth/routes.ts', () => {
    expect(handlers.length).toBeGreaterThan(8);
    const missing = handlers.map((h) => h.key).filter((k) => !(k in API_ROUTES));
    expect(missing, 'add these to API_ROUTES with the policy action they check').toEqual([]);
    const stale = Object.keys(API_ROUTES).filter((k) => !handlers.some((h) => h.key === k));
    expect(stale, 'API_ROUTES names handlers that no longer exist').toEqual([]);
  });

  it('has a sample request for every protected route', () => {
    const protectedRoutes = Object.entries(API_ROUTES)
      .filter(([, a]) => a !== 'public' && a !== 'session')
      .map(([k]) => k);
    expect(protectedRoutes.filter((k) => !(k in SAMPLES))).toEqual([]);
  });

  it('refuses and allows exactly as the policy says', async () => {
    const { User } = initModels();
    const ids: Record<string, number> = {};
    for (const [p, handle] of Object.entries(PERSONA_HANDLE)) ids[p] = (await User.findOne({ where: { handle } }))!.id;
    // Posts the "owner" persona wrote, and a thread by someone who is none of the personas.
    const { Question, Answer, Reply } = initModels();
    const cabin = (await User.findOne({ where: { handle: 'sorrel_cabin' } }))!.id;
    ids.ownerQuestion = (await Question.findOne({ where: { authorId: ids.owner } }))!.id;
    ids.ownerAnswer = (await Answer.findOne({ where: { authorId: ids.owner } }))!.id;
    ids.otherQuestion = (await Question.findOne({ where: { authorId: cabin } }))!.id;
    const quarry = (await User.findOne({ where: { handle: 'quarry_lane_valves' } }))!.id;
    ids.flagTarget = (await Answer.findOne({ where: { authorId: quarry } }))!.id;
    const garden = await initModels().FieldLogEntry.findAll({
      where: { authorId: ids.owner, siteName: 'Ferncombe top garden' },
      order: [['id', 'ASC']],
    });
    ids.ownerEntryBefore = garden[0].id;
    ids.ownerEntryAfter = garden[1].id;
    ids.ownerReply = (
      await Reply.create({
        questionId: ids.otherQuestion,
        parentType: 'question',
        answerId: null,
        replyToId: null,
        authorId: ids.owner,
        body: 'A first reply.',
      })
    ).id;
    const ownerSite = await initModels().Site.create({
      publicId: OWNER_SITE,
      ownerId: ids.owner,
      name: 'The owner’s public site',
      visibility: 'public',
    });
    await initModels().SiteVersion.create({
      siteId: ownerSite.id,
      version: 1,
      survey: SITE_SURVEY,
      plan: {},
      engineVersion: 'test',
    });
    const failures: string[] = [];
    for (const h of handlers) {
      const action = API_ROUTES[h.key];
      if (!action || action === 'public' || action === 'session') continue;
      for (const persona of PERSONAS) {
        const sample = SAMPLES[h.key](ids);
        const routePath = h.key.split(' ')[1].replace(/\[(\w+)\]/g, (_, k: string) => sample.params?.[k] ?? 'x');
        const cookie = await cookieFor(persona);
        const req = new NextRequest(`http://localhost${sample.url ?? routePath}`, {
          method: h.method,
          headers: {
            'content-type': 'application/json',
            'x-forwarded-for': `10.7.${persona.length}.1`,
            ...(cookie ? { cookie } : {}),
          },
          body: h.method === 'GET' ? undefined : JSON.stringify(sample.body ?? {}),
        });
        const mod = (await import(h.file)) as Record<string, (r: Request, ctx: unknown) => Promise<Response>>;
        const res = await mod[h.method](req, { params: Promise.resolve(sample.params ?? {}) });
        const ok = allowed(action, persona, SELF_ONLY.has(h.key));
        const refused = res.status === 401 || res.status === 403;
        if (ok && refused) failures.push(`${h.key} as ${persona}: policy allows, got ${res.status}`);
        if (!ok && !refused) failures.push(`${h.key} as ${persona}: policy refuses, got ${res.status}`);
        if (!ok && persona === 'anonymous' && res.status !== 401)
          failures.push(`${h.key} as anonymous: expected 401, got ${res.status}`);
        if (!ok && persona !== 'anonymous' && res.status === 403) {
          const body = await res.json();
          if (!body.error?.message) failures.push(`${h.key} as ${persona}: 403 without a plain message`);
        }
      }
    }
    expect(failures).toEqual([]);
  }, 180_000);
});
