/**
 * The one permission table: every action × every role. Route handlers, pages and
 * the UI all ask `can()`; nothing else decides who may do what.
 *
 * A rule is true (allowed), false (refused) or 'own' (allowed on the actor's own
 * resource only, e.g. editing their own profile).
 *
 * Each row also says whether a suspended account keeps it. Only `read()` rows do:
 * a new action is refused to suspended accounts unless its row says otherwise, so
 * a forgotten entry in some list of writes cannot let one through.
 */
export const ACTOR_ROLES = ['anonymous', 'member', 'expert', 'moderator', 'admin'] as const;
export type ActorRole = (typeof ACTOR_ROLES)[number];
type Rule = boolean | 'own';
type Row = Record<ActorRole, Rule> & { keptWhenSuspended: boolean };

const row = (allowed: Partial<Record<ActorRole, Rule>>): Row => ({
  anonymous: false,
  member: false,
  expert: false,
  moderator: false,
  admin: false,
  ...allowed,
  keptWhenSuspended: false,
});
/** A read that changes nothing: a suspended account keeps it. */
const read = (r: Row): Row => ({ ...r, keptWhenSuspended: true });
const signedIn = (rule: Rule = true) => row({ member: rule, expert: rule, moderator: rule, admin: rule });

export const POLICY = {
  /** read guides, questions, field logs; use every calculator */
  'content.read': read(row({ anonymous: true, member: true, expert: true, moderator: true, admin: true })),
  /** save a worked calculation */
  'calculation.save': signedIn(),
  /** save a planned site (one's installation) */
  'site.save': signedIn(),
  /** change one's own site: a new survey version, its name, who may see it; attach a question or test to it */
  'site.edit': signedIn('own'),
  /** see a private site: its owner only */
  'site.readPrivate': read(signedIn('own')),
  /** see a site shared by link or made public: anyone */
  'site.readShared': read(row({ anonymous: true, member: true, expert: true, moderator: true, admin: true })),
  /** record a safety check on a guide version: experts only */
  'safetyCheck.record': row({ expert: true }),
  /** ask for expert standing */
  'expertApplication.submit': row({ member: true }),
  /** see the pending applications, approve or decline them */
  'expertApplication.decide': row({ moderator: true, admin: true }),
  /** change any member's role */
  'user.changeRole': row({ admin: true }),
  /** see one's own settings (profile, units, e-mail choices) */
  'profile.read': read(signedIn('own')),
  /** edit display name, units, e-mail choices and the like: one's own only */
  'profile.edit': signedIn('own'),
  /** save one's unit system (the header's switch): a display choice that publishes nothing, so suspended members keep it */
  'profile.units': { ...signedIn('own'), keptWhenSuspended: true },
  /** end every session of one's own account ("sign out everywhere"): it only takes power away, so suspended members keep it */
  'session.revokeAll': { ...signedIn(), keptWhenSuspended: true },
  /** one's own notices */
  'notice.read': read(signedIn('own')),
  /** ask a question (with a site sheet and photos) */
  'question.ask': signedIn(),
  /** edit a question: the asker's own */
  'question.edit': signedIn('own'),
  /** answer a question, optionally with a worked calculation */
  'answer.post': signedIn(),
  /** edit an answer: the author's own */
  'answer.edit': signedIn('own'),
  /** reply under a question or an answer */
  'reply.post': signedIn(),
  /** edit a reply: the author's own */
  'reply.edit': signedIn('own'),
  /** mark someone else's post helpful (never one's own: checked where the post is known) */
  'post.markHelpful': signedIn(),
  /** choose the answer that fixed it: the asker only */
  'question.markFixed': signedIn('own'),
  /** follow a question */
  'question.follow': signedIn(),
  /** upload a photo for a question or an answer */
  'photo.upload': signedIn(),
  /** flag a post for the review queue */
  'post.flag': signedIn(),
  /**
   * ask the moderators to look again at a decision on one's own post (the author is
   * checked per post); a suspended member keeps it, as the decision may be the mistake
   */
  'moderation.appeal': { ...signedIn('own'), keptWhenSuspended: true },
  /**
   * the review queue and its actions on members' and experts' posts and accounts
   * (never on one's own posts or flags: checked per post); lifting a suspension
   */
  'moderation.act': row({ moderator: true, admin: true }),
  /** the same actions on a moderator's post or account: admins only */
  'moderation.actOnModerator': row({ admin: true }),
  /** the same actions on an admin's post or account: another admin only (who could change their role anyway; never on oneself, checked per post) */
  'moderation.actOnAdmin': row({ admin: true }),
  /** an "unsafe advice" flag that hides a member's post pending review at once */
  'flag.hideUnsafeAtOnce': row({ expert: true }),
  /** the author's posts stay up however many members flag them, waiting in the queue for a moderator */
  'post.staysUpUnderMemberFlags': row({ expert: true, moderator: true, admin: true }),
  /** the author's posts stay up even under an expert's unsafe-advice flag (experts check each other; moderators are checked by admins) */
  'post.staysUpUnderExpertFlag': row({ moderator: true, admin: true }),
  /** the digest's sections for those who answer: questions still waiting in one's tags, guides whose safety check is stale */
  'digest.expertSections': read(row({ expert: true, moderator: true, admin: true })),
  /** read the audit log */
  'audit.read': row({ admin: true }),
  /** see the e-mail outbox (failed messages with their SMTP error) and send a failed one again */
  'mail.outbox': row({ admin: true }),
  /** see hidden and deleted posts */
  'moderation.seeHidden': row({ moderator: true, admin: true }),
  /** record a field log entry (one test of an installation) */
  'fieldLog.create': signedIn(),
  /** link one's own entry as the after of an earlier one on the same site */
  'fieldLog.edit': signedIn('own'),
  /** import field log entries from CSV, as one's own */
  'fieldLog.import': signedIn(),
} as const satisfies Record<string, Row>;

