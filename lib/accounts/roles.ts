import { recordAudit } from '@/lib/moderation/audit';
import { bumpSessionVersion } from '@/lib/auth/session-version';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import type { Role } from '@/models/User';
import { notifyExpertDecision } from '@/lib/mail/notify';
import type { ExpertApplicationInput } from '@/lib/validation/community';

/**
 * Expert applications and role changes. Each write is one transaction; the
 * applicant's e-mail is queued in the outbox inside it and sent after it commits,
 * so a mail failure delays the message, never undoes the decision.
 */

export type Failure = { ok: false; status: number; message: string; field?: string; code?: string };

export interface PendingApplicationView {
  id: number;
  pumpsBuilt: number;
  years: number;
  region: string;
  experience: string;
  links: string[];
  createdAt: string;
  applicant: { id: number; handle: string; displayName: string; role: Role };
}

/** A member's application; 409 while an earlier one still waits for a moderator. */
export async function submitExpertApplication(userId: number, input: ExpertApplicationInput) {
  const { User, ExpertApplication } = initModels();
  return getSequelize().transaction(async (transaction): Promise<{ ok: true; id: number } | Failure> => {
    // Locking the member's row makes two quick submissions queue, so only one can be pending.
    await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
    const pending = await ExpertApplication.findOne({
      where: { userId, status: 'pending' },
      transaction,
      attributes: ['id'],
    });
    if (pending) {
      return {
        ok: false,
        status: 409,
        message: 'You already have an application waiting for a moderator.',
        code: 'already_pending',
      };
    }
    const created = await ExpertApplication.create(
      { userId, ...input, status: 'pending', decidedBy: null, decisionNote: null, decidedAt: null },
      { transaction },
    );
    return { ok: true, id: created.id };
  });
}

/** The applications waiting for a decision, oldest first. */
export async function listPendingApplications(): Promise<PendingApplicationView[]> {
  const { User, ExpertApplication } = initModels();
  const rows = await ExpertApplication.findAll({
    where: { status: 'pending' },
    include: [{ model: User, as: 'applicant', attributes: ['id', 'handle', 'displayName', 'role'] }],
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map((r) => ({
    id: r.id,
    pumpsBuilt: r.pumpsBuilt,
    years: r.years,
    region: r.region,
    experience: r.experience,
    links: r.links,
    createdAt: r.createdAt.toISOString(),
    applicant: {
      id: r.userId,
      handle: r.applicant?.handle ?? 'unknown',
      displayName: r.applicant?.displayName ?? 'unknown',
      role: r.applicant?.role ?? 'member',
    },
  }));
}

/**
 * A moderator's decision: the application, the applicant's role (member → expert
 * on approval) and the applicant's notice change together or not at all.
 */
export async function decideExpertApplication(
  moderatorId: number,
  applicationId: number,
  decision: 'approve' | 'decline',
  note: string,
): Promise<{ ok: true; status: 'approved' | 'declined'; role: Role } | Failure> {
  const { User, ExpertApplication, Notice } = initModels();
  const approved = decision === 'approve';
  const result = await getSequelize().transaction(async (transaction) => {
    const application = await ExpertApplication.findByPk(applicationId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!application)
      return {
        ok: false,
        status: 404,
        message: 'There is no such expert application.',
        code: 'not_found',
      } satisfies Failure;
    if (application.userId === moderatorId) {
      return {
        ok: false,
        status: 403,
        message: 'You cannot decide your own expert application.',
        code: 'forbidden',
      } satisfies Failure;
    }
    if (application.status !== 'pending') {
      return {
        ok: false,
        status: 409,
        message: `This application was already ${application.status}.`,
        code: 'already_decided',
      } satisfies Failure;
    }
    const applicant = await User.findByPk(application.userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!applicant)
      return {
        ok: false,
        status: 404,
        message: 'The applicant no longer has an account.',
        code: 'not_found',
      } satisfies Failure;

    await application.update(
      { status: approved ? 'approved' : 'declined', decidedBy: moderatorId, decisionNote: note, decidedAt: new Date() },
      { transaction },
    );
    // A moderator or admin who applied keeps their standing; only a member becomes an expert.
    if (approved && applicant.role === 'member') await applicant.update({ role: 'expert' }, { transaction });
    await recordAudit(
      {
        actorId: moderatorId,
        action: approved ? 'expert-approve' : 'expert-decline',
        targetType: 'expert-application',
        targetId: application.id,
        reason: note,
        details: { applicantId: applicant.id },
      },
      transaction,
    );
    await Notice.create(
      {
        userId: applicant.id,
        kind: 'expert-decision',
        message: approved
          ? `Your expert application was approved. The moderator wrote: ${note}`
          : `Your expert application was declined this time. The moderator wrote: ${note}`,
        link: '/settings',
        readAt: null,
      },
      { transaction },
    );
    await notifyExpertDecision(transaction, {
      applicationId: application.id,
      applicantId: applicant.id,
      moderatorId,
      approved,
      note,
    });
    return { ok: true as const, role: applicant.role };
  });
  if (!result.ok) return result;

  return { ok: true, status: approved ? 'approved' : 'declined', role: result.role };
}

const ROLE_WORDS: Record<Role, string> = {
  member: 'a member',
  expert: 'an expert',
  moderator: 'a moderator',
  admin: 'an admin',
};

/** An admin sets another member's role; the member gets a notice saying so. */
export async function changeRole(
  adminId: number,
  userId: number,
  role: Role,
): Promise<{ ok: true; role: Role; changed: boolean } | Failure> {
  if (adminId === userId)
    return {
      ok: false,
      status: 403,
      message: 'You cannot change your own role; ask another admin.',
      code: 'forbidden',
    };
  const { User, Notice } = initModels();
  return getSequelize().transaction(async (transaction) => {
    const user = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user)
      return { ok: false, status: 404, message: 'There is no such member.', code: 'not_found' } satisfies Failure;
    if (user.role === role) return { ok: true as const, role, changed: false };
    const before = user.role;
    await user.update({ role }, { transaction });
    // a demoted moderator's open sessions end with the old powers
    await bumpSessionVersion(userId, transaction);
    await recordAudit(
      {
        actorId: adminId,
        action: 'role-change',
        targetType: 'member',
        targetId: userId,
        reason: `role changed from ${before} to ${role}`,
        details: { before, after: role },
      },
      transaction,
    );
    await Notice.create(
      {
        userId,
        kind: 'role-change',
        message: `An admin changed your role: you are now ${ROLE_WORDS[role]} on Clackwater.`,
        link: '/settings',
        readAt: null,
      },
      { transaction },
    );
    return { ok: true as const, role, changed: true };
  });
}

/** One page of members for the admin list, by handle. */
export async function listMembersPage(page: number, perPage = 50) {
  const { User } = initModels();
  const { rows, count } = await User.findAndCountAll({
    attributes: ['id', 'handle', 'displayName', 'role'],
    order: [['handle', 'ASC']],
    limit: perPage,
    offset: (page - 1) * perPage,
  });
  return {
    members: rows.map((u) => ({ id: u.id, handle: u.handle, displayName: u.displayName, role: u.role })),
    total: count,
    totalPages: Math.max(1, Math.ceil(count / perPage)),
  };
}

/** Whether this member has an application waiting. */
export async function hasPendingApplication(userId: number): Promise<boolean> {
  const { ExpertApplication } = initModels();
  return (await ExpertApplication.count({ where: { userId, status: 'pending' } })) > 0;
}
