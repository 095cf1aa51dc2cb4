import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { NextRequest } from 'next/server';
import { encode } from 'next-auth/jwt';
import { authSecret } from '@/lib/auth/secret';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';

// No SMTP server in the tests: record what would be sent.
const sent = vi.hoisted(() => ({ messages: [] as { to: string; subject: string; text: string }[], fail: false }));
vi.mock('@/lib/mail/transport', () => ({
  sendMail: vi.fn(async (m: { to: string; subject: string; text: string }) => {
    if (sent.fail) throw new Error('smtp down');
    sent.messages.push(m);
    return {};
  }),
  mailFrom: () => 'test@clackwater.example',
}));

import { GET as listApplications, POST as apply } from '@/app/api/expert-applications/route';
import { POST as decide } from '@/app/api/expert-applications/[id]/decision/route';
import { PUT as putRole } from '@/app/api/admin/users/[id]/role/route';
import { GET as getSettings, PUT as putSettings } from '@/app/api/account/settings/route';
import { GET as getChecks, POST as postCheck } from '@/app/api/guides/[slug]/safety-checks/route';

type Handle =
  | 'ferncombe_tamsin'
  | 'highcrag_shepherd'
  | 'sorrel_cabin'
  | 'ironwheel_builds'
  | 'quarry_lane_valves'
  | 'moss_moderator'
  | 'clack_admin';

async function userByHandle(handle: Handle) {
  const u = await initModels().User.findOne({ where: { handle } });
  if (!u) throw new Error(`seed has no ${handle}`);
  return u;
}

/** A next-auth session cookie for a seeded member, as the browser would send it. */
async function cookieFor(handle: Handle) {
  const user = await userByHandle(handle);
  const token = await encode({
    token: { uid: user.id, role: user.role, handle: user.handle, sv: user.sessionVersion },
    secret: authSecret(),
  });
  return `next-auth.session-token=${token}`;
}

async function call<P extends Record<string, string>>(
  handler: (req: NextRequest, ctx: { params: Promise<P> }) => Promise<Response>,
  method: string,
  path: string,
  opts: { as?: Handle; body?: unknown; params?: P } = {},
) {
  const headers: Record<string, string> = { 'content-type': 'application/json' };
  if (opts.as) headers.cookie = await cookieFor(opts.as);
  const req = new NextRequest(`http://localhost${path}`, {
    method,
    headers,
    body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
  });
  const res = await handler(req, { params: Promise.resolve(opts.params ?? ({} as P)) });
  return { status: res.status, body: await res.json(), res };
}

const application = {
  pumpsBuilt: 7,
  years: 4,
  region: 'Linnet valley',
  experience: 'Built and tuned seven ½-inch rams on spring-fed brooks; rebuilt two waste valves after frost.',
  links: ['http://localhost/questions/1'],
};

