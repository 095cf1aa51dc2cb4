import { initModels } from '@/models';
import type { SafetyVerdict } from '@/models/SafetyCheck';

export interface SafetyCheckView {
  id: number;
  verdict: SafetyVerdict;
  notes: string | null;
  expert: { handle: string; displayName: string };
  checkedAt: string;
  /** Whether this check was made on the guide text as it is now. */
  current: boolean;
}

export type SafetyStatus =
  | { state: 'checked'; latest: SafetyCheckView }
  | { state: 'changed'; latest: SafetyCheckView }
  | { state: 'not checked' };

/** Every check on a guide, newest first, each marked current or not against the file's hash now. */
export async function listSafetyChecks(slug: string, currentHash: string): Promise<SafetyCheckView[]> {
  const { SafetyCheck, User } = initModels();
  const rows = await SafetyCheck.findAll({
    where: { guideSlug: slug },
    include: [{ model: User, as: 'expert', attributes: ['handle', 'displayName'] }],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return rows.map((r) => ({
    id: r.id,
    verdict: r.verdict,
    notes: r.notes,
    expert: { handle: r.expert?.handle ?? 'unknown', displayName: r.expert?.displayName ?? 'unknown' },
    checkedAt: r.createdAt.toISOString(),
    current: r.contentHash === currentHash,
  }));
}

/**
 * "checked" when the newest check was made on the current text; "changed" when the
 * guide has been edited since its newest check; "not checked" when it has none.
 */
export function safetyStatus(checks: SafetyCheckView[]): SafetyStatus {
  const latest = checks[0];
  if (!latest) return { state: 'not checked' };
  return latest.current ? { state: 'checked', latest } : { state: 'changed', latest };
}
