import matter from 'gray-matter';
import { initModels } from '@/models';
import { isDatabaseUnavailable } from '@/lib/db/errors';
import { isoDay } from '@/lib/dates';
import type { SafetyVerdict } from '@/models/SafetyCheck';
import { stripEditorComments } from './content';

export interface SafetyCheckView {
  id: number;
  verdict: SafetyVerdict;
  notes: string | null;
  expert: { handle: string; displayName: string };
  checkedAt: string;
  /** Whether this check was made on the guide text as it is now. */
  current: boolean;
  /** The "updated" day the checked version carried, when its text was kept. */
  checkedVersionUpdated: string | null;
  /** Whether the checked text was kept, so the changes since can be shown. */
  hasText: boolean;
}

/**
 * The four things a reader needs to tell apart: the newest check on this very text said
 * sound ("checked") or asked for changes ("needs changes"); the text changed after its
 * newest check ("changed"), whatever that check said; or nobody has checked it.
 */
export type SafetyState = 'checked' | 'needs changes' | 'changed' | 'not checked';

export type SafetyStatus =
  { state: 'checked' | 'needs changes' | 'changed'; latest: SafetyCheckView } | { state: 'not checked' };

/** The state from the newest check alone: pure, so the list and the guide page agree. */
export function safetyState(latest: { verdict: SafetyVerdict; current: boolean } | undefined): SafetyState {
  if (!latest) return 'not checked';
  if (!latest.current) return 'changed';
  return latest.verdict === 'sound' ? 'checked' : 'needs changes';
}

const newestFirst: [string, string][] = [
  ['createdAt', 'DESC'],
  ['id', 'DESC'],
];

/** The frontmatter's "updated" day of a kept guide file, or null when it has none that reads. */
function updatedOf(text: string | null): string | null {
  if (!text) return null;
  try {
    const u = (matter(text).data as { updated?: unknown }).updated;
    if (u instanceof Date) return isoDay(u);
    return typeof u === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(u) ? u : null;
  } catch {
    return null;
  }
}

/** Every check on a guide, newest first, each marked current or not against the file's hash now. */
export async function listSafetyChecks(slug: string, currentHash: string): Promise<SafetyCheckView[]> {
  const { SafetyCheck, User } = initModels();
  const rows = await SafetyCheck.findAll({
    where: { guideSlug: slug },
    include: [{ model: User, as: 'expert', attributes: ['handle', 'displayName'] }],
    order: newestFirst,
  });
  return rows.map((r) => ({
    id: r.id,
    verdict: r.verdict,
    notes: r.notes,
    expert: { handle: r.expert?.handle ?? 'unknown', displayName: r.expert?.displayName ?? 'unknown' },
    checkedAt: r.createdAt.toISOString(),
    current: r.contentHash === currentHash,
    checkedVersionUpdated: updatedOf(r.checkedText),
    hasText: r.checkedText !== null,
  }));
}

/** The guide's status from its checks, newest first (as listSafetyChecks gives them). */
export function safetyStatus(checks: SafetyCheckView[]): SafetyStatus {
  const latest = checks[0];
  const state = safetyState(latest);
  return state === 'not checked' || !latest ? { state: 'not checked' } : { state, latest };
}

/** Each guide's state for the guide list, from one query over every check. */
export async function safetyStates(guides: { slug: string; hash: string }[]): Promise<Record<string, SafetyState>> {
  const { SafetyCheck } = initModels();
  const rows = await SafetyCheck.findAll({
    attributes: ['id', 'guideSlug', 'contentHash', 'verdict', 'createdAt'],
    where: { guideSlug: guides.map((g) => g.slug) },
    order: newestFirst,
  });
  const out: Record<string, SafetyState> = {};
  for (const g of guides) {
    const latest = rows.find((r) => r.guideSlug === g.slug);
    out[g.slug] = safetyState(latest && { verdict: latest.verdict, current: latest.contentHash === g.hash });
  }
  return out;
}

/**
 * The guide list's states, or null while the database is down: the guides are files and
 * stay readable without it, so the list shows them and says the checks are out of reach.
 */
export async function safetyStatesIfReachable(
  guides: { slug: string; hash: string }[],
): Promise<Record<string, SafetyState> | null> {
  try {
    return await safetyStates(guides);
  } catch (err) {
    if (isDatabaseUnavailable(err)) return null;
    throw err;
  }
}

export interface CheckedVersion {
  check: SafetyCheckView;
  /** The guide's body as the expert read it and as it reads now, without frontmatter or editors' comments. */
  before: string;
  after: string;
}

/**
 * One check (the newest when no id is given) with the text it was made on beside the text
 * now, for the changes page; null when there is no such check or its text was not kept.
 */
export async function checkedVersion(
  guide: { slug: string; hash: string; raw: string },
  checkId?: number,
): Promise<CheckedVersion | null> {
  const checks = await listSafetyChecks(guide.slug, guide.hash);
  const check = checkId === undefined ? checks[0] : checks.find((c) => c.id === checkId);
  if (!check || !check.hasText) return null;
  const { SafetyCheck } = initModels();
  const row = await SafetyCheck.findByPk(check.id, { attributes: ['id', 'checkedText'] });
  if (!row?.checkedText) return null;
  const body = (text: string) => stripEditorComments(matter(text).content).trim();
  return { check, before: body(row.checkedText), after: body(guide.raw) };
}