describe('expert applications', () => {
  beforeAll(freshDemoDatabase);
  beforeEach(() => {
    sent.messages.length = 0;
    sent.fail = false;
  });
  afterEach(() => vi.restoreAllMocks());

  it('refuses a signed-out visitor with 401 and an expert with 403', async () => {
    expect((await call(apply, 'POST', '/api/expert-applications', { body: application })).status).toBe(401);
    const expert = await call(apply, 'POST', '/api/expert-applications', { as: 'ironwheel_builds', body: application });
    expect(expert.status).toBe(403);
    expect(expert.body.error.message).toMatch(/not yet experts/);
  });

  it.each([
    [{ ...application, pumpsBuilt: 1.5 }, 'pumpsBuilt'],
    [{ ...application, years: 81 }, 'years'],
    [{ ...application, region: 'x' }, 'region'],
    [{ ...application, experience: 'too short' }, 'experience'],
    [{ ...application, links: ['javascript:alert(1)'] }, 'links.0'],
    [{ ...application, links: Array.from({ length: 11 }, (_, i) => `https://example.org/${i}`) }, 'links'],
  ])('answers a bad application with 400 naming the field (%#)', async (body, field) => {
    const res = await call(apply, 'POST', '/api/expert-applications', { as: 'ferncombe_tamsin', body });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe(field);
  });

  let applicationId = 0;

  it('lets a member apply, once while it is pending', async () => {
    const first = await call(apply, 'POST', '/api/expert-applications', { as: 'ferncombe_tamsin', body: application });
    expect(first.status).toBe(201);
    expect(first.body.status).toBe('pending');
    applicationId = first.body.id;
    const second = await call(apply, 'POST', '/api/expert-applications', { as: 'ferncombe_tamsin', body: application });
    expect(second.status).toBe(409);
  });

  it('shows moderators the pending list with the applicant, and nobody else', async () => {
    expect((await call(listApplications, 'GET', '/api/expert-applications', { as: 'ferncombe_tamsin' })).status).toBe(
      403,
    );
    const list = await call(listApplications, 'GET', '/api/expert-applications', { as: 'moss_moderator' });
    expect(list.status).toBe(200);
    expect(list.body.items).toHaveLength(1);
    expect(list.body.items[0].applicant).toMatchObject({
      handle: 'ferncombe_tamsin',
      displayName: 'Tamsin at Ferncombe',
    });
  });

  it('refuses a decision from a member or an expert', async () => {
    for (const as of ['highcrag_shepherd', 'ironwheel_builds'] as const) {
      const res = await call(decide, 'POST', `/api/expert-applications/${applicationId}/decision`, {
        as,
        body: { decision: 'approve', note: 'looks good' },
        params: { id: String(applicationId) },
      });
      expect(res.status).toBe(403);
      expect(res.body.error.message).toMatch(/moderators/);
    }
  });

  it('needs a note of at least 3 characters, and 404s an unknown application', async () => {
    const noNote = await call(decide, 'POST', `/api/expert-applications/${applicationId}/decision`, {
      as: 'moss_moderator',
      body: { decision: 'approve', note: 'ok' },
      params: { id: String(applicationId) },
    });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.field).toBe('note');
    const unknown = await call(decide, 'POST', '/api/expert-applications/999999/decision', {
      as: 'moss_moderator',
      body: { decision: 'approve', note: 'looks good' },
      params: { id: '999999' },
    });
    expect(unknown.status).toBe(404);
  });

  it('changes nothing when one part of the decision fails (one transaction)', async () => {
    const { Notice } = initModels();
    vi.spyOn(Notice, 'create').mockRejectedValueOnce(new Error('notice insert failed'));
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const res = await call(decide, 'POST', `/api/expert-applications/${applicationId}/decision`, {
      as: 'moss_moderator',
      body: { decision: 'approve', note: 'Good answers on frost.' },
      params: { id: String(applicationId) },
    });
    expect(res.status).toBe(500);
    const { ExpertApplication } = initModels();
    expect((await ExpertApplication.findByPk(applicationId))?.status).toBe('pending');
    expect((await userByHandle('ferncombe_tamsin')).role).toBe('member');
    expect(sent.messages).toHaveLength(0);
    expect(await initModels().MailMessage.count({ where: { kind: 'expert-decision' } })).toBe(0);
  });

  it('lets the moderator approve: expert role, a notice and an e-mail', async () => {
    const res = await call(decide, 'POST', `/api/expert-applications/${applicationId}/decision`, {
      as: 'moss_moderator',
      body: { decision: 'approve', note: 'Your answers on frost damage were spot on.' },
      params: { id: String(applicationId) },
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'approved', applicantRole: 'expert' });
    const tamsin = await userByHandle('ferncombe_tamsin');
    expect(tamsin.role).toBe('expert');
    const { ExpertApplication, Notice } = initModels();
    const moss = await userByHandle('moss_moderator');
    const decided = await ExpertApplication.findByPk(applicationId);
    expect(decided).toMatchObject({
      status: 'approved',
      decidedBy: moss.id,
      decisionNote: 'Your answers on frost damage were spot on.',
    });
    expect(decided?.decidedAt).toBeInstanceOf(Date);
    const notices = await Notice.findAll({ where: { userId: tamsin.id, kind: 'expert-decision' } });
    expect(notices).toHaveLength(1);
    expect(notices[0].message).toContain('frost damage');
    // the e-mail is queued in the outbox with the decision, and sent by the worker after it commits
    const mail = await initModels().MailMessage.findAll({ where: { userId: tamsin.id, kind: 'expert-decision' } });
    expect(mail).toHaveLength(1);
    expect(mail[0]).toMatchObject({
      toAddress: 'tamsin@ferncombe.example',
      subject: 'You are now an expert on Clackwater',
      status: 'pending',
    });
    expect(mail[0].textBody).toContain('Your answers on frost damage were spot on.');
  });

  it('answers 409 to a second decision on the same application', async () => {
    const again = await call(decide, 'POST', `/api/expert-applications/${applicationId}/decision`, {
      as: 'clack_admin',
      body: { decision: 'decline', note: 'changed my mind' },
      params: { id: String(applicationId) },
    });
    expect(again.status).toBe(409);
  });

  it('keeps a decline, its e-mail waiting in the outbox, when mail cannot be sent', async () => {
    const applied = await call(apply, 'POST', '/api/expert-applications', { as: 'sorrel_cabin', body: application });
    expect(applied.status).toBe(201);
    sent.fail = true;
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const res = await call(decide, 'POST', `/api/expert-applications/${applied.body.id}/decision`, {
      as: 'moss_moderator',
      body: { decision: 'decline', note: 'Come back with a build log or two.' },
      params: { id: String(applied.body.id) },
    });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('declined');
    expect((await userByHandle('sorrel_cabin')).role).toBe('member');
    const cabin = await userByHandle('sorrel_cabin');
    expect(
      await initModels().MailMessage.count({ where: { userId: cabin.id, kind: 'expert-decision', status: 'pending' } }),
    ).toBe(1);
  });

  it('does not let a moderator decide their own application', async () => {
    const { ExpertApplication } = initModels();
    const moss = await userByHandle('moss_moderator');
    // Policy refuses moderators an application of their own; one made before they became a moderator can exist.
    const own = await ExpertApplication.create({
      userId: moss.id,
      ...application,
      status: 'pending',
      decidedBy: null,
      decisionNote: null,
      decidedAt: null,
    });
    const res = await call(decide, 'POST', `/api/expert-applications/${own.id}/decision`, {
      as: 'moss_moderator',
      body: { decision: 'approve', note: 'yes please' },
      params: { id: String(own.id) },
    });
    expect(res.status).toBe(403);
    expect((await own.reload()).status).toBe('pending');
  });
});

