/**
 * The one permission table: every action × every role. Route handlers, pages and
 * the UI all ask `can()`; nothing else decides who may do what.
 *
 * A rule is true (allowed), false (refused) or 'own' (allowed on the actor's own
 * resource only, e.g. editing their own profile).
 */
export const ACTOR_ROLES = ['anonymous', 'member', 'expert', 'moderator', 'admin'] as const;
export type ActorRole = (typeof ACTOR_ROLES)[number];
type Rule = boolean | 'own';
type Row = Record<ActorRole, Rule>;

const row = (allowed: Partial<Record<ActorRole, Rule>>): Row => ({
  anonymous: false,
  member: false,
  expert: false,
  moderator: false,
  admin: false,
  ...allowed,
});
const signedIn = (rule: Rule = true) => row({ member: rule, expert: rule, moderator: rule, admin: rule });

export const POLICY = {
  /** read guides, questions, field logs; use every calculator */
  'content.read': row({ anonymous: true, member: true, expert: true, moderator: true, admin: true }),
  /** save a worked calculation */
  'calculation.save': signedIn(),
  /** record a safety check on a guide version: experts only */
  'safetyCheck.record': row({ expert: true }),
  /** ask for expert standing */
  'expertApplication.submit': row({ member: true }),
  /** see the pending applications, approve or decline them */
  'expertApplication.decide': row({ moderator: true, admin: true }),
  /** change any member's role */
  'user.changeRole': row({ admin: true }),
  /** edit display name, units and the like: one's own only */
  'profile.edit': signedIn('own'),
  /** one's own notices */
  'notice.read': signedIn('own'),
} as const satisfies Record<string, Row>;

export type Action = keyof typeof POLICY;
export const ACTIONS = Object.keys(POLICY) as Action[];

export interface Actor {
  id: number;
  role: Exclude<ActorRole, 'anonymous'>;
}

/** May this actor (null = signed out) take this action, on a resource owned by `ownerId` where that matters? */
export function can(actor: Actor | null, action: Action, ownerId?: number | null): boolean {
  const rule = POLICY[action][actor ? actor.role : 'anonymous'];
  if (rule === 'own') return actor !== null && ownerId !== undefined && ownerId !== null && ownerId === actor.id;
  return rule;
}

/** Plain words for a refusal, so a 403 says what would be needed. */
export const REFUSAL: Record<Action, string> = {
  'content.read': 'This is not available.',
  'calculation.save': 'Sign in to save a worked calculation.',
  'safetyCheck.record': 'Only experts can record a safety check.',
  'expertApplication.submit': 'Only members who are not yet experts can apply for expert standing.',
  'expertApplication.decide': 'Only moderators can decide expert applications.',
  'user.changeRole': 'Only admins can change roles.',
  'profile.edit': 'You can only change your own profile.',
  'notice.read': 'You can only read your own notices.',
};
