import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { encode } from 'next-auth/jwt';
import { API_ROUTES } from '@/lib/auth/routes';
import { POLICY, type Action } from '@/lib/auth/policy';
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
    for (const m of METHODS) if (typeof mod[m] === 'function') out.push({ key: `${m} ${route}`, file: f.file, method: m });
  }
  return out;
}

type Persona = 'anonymous' | 'member' | 'owner' | 'expert' | 'moderator' | 'admin';
const PERSONA_HANDLE: Record<Exclude<Persona, 'anonymous'>, string> = {
  member: 'highcrag_shepherd',
  owner: 'ferncombe_tamsin',
  expert: 'ironwheel_builds',
  moderator: 'moss_moderator',
  admin: 'clack_admin',
};

/**
 * A request each protected route accepts when the caller is allowed: the matrix
 * checks that callers the policy refuses get 401/403 and allowed ones do not.
 * `params` fills the dynamic segments; `owner` marks the persona that owns the resource.
 */
type Sample = { params?: Record<string, string>; body?: unknown; url?: string };
const SAMPLES: Record<string, (ids: Record<string, number>) => Sample> = {
  'POST /api/calculations': () => ({ body: { tool: 'yield-estimate', inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' } } }),
  'POST /api/guides/[slug]/safety-checks': () => ({ params: { slug: 'surveying-fall-and-flow' }, body: { verdict: 'sound', notes: '' } }),
  'GET /api/expert-applications': () => ({}),
  'POST /api/expert-applications': () => ({ body: { pumpsBuilt: 3, years: 2, region: 'Linnet valley', experience: 'Three rams on a spring-fed brook, tuned by ear.', links: [] } }),
  'POST /api/expert-applications/[id]/decision': () => ({ params: { id: '999999' }, body: { decision: 'approve', note: 'looks good' } }),
  'PUT /api/admin/users/[id]/role': (ids) => ({ params: { id: String(ids.member) }, body: { role: 'member' } }),
  'GET /api/account/settings': () => ({}),
  'PUT /api/account/settings': () => ({ body: { displayName: 'Same Name', region: '', bio: '', units: 'US' } }),
  // multipart cannot be sent as JSON: an allowed caller gets 400 for the JSON body, never 401/403
  'POST /api/photos': () => ({ body: {} }),
  'POST /api/questions': () => ({
    body: { title: 'Waste valve sticks open after rain', body: 'Since the brook rose the valve hangs open and the pump will not restart.', tags: ['stall'] },
  }),
  'PUT /api/questions/[id]': (ids) => ({
    params: { id: String(ids.ownerQuestion) },
    body: { title: 'Half-inch pump beats for a minute, then stops', body: 'Edited: the drive pipe is 12 ft of 3/4 inch PVC on 4 ft of fall.', tags: ['stall'] },
  }),
  'POST /api/questions/[id]/answers': (ids) => ({ params: { id: String(ids.otherQuestion) }, body: { body: 'Drain the drive pipe and the pump body before the first frost.' } }),
  'POST /api/questions/[id]/replies': (ids) => ({ params: { id: String(ids.otherQuestion) }, body: { body: 'Same here on our creek.' } }),
  'PUT /api/questions/[id]/fixed': (ids) => ({ params: { id: String(ids.ownerQuestion) }, body: { answerId: null } }),
  'POST /api/questions/[id]/follow': (ids) => ({ params: { id: String(ids.otherQuestion) } }),
  'DELETE /api/questions/[id]/follow': (ids) => ({ params: { id: String(ids.otherQuestion) } }),
  'PUT /api/answers/[id]': (ids) => ({ params: { id: String(ids.ownerAnswer) }, body: { body: 'We run two side by side at Ferncombe; size the line for both.' } }),
  'PUT /api/replies/[id]': (ids) => ({ params: { id: String(ids.ownerReply) }, body: { body: 'Thanks, that did it.' } }),
  'POST /api/helpful': (ids) => ({ body: { postType: 'question', postId: ids.otherQuestion } }),
  'DELETE /api/helpful': (ids) => ({ body: { postType: 'question', postId: ids.otherQuestion } }),
  'POST /api/flags': (ids) => ({ body: { postType: 'answer', postId: ids.flagTarget, reason: 'spam' } }),
  'GET /api/review': () => ({}),
  'POST /api/review/actions': (ids) => ({ body: { action: 'warn', postType: 'answer', postId: ids.ownerAnswer, reason: 'checking the matrix' } }),
  'GET /api/admin/audit': () => ({}),
  // no failed message 999999: an allowed caller gets 404, never 401/403
  'POST /api/admin/outbox/[id]/retry': () => ({ params: { id: '999999' } }),
  'GET /api/account/mail': () => ({}),
  'PUT /api/account/mail': () => ({ body: { digest: 'weekly', tags: ['tuning'], notify: { answers: true, replies: true, fixed: true, moderation: true, expert: true } } }),
  'POST /api/field-log': () => ({
    body: {
      siteName: 'Matrix test spring', testedOn: '2026-06-01', pumpSize: '1', fall: '2 m', lift: '10 m', driveLength: '12 m', driveSize: '1',
      driveMaterial: 'pvc', driveFlow: '20 L/min', driveFlowMethod: 'measured', trials: [{ volume: '2 L', seconds: 40 }],
    },
  }),
  'POST /api/field-log/[id]/link': (ids) => ({ params: { id: String(ids.ownerEntryAfter) }, body: { beforeId: ids.ownerEntryBefore, whatChanged: 'outlet moved higher' } }),
  // a header with no rows: an allowed caller gets 422 for the empty file, never 401/403
  'POST /api/field-log/import': () => ({ body: { csv: 'site_name,tested_on\r\n' } }),
};

/** Routes that only ever act on the caller's own account: every signed-in persona is the owner. */
const SELF_ONLY = new Set(['GET /api/account/settings', 'PUT /api/account/settings', 'GET /api/account/mail', 'PUT /api/account/mail']);

async function cookieFor(persona: Persona): Promise<string | undefined> {
  if (persona === 'anonymous') return undefined;
  const { User } = initModels();
  const u = (await User.findOne({ where: { handle: PERSONA_HANDLE[persona] } }))!;
  const token = await encode({ token: { uid: u.id, role: u.role, handle: u.handle }, secret: authSecret() });
  return `next-auth.session-token=${token}`;
}

function allowed(action: Action, persona: Persona, selfOnly: boolean): boolean {
  const roleOf: Record<Persona, keyof (typeof POLICY)[Action]> = {
    anonymous: 'anonymous', member: 'member', owner: 'member', expert: 'expert', moderator: 'moderator', admin: 'admin',
  };
  const rule = POLICY[action][roleOf[persona]];
  // 'own' rules: the samples act on the owner's own resource
  return rule === 'own' ? persona === 'owner' || (selfOnly && persona !== 'anonymous') : rule;
}

describe('permission matrix: every API route × every persona, against the policy table', () => {
  let handlers: Awaited<ReturnType<typeof discoverHandlers>>;
  beforeAll(async () => {
    await freshDemoDatabase();
    handlers = await discoverHandlers();
  });

  it('finds the route handlers, and every one has an entry in lib/auth/routes.ts', () => {
    expect(handlers.length).toBeGreaterThan(8);
    const missing = handlers.map((h) => h.key).filter((k) => !(k in API_ROUTES));
    expect(missing, 'add these to API_ROUTES with the policy action they check').toEqual([]);
    const stale = Object.keys(API_ROUTES).filter((k) => !handlers.some((h) => h.key === k));
    expect(stale, 'API_ROUTES names handlers that no longer exist').toEqual([]);
  });

  it('has a sample request for every protected route', () => {
    const protectedRoutes = Object.entries(API_ROUTES).filter(([, a]) => a !== 'public' && a !== 'session').map(([k]) => k);
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
    const garden = await initModels().FieldLogEntry.findAll({ where: { authorId: ids.owner, siteName: 'Ferncombe top garden' }, order: [['id', 'ASC']] });
    ids.ownerEntryBefore = garden[0].id;
    ids.ownerEntryAfter = garden[1].id;
    ids.ownerReply = (await Reply.create({ questionId: ids.otherQuestion, parentType: 'question', answerId: null, replyToId: null, authorId: ids.owner, body: 'A first reply.' })).id;
    const failures: string[] = [];
    for (const h of handlers) {
      const action = API_ROUTES[h.key];
      if (!action || action === 'public' || action === 'session') continue;
      for (const persona of ['anonymous', 'member', 'owner', 'expert', 'moderator', 'admin'] as Persona[]) {
        const sample = SAMPLES[h.key](ids);
        const routePath = h.key.split(' ')[1].replace(/\[(\w+)\]/g, (_, k: string) => sample.params?.[k] ?? 'x');
        const cookie = await cookieFor(persona);
        const req = new NextRequest(`http://localhost${sample.url ?? routePath}`, {
          method: h.method,
          headers: { 'content-type': 'application/json', 'x-forwarded-for': `10.7.${persona.length}.1`, ...(cookie ? { cookie } : {}) },
          body: h.method === 'GET' ? undefined : JSON.stringify(sample.body ?? {}),
        });
        const mod = (await import(h.file)) as Record<string, (r: Request, ctx: unknown) => Promise<Response>>;
        const res = await mod[h.method](req, { params: Promise.resolve(sample.params ?? {}) });
        const ok = allowed(action, persona, SELF_ONLY.has(h.key));
        const refused = res.status === 401 || res.status === 403;
        if (ok && refused) failures.push(`${h.key} as ${persona}: policy allows, got ${res.status}`);
        if (!ok && !refused) failures.push(`${h.key} as ${persona}: policy refuses, got ${res.status}`);
        if (!ok && persona === 'anonymous' && res.status !== 401) failures.push(`${h.key} as anonymous: expected 401, got ${res.status}`);
        if (!ok && persona !== 'anonymous' && res.status === 403) {
          const body = await res.json();
          if (!body.error?.message) failures.push(`${h.key} as ${persona}: 403 without a plain message`);
        }
      }
    }
    expect(failures).toEqual([]);
  }, 120_000);
});