describe('admin roles', () => {
  beforeAll(freshDemoDatabase);

  it('lets an admin change a role, with a notice to the member', async () => {
    const shepherd = await userByHandle('highcrag_shepherd');
    const res = await call(putRole, 'PUT', `/api/admin/users/${shepherd.id}/role`, {
      as: 'clack_admin',
      body: { role: 'moderator' },
      params: { id: String(shepherd.id) },
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ role: 'moderator', changed: true });
    expect((await shepherd.reload()).role).toBe('moderator');
    const notices = await initModels().Notice.findAll({ where: { userId: shepherd.id, kind: 'role-change' } });
    expect(notices).toHaveLength(1);
  });

  it('does not let an admin change their own role', async () => {
    const admin = await userByHandle('clack_admin');
    const res = await call(putRole, 'PUT', `/api/admin/users/${admin.id}/role`, {
      as: 'clack_admin',
      body: { role: 'member' },
      params: { id: String(admin.id) },
    });
    expect(res.status).toBe(403);
    expect((await admin.reload()).role).toBe('admin');
  });

  it('refuses non-admins, 404s unknown members and 400s unknown roles', async () => {
    const tamsin = await userByHandle('ferncombe_tamsin');
    for (const as of ['ferncombe_tamsin', 'ironwheel_builds', 'moss_moderator'] as const) {
      const res = await call(putRole, 'PUT', `/api/admin/users/${tamsin.id}/role`, {
        as,
        body: { role: 'admin' },
        params: { id: String(tamsin.id) },
      });
      expect(res.status).toBe(403);
      expect(res.body.error.message).toBe('Only admins can change roles.');
    }
    expect(
      (
        await call(putRole, 'PUT', `/api/admin/users/${tamsin.id}/role`, {
          body: { role: 'admin' },
          params: { id: String(tamsin.id) },
        })
      ).status,
    ).toBe(401);
    expect(
      (
        await call(putRole, 'PUT', '/api/admin/users/999999/role', {
          as: 'clack_admin',
          body: { role: 'expert' },
          params: { id: '999999' },
        })
      ).status,
    ).toBe(404);
    const bad = await call(putRole, 'PUT', `/api/admin/users/${tamsin.id}/role`, {
      as: 'clack_admin',
      body: { role: 'owner' },
      params: { id: String(tamsin.id) },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('role');
    expect((await tamsin.reload()).role).toBe('member');
  });
});

describe('account settings', () => {
  beforeAll(freshDemoDatabase);

  it('needs a session', async () => {
    expect((await call(getSettings, 'GET', '/api/account/settings')).status).toBe(401);
  });

  it('validates and names the field', async () => {
    const good = { displayName: 'Tamsin F.', region: 'Linnet valley', bio: 'Two rams on the brook.', units: 'metric' };
    for (const [body, field] of [
      [{ ...good, displayName: 'T' }, 'displayName'],
      [{ ...good, region: 'r'.repeat(81) }, 'region'],
      [{ ...good, bio: 'b'.repeat(2001) }, 'bio'],
      [{ ...good, units: 'imperial' }, 'units'],
    ] as const) {
      const res = await call(putSettings, 'PUT', '/api/account/settings', { as: 'ferncombe_tamsin', body });
      expect(res.status).toBe(400);
      expect(res.body.error.field).toBe(field);
    }
  });

  it('changes only the signed-in member, and sets the units cookie', async () => {
    const shepherd = await userByHandle('highcrag_shepherd');
    const before = shepherd.displayName;
    const res = await call(putSettings, 'PUT', '/api/account/settings', {
      as: 'ferncombe_tamsin',
      // an id or handle in the body is ignored: the session decides whose settings these are
      body: {
        id: shepherd.id,
        handle: 'highcrag_shepherd',
        displayName: 'Tamsin F.',
        region: '',
        bio: 'Two rams on the brook.',
        units: 'metric',
      },
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      handle: 'ferncombe_tamsin',
      displayName: 'Tamsin F.',
      region: '',
      units: 'metric',
    });
    expect(res.res.headers.get('set-cookie')).toMatch(/cw_units=metric/);
    const tamsin = await userByHandle('ferncombe_tamsin');
    expect(tamsin).toMatchObject({
      displayName: 'Tamsin F.',
      region: null,
      bio: 'Two rams on the brook.',
      units: 'metric',
    });
    expect((await shepherd.reload()).displayName).toBe(before);
    const mine = await call(getSettings, 'GET', '/api/account/settings', { as: 'ferncombe_tamsin' });
    expect(mine.body).toMatchObject({ displayName: 'Tamsin F.', units: 'metric' });
  });
});

describe('recording safety checks', () => {
  beforeAll(freshDemoDatabase);
  // No demo safety check on this guide (migrations/seed/demo-data.ts demoSafetyChecks).
  const unchecked = 'surveying-fall-and-flow';
  const path = `/api/guides/${unchecked}/safety-checks`;

  it('refuses visitors (401) and members (403)', async () => {
    expect(
      (await call(postCheck, 'POST', path, { body: { verdict: 'sound' }, params: { slug: unchecked } })).status,
    ).toBe(401);
    const member = await call(postCheck, 'POST', path, {
      as: 'ferncombe_tamsin',
      body: { verdict: 'sound' },
      params: { slug: unchecked },
    });
    expect(member.status).toBe(403);
    expect(member.body.error.message).toBe('Only experts can record a safety check.');
  });

  it('404s an unknown guide and 400s a bad verdict', async () => {
    const unknown = await call(postCheck, 'POST', '/api/guides/no-such-guide/safety-checks', {
      as: 'ironwheel_builds',
      body: { verdict: 'sound' },
      params: { slug: 'no-such-guide' },
    });
    expect(unknown.status).toBe(404);
    const bad = await call(postCheck, 'POST', path, {
      as: 'ironwheel_builds',
      body: { verdict: 'fine' },
      params: { slug: unchecked },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('verdict');
  });

  it('records an expert check against the hash the server reads, and GET then says checked', async () => {
    const before = await call(getChecks, 'GET', path, { params: { slug: unchecked } });
    expect(before.body.status.state).toBe('not checked');
    const res = await call(postCheck, 'POST', path, {
      as: 'ironwheel_builds',
      body: { verdict: 'sound', notes: 'Float and bucket method explained well.', hash: '0'.repeat(64) },
      params: { slug: unchecked },
    });
    expect(res.status).toBe(201);
    const after = await call(getChecks, 'GET', path, { params: { slug: unchecked } });
    expect(after.body.status.state).toBe('checked');
    expect(after.body.status.latest.expert.handle).toBe('ironwheel_builds');
    const stored = await initModels().SafetyCheck.findByPk(res.body.id);
    expect(stored?.contentHash).toBe(before.body.hash);
  });
});
