import { beforeAll, describe, expect, it } from 'vitest';
import { initModels } from '@/models';
import type { Role } from '@/lib/auth/policy';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { GET as reviewGET } from '@/app/api/review/route';
import { GET as suspensionsGET } from '@/app/api/review/suspensions/route';
import { POST as liftPOST } from '@/app/api/review/suspensions/[id]/lift/route';
import { POST as calcPOST } from '@/app/api/calculations/route';
import { POST as applyPOST, GET as applicationsGET } from '@/app/api/expert-applications/route';
import { POST as safetyPOST } from '@/app/api/guides/[slug]/safety-checks/route';
import { GET as settingsGET, PUT as settingsPUT } from '@/app/api/account/settings/route';
import { PUT as rolePUT } from '@/app/api/admin/users/[id]/role/route';
import { GET as auditGET } from '@/app/api/admin/audit/route';
import { GET as threadGET } from '@/app/api/questions/[id]/route';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.17.7');
const FAR = new Date('2099-01-31T23:59:59Z');
const calc = { tool: 'yield-estimate', inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' } };
const application = {
  pumpsBuilt: 3,
  years: 2,
  region: 'Linnet valley',
  experience: 'Three rams on a spring-fed brook, tuned by ear.',
  links: [],
};

async function account(handle: string, role: Role, suspendedUntil: Date | null = null) {
  return initModels().User.create({
    handle,
    displayName: handle,
    email: `${handle}@suspension.example`,
    role,
    region: null,
    bio: null,
    emailVerifiedAt: new Date('2025-01-01'),
    suspendedUntil,
    createdAt: new Date('2025-01-01'),
  });
}

async function answerBy(authorId: number) {
  const { Question, Answer } = initModels();
  const q = (await Question.findOne({ order: [['id', 'ASC']] }))!;
  return Answer.create({ questionId: q.id, authorId, body: 'Drain the pump body before the first frost.' });
}

describe('suspension removes every write and every moderation and admin power; reads remain (real MariaDB)', () => {
  beforeAll(async () => {
    await freshDemoDatabase();
    await account('susp_member', 'member', FAR);
    await account('susp_expert', 'expert', FAR);
    await account('susp_moderator', 'moderator', FAR);
    await account('susp_admin', 'admin', FAR);
  });

  it('a suspended member cannot save a calculation, apply for expert standing or change their settings, but still reads', async () => {
    for (const [res, what] of [
      [await call(calcPOST, 'POST', '/api/calculations', 'susp_member', calc), 'calculation'],
      [await call(applyPOST, 'POST', '/api/expert-applications', 'susp_member', application), 'application'],
      [
        await call(settingsPUT, 'PUT', '/api/account/settings', 'susp_member', {
          displayName: 'New name',
          region: '',
          bio: '',
          units: 'US',
        }),
        'settings',
      ],
    ] as const) {
      expect(res.status, what).toBe(403);
      expect(res.body.error.code, what).toBe('suspended');
    }
    const { WorkedCalculation, ExpertApplication, User } = initModels();
    const me = (await User.findOne({ where: { handle: 'susp_member' } }))!;
    expect(await WorkedCalculation.count({ where: { authorId: me.id } })).toBe(0);
    expect(await ExpertApplication.count({ where: { userId: me.id } })).toBe(0);
    expect((await call(settingsGET, 'GET', '/api/account/settings', 'susp_member')).status).toBe(200);
    const q = (await initModels().Question.findOne({ order: [['id', 'ASC']] }))!;
    expect(
      (await call(threadGET, 'GET', `/api/questions/${q.id}`, 'susp_member', undefined, { id: String(q.id) })).status,
    ).toBe(200);
  });

  it('a suspended expert cannot record a safety check', async () => {
    const res = await call(
      safetyPOST,
      'POST',
      '/api/guides/surveying-fall-and-flow/safety-checks',
      'susp_expert',
      { verdict: 'sound', notes: '' },
      { slug: 'surveying-fall-and-flow' },
    );
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('suspended');
  });

  it('a suspended moderator loses the review queue, its actions and expert decisions', async () => {
    const target = await answerBy((await initModels().User.findOne({ where: { handle: 'sorrel_cabin' } }))!.id);
    expect((await call(reviewGET, 'GET', '/api/review', 'susp_moderator')).status).toBe(403);
    expect((await call(applicationsGET, 'GET', '/api/expert-applications', 'susp_moderator')).status).toBe(403);
    const hide = await call(actionPOST, 'POST', '/api/review/actions', 'susp_moderator', {
      action: 'hide',
      postType: 'answer',
      postId: target.id,
      reason: 'still trying',
    });
    expect(hide.status).toBe(403);
    await target.reload();
    expect(target.hiddenAt).toBeNull();
  });

  it('a suspended admin loses roles and the audit log', async () => {
    const member = (await initModels().User.findOne({ where: { handle: 'highcrag_shepherd' } }))!;
    expect(
      (
        await call(
          rolePUT,
          'PUT',
          `/api/admin/users/${member.id}/role`,
          'susp_admin',
          { role: 'moderator' },
          { id: String(member.id) },
        )
      ).status,
    ).toBe(403);
    await member.reload();
    expect(member.role).toBe('member');
    expect((await call(auditGET, 'GET', '/api/admin/audit', 'susp_admin')).status).toBe(403);
  });
});

describe('rank: moderators act only on members and experts (real MariaDB)', () => {
  it('a moderator cannot suspend an admin or hide an admin’s post; an admin can suspend a moderator', async () => {
    const { User, Answer } = initModels();
    const admin = (await User.findOne({ where: { handle: 'clack_admin' } }))!;
    const post = await answerBy(admin.id);
    const suspend = await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
      action: 'suspend',
      postType: 'answer',
      postId: post.id,
      reason: 'rank test',
      until: '2099-01-31',
    });
    expect(suspend.status).toBe(403);
    expect((await admin.reload()).suspendedUntil).toBeNull();
    expect(
      (
        await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
          action: 'hide',
          postType: 'answer',
          postId: post.id,
          reason: 'rank test',
        })
      ).status,
    ).toBe(403);
    expect((await Answer.findByPk(post.id))!.hiddenAt).toBeNull();

    const mod = await account('rank_moderator', 'moderator');
    const modPost = await answerBy(mod.id);
    expect(
      (
        await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
          action: 'suspend',
          postType: 'answer',
          postId: modPost.id,
          reason: 'rank test',
          until: '2099-01-31',
        })
      ).status,
    ).toBe(403);
    expect(
      (
        await call(actionPOST, 'POST', '/api/review/actions', 'clack_admin', {
          action: 'suspend',
          postType: 'answer',
          postId: modPost.id,
          reason: 'rank test',
          until: '2099-01-31',
        })
      ).status,
    ).toBe(200);
    expect((await mod.reload()).suspendedUntil).not.toBeNull();
  });
});