export type Action = keyof typeof POLICY;
export const ACTIONS = Object.keys(POLICY) as Action[];

export type Role = Exclude<ActorRole, 'anonymous'>;

export interface Actor {
  id: number;
  role: Role;
  /** a suspended account keeps only the rows marked as reads (unknown in the browser's session: the server decides) */
  suspendedUntil?: Date | null;
}

const ROLES: readonly Role[] = ['member', 'expert', 'moderator', 'admin'];

/**
 * The actor a browser's session names, for `can()` in client components (which links
 * to show). The session knows no suspension; the server refuses what it takes away.
 */
export function sessionActor(user: { id?: unknown; role?: unknown } | null | undefined): Actor | null {
  const id = Number(user?.id);
  const role = ROLES.find((r) => r === user?.role);
  return Number.isInteger(id) && id > 0 && role ? { id, role } : null;
}

export function isSuspended(actor: Actor | null, now = Date.now()): boolean {
  return !!actor?.suspendedUntil && actor.suspendedUntil.getTime() > now;
}

/** Whether the policy leaves this action open to the actor's role at all ('own' rules pass here and are checked once the owner is known). */
export function roleMayTry(actor: Actor | null, action: Action): boolean {
  return POLICY[action][actor ? actor.role : 'anonymous'] !== false;
}

/** Refused only because the account is suspended: the role would allow it. */
export function refusedBySuspension(actor: Actor | null, action: Action): boolean {
  return roleMayTry(actor, action) && !POLICY[action].keptWhenSuspended && isSuspended(actor);
}

/** May this actor try this action, leaving an 'own' rule for the work to check against the resource? */
export function mayTry(actor: Actor | null, action: Action): boolean {
  return roleMayTry(actor, action) && !refusedBySuspension(actor, action);
}

/** May this actor (null = signed out) take this action, on a resource owned by `ownerId` where that matters? */
export function can(actor: Actor | null, action: Action, ownerId?: number | null): boolean {
  if (!mayTry(actor, action)) return false;
  const rule = POLICY[action][actor ? actor.role : 'anonymous'];
  if (rule === 'own') return actor !== null && ownerId !== undefined && ownerId !== null && ownerId === actor.id;
  return rule;
}

/** The action that moderating a post or account of this role needs: rank decides, through the rows above. */
export const MODERATING: Record<Role, Action> = {
  member: 'moderation.act',
  expert: 'moderation.act',
  moderator: 'moderation.actOnModerator',
  admin: 'moderation.actOnAdmin',
};

/** Plain words for a refusal, so a 403 says what would be needed. */
export const REFUSAL: Record<Action, string> = {
  'content.read': 'This is not available.',
  'calculation.save': 'Sign in to save a worked calculation.',
  'site.save': 'Sign in to save a site.',
  'site.edit': 'Only its owner can change this site.',
  'site.readPrivate': 'This site is private.',
  'site.readShared': 'This is not available.',
  'safetyCheck.record': 'Only experts can record a safety check.',
  'expertApplication.submit': 'Only members who are not yet experts can apply for expert standing.',
  'expertApplication.decide': 'Only moderators can decide expert applications.',
  'user.changeRole': 'Only admins can change roles.',
  'profile.read': 'You can only see your own settings.',
  'profile.edit': 'You can only change your own profile.',
  'profile.units': 'Sign in to save your units on your account.',
  'session.revokeAll': 'Sign in to sign out everywhere.',
  'notice.read': 'You can only read your own notices.',
  'question.ask': 'Sign in to ask a question.',
  'question.edit': 'Only the asker can edit this question.',
  'answer.post': 'Sign in to answer.',
  'answer.edit': 'Only its author can edit this answer.',
  'reply.post': 'Sign in to reply.',
  'reply.edit': 'Only its author can edit this reply.',
  'post.markHelpful': 'Sign in to mark a post helpful.',
  'question.markFixed': 'Only the asker can choose the answer that fixed it.',
  'question.follow': 'Sign in to follow a question.',
  'photo.upload': 'Sign in to add photos.',
  'post.flag': 'Sign in to flag a post.',
  'moderation.appeal': 'Only its author can ask for a review of a decision on a post.',
  'moderation.act': 'Only moderators can use the review queue.',
  'moderation.actOnModerator': 'Only an admin can act on a moderator’s post or account.',
  'moderation.actOnAdmin': 'Only another admin can act on an admin’s post or account.',
  'flag.hideUnsafeAtOnce': 'Only an expert’s unsafe-advice flag hides a post at once.',
  'post.staysUpUnderMemberFlags': 'Members’ posts are hidden pending review when enough flags count.',
  'post.staysUpUnderExpertFlag':
    'Members’ and experts’ posts are hidden pending review under an expert’s unsafe-advice flag.',
  'digest.expertSections':
    'Only experts, moderators and admins get the digest’s unanswered questions and stale safety checks.',
  'audit.read': 'Only admins can read the audit log.',
  'mail.outbox': 'Only admins can see the e-mail outbox.',
  'moderation.seeHidden': 'Only moderators can see hidden posts.',
  'fieldLog.create': 'Sign in to record a field log entry.',
  'fieldLog.edit': 'Only its author can change this field log entry.',
  'fieldLog.import': 'Sign in to import field log entries.',
};
