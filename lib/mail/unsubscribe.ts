import 'server-only';
import { createHmac, timingSafeEqual } from 'node:crypto';
import { authSecret } from '@/lib/auth/secret';
import { siteUrl } from '@/lib/site';
import { idParam } from '@/lib/http/guard';

/**
 * One-click unsubscribe links. A link names the member, what to stop and an HMAC of
 * both under the server's secret, so it works signed out and cannot be altered to
 * stop someone else's mail (or other mail of one's own).
 */
export const UNSUBSCRIBE_SCOPES = ['digest', 'answers', 'replies', 'fixed', 'moderation', 'expert', 'all'] as const;
export type UnsubscribeScope = (typeof UNSUBSCRIBE_SCOPES)[number];

export const SCOPE_WORDS: Record<UnsubscribeScope, string> = {
  digest: 'the digest',
  answers: 'e-mail about answers to your questions',
  replies: 'e-mail about replies to your posts',
  fixed: 'e-mail when your answer fixed it',
  moderation: 'e-mail about moderators’ actions on your posts',
  expert: 'e-mail about your expert application',
  all: 'every e-mail from Clackwater except sign-in links and password resets',
};

function signature(userId: number, scope: UnsubscribeScope): string {
  return createHmac('sha256', authSecret()).update(`clackwater-unsubscribe:${userId}:${scope}`).digest('base64url');
}

export function unsubscribeQuery(userId: number, scope: UnsubscribeScope): string {
  return new URLSearchParams({ u: String(userId), s: scope, t: signature(userId, scope) }).toString();
}

/** The page a reader opens from the message (it asks before it changes anything). */
export function unsubscribePageUrl(userId: number, scope: UnsubscribeScope): string {
  return `${siteUrl()}/unsubscribe?${unsubscribeQuery(userId, scope)}`;
}

/** The List-Unsubscribe and List-Unsubscribe-Post headers (RFC 2369, RFC 8058 one-click). */
export function unsubscribeHeaders(userId: number, scope: UnsubscribeScope): Record<string, string> {
  return {
    'List-Unsubscribe': `<${siteUrl()}/api/unsubscribe?${unsubscribeQuery(userId, scope)}>`,
    'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click',
  };
}

export type UnsubscribeCheck =
  { ok: true; userId: number; scope: UnsubscribeScope } | { ok: false; field: 'u' | 's' | 't'; message: string };

/** Checks a link's three parameters; any change to any of them is refused. */
export function verifyUnsubscribe(params: {
  u?: string | null;
  s?: string | null;
  t?: string | null;
}): UnsubscribeCheck {
  const userId = idParam(params.u ?? '');
  if (!userId)
    return {
      ok: false,
      field: 'u',
      message: 'This unsubscribe link is damaged: the member number is missing or wrong.',
    };
  const scope = params.s as UnsubscribeScope;
  if (!UNSUBSCRIBE_SCOPES.includes(scope))
    return {
      ok: false,
      field: 's',
      message: 'This unsubscribe link is damaged: it does not say which e-mail to stop.',
    };
  const given = Buffer.from(params.t ?? '');
  const expected = Buffer.from(signature(userId, scope));
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) {
    return {
      ok: false,
      field: 't',
      message:
        'This unsubscribe link does not check out: it may have been changed or cut short. Use the link from the e-mail as it came, or change your e-mail settings after signing in.',
    };
  }
  return { ok: true, userId, scope };
}

/** The user columns each scope switches off. */
export function columnsFor(scope: UnsubscribeScope) {
  const off = {
    digest: { digestFrequency: 'off' as const },
    answers: { notifyAnswers: false },
    replies: { notifyReplies: false },
    fixed: { notifyFixed: false },
    moderation: { notifyModeration: false },
    expert: { notifyExpert: false },
  };
  if (scope === 'all') return Object.assign({}, ...Object.values(off)) as Record<string, unknown>;
  return off[scope] as Record<string, unknown>;
}