describe('lift suspension: a reason, an audit row, a notice and an e-mail, all or nothing (real MariaDB)', () => {
  it('a moderator lifts a member’s suspension; the member writes again', async () => {
    const { User, AuditEntry, Notice, MailMessage } = initModels();
    const tamsin = (await User.findOne({ where: { handle: 'ferncombe_tamsin' } }))!;
    const post = await answerBy(tamsin.id);
    expect(
      (
        await call(actionPOST, 'POST', '/api/review/actions', 'moss_moderator', {
          action: 'suspend',
          postType: 'answer',
          postId: post.id,
          reason: 'rude replies',
          until: '2099-01-31',
        })
      ).status,
    ).toBe(200);
    expect((await call(calcPOST, 'POST', '/api/calculations', 'ferncombe_tamsin', calc)).status).toBe(403);

    const listed = await call(suspensionsGET, 'GET', '/api/review/suspensions', 'moss_moderator');
    expect(listed.status).toBe(200);
    expect(listed.body.items).toContainEqual(expect.objectContaining({ id: tamsin.id, reason: 'rude replies' }));

    const url = `/api/review/suspensions/${tamsin.id}/lift`;
    const params = { id: String(tamsin.id) };
    expect((await call(liftPOST, 'POST', url, 'moss_moderator', {}, params)).body.error.field).toBe('reason');
    expect(
      (await call(liftPOST, 'POST', url, 'highcrag_shepherd', { reason: 'not mine to lift' }, params)).status,
    ).toBe(403);
    expect((await tamsin.reload()).suspendedUntil).not.toBeNull();

    const lifted = await call(liftPOST, 'POST', url, 'moss_moderator', { reason: 'apologised in the thread' }, params);
    expect(lifted.status).toBe(200);
    expect((await tamsin.reload()).suspendedUntil).toBeNull();
    const audit = (await AuditEntry.findByPk(lifted.body.auditId))!;
    expect(audit).toMatchObject({
      action: 'lift-suspension',
      targetType: 'member',
      targetId: String(tamsin.id),
      reason: 'apologised in the thread',
    });
    const notice = await Notice.findOne({ where: { userId: tamsin.id, kind: 'moderation' }, order: [['id', 'DESC']] });
    expect(notice?.message).toMatch(/lifted the suspension.*apologised in the thread/);
    const mail = await MailMessage.findOne({ where: { dedupeKey: `moderation:${audit.id}:to:${tamsin.id}` } });
    expect(mail?.subject).toMatch(/lifted the suspension/);

    expect((await call(liftPOST, 'POST', url, 'moss_moderator', { reason: 'again' }, params)).status).toBe(409);
    expect((await call(calcPOST, 'POST', '/api/calculations', 'ferncombe_tamsin', calc)).status).toBe(201);
  });

  it('a moderator cannot lift an admin’s suspension, nor a suspended moderator anyone’s; another admin can', async () => {
    const { User } = initModels();
    const admin = (await User.findOne({ where: { handle: 'susp_admin' } }))!;
    expect(
      (
        await call(
          liftPOST,
          'POST',
          `/api/review/suspensions/${admin.id}/lift`,
          'moss_moderator',
          { reason: 'rank test' },
          { id: String(admin.id) },
        )
      ).status,
    ).toBe(403);
    const member = (await User.findOne({ where: { handle: 'susp_member' } }))!;
    expect(
      (
        await call(
          liftPOST,
          'POST',
          `/api/review/suspensions/${member.id}/lift`,
          'susp_moderator',
          { reason: 'lifting a friend' },
          { id: String(member.id) },
        )
      ).status,
    ).toBe(403);
    expect((await member.reload()).suspendedUntil).not.toBeNull();
    const self = (await User.findOne({ where: { handle: 'susp_moderator' } }))!;
    expect(
      (
        await call(
          liftPOST,
          'POST',
          `/api/review/suspensions/${self.id}/lift`,
          'susp_moderator',
          { reason: 'lifting myself' },
          { id: String(self.id) },
        )
      ).status,
    ).toBe(403);
    expect((await self.reload()).suspendedUntil).not.toBeNull();
    // another admin can
    expect(
      (
        await call(
          liftPOST,
          'POST',
          `/api/review/suspensions/${admin.id}/lift`,
          'clack_admin',
          { reason: 'settled between admins' },
          { id: String(admin.id) },
        )
      ).status,
    ).toBe(200);
    expect((await admin.reload()).suspendedUntil).toBeNull();
  });
});
