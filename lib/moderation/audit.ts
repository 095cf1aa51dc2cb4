import { Op, type Transaction, type WhereOptions } from 'sequelize';
import { initModels } from '@/models';

/** Writes one audit row inside the caller's transaction: the action and its record commit together or not at all. */
export async function recordAudit(
  entry: {
    actorId: number | null;
    action: string;
    targetType: string;
    targetId: string | number;
    reason: string;
    details?: Record<string, unknown>;
  },
  transaction: Transaction,
) {
  const { AuditEntry } = initModels();
  return AuditEntry.create(
    {
      actorId: entry.actorId,
      action: entry.action,
      targetType: entry.targetType,
      targetId: String(entry.targetId),
      reason: entry.reason,
      details: entry.details ?? null,
    },
    { transaction },
  );
}

export interface AuditFilter {
  action?: string;
  actor?: string;
  from?: string;
  to?: string;
  page?: number;
}

/** The audit log, newest first, filtered; 50 a page. */
export async function listAudit(f: AuditFilter) {
  const { AuditEntry, User } = initModels();
  const perPage = 50;
  const page = Math.max(1, f.page ?? 1);
  const where: WhereOptions = {};
  const and: WhereOptions[] = [];
  if (f.action) and.push({ action: f.action });
  if (f.from) and.push({ createdAt: { [Op.gte]: new Date(`${f.from}T00:00:00Z`) } });
  if (f.to) and.push({ createdAt: { [Op.lt]: new Date(new Date(`${f.to}T00:00:00Z`).getTime() + 86_400_000) } });
  if (f.actor) {
    const u = await User.findOne({ where: { handle: f.actor } });
    and.push({ actorId: u ? u.id : -1 });
  }
  if (and.length) Object.assign(where, { [Op.and]: and });
  const { rows, count } = await AuditEntry.findAndCountAll({
    where,
    include: [{ model: User, as: 'actor', attributes: ['handle', 'displayName'] }],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: perPage,
    offset: (page - 1) * perPage,
  });
  return {
    items: rows.map((r) => ({
      id: r.id,
      at: r.createdAt.toISOString(),
      actor: r.actor ? { handle: r.actor.handle, displayName: r.actor.displayName } : null,
      action: r.action,
      targetType: r.targetType,
      targetId: r.targetId,
      reason: r.reason,
      details: r.details,
    })),
    total: count,
    page,
    perPage,
  };
}
