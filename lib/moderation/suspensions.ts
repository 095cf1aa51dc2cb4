import { Op } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { ForumError } from '@/lib/questions/errors';
import type { SessionUser } from '@/lib/auth/session';
import { notifyModeration } from '@/lib/mail/notify';
import { recordAudit } from './audit';
import { checkRank } from './actions';

const LIFTED = 'A moderator lifted the suspension of your account';

/**
 * Ends a member's suspension now. Like every moderation action it needs a reason,
 * respects rank (a moderator lifts only a member's or an expert's suspension), and
 * commits with its audit row, the member's notice and the queued e-mail, or not at all.
 */
export async function liftSuspension(moderator: SessionUser, userId: number, reason: string) {
  const { User, Notice } = initModels();
  return getSequelize().transaction(async (transaction) => {
    const member = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!member) throw new ForumError(404, 'There is no such member.', 'id');
    if (member.id === moderator.id) throw new ForumError(403, 'Moderators cannot lift their own suspension.');
    checkRank(moderator, member.role);
    const until = member.suspendedUntil;
    if (!until || until.getTime() <= Date.now()) throw new ForumError(409, 'This member is not suspended.', 'id');
    await member.update({ suspendedUntil: null }, { transaction });
    const audit = await recordAudit(
      {
        actorId: moderator.id,
        action: 'lift-suspension',
        targetType: 'member',
        targetId: member.id,
        reason,
        details: { until: until.toISOString() },
      },
      transaction,
    );
    await Notice.create(
      { userId: member.id, kind: 'moderation', message: `${LIFTED}. Reason: ${reason}`, link: null, readAt: null },
      { transaction },
    );
    await notifyModeration(transaction, {
      auditId: audit.id,
      authorId: member.id,
      moderatorId: moderator.id,
      words: LIFTED,
      reason,
      questionId: null,
      postLabel: 'your account',
    });
    return { auditId: audit.id, id: member.id };
  });
}

export interface SuspendedMember {
  id: number;
  handle: string;
  displayName: string;
  role: string;
  until: string;
  reason: string | null;
}

/** Accounts suspended now, soonest end first, each with the reason of its latest suspension. */
export async function listSuspended(): Promise<SuspendedMember[]> {
  const { User, AuditEntry } = initModels();
  const users = await User.findAll({
    where: { suspendedUntil: { [Op.gt]: new Date() } },
    attributes: ['id', 'handle', 'displayName', 'role', 'suspendedUntil'],
    order: [['suspendedUntil', 'ASC']],
    limit: 200,
  });
  const out: SuspendedMember[] = [];
  for (const u of users) {
    const last = await AuditEntry.findOne({
      where: { action: 'suspend', targetType: 'member', targetId: String(u.id) },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
    });
    out.push({
      id: u.id,
      handle: u.handle,
      displayName: u.displayName,
      role: u.role,
      until: u.suspendedUntil!.toISOString(),
      reason: last?.reason ?? null,
    });
  }
  return out;
}
