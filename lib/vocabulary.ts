/**
 * The words several layers share: the database enums (models), the zod schemas
 * (lib/validation), the engine's choices and the forms and labels (components) all read
 * them from here, so adding a word is one edit and the layers cannot drift apart.
 * Pure data with no imports: every layer, the engine and the browser may import it.
 * The words people read for these values live with the views (e.g.
 * components/moderation/words.ts); these are the stored values.
 */

/**
 * Where a question stands, derived from its answers and the asker's choice: nobody
 * has answered yet, answers are coming in, or the asker chose what fixed it.
 */
export const QUESTION_STATES = ['waiting', 'worked-on', 'fixed'] as const;
export type QuestionStateKind = (typeof QUESTION_STATES)[number];

/** Posts that have text, revisions and helpful marks. */
export const POST_TYPES = ['question', 'answer', 'reply'] as const;
export type PostType = (typeof POST_TYPES)[number];

/** Everything a member can flag and a moderator can act on. */
export const MODERATED_TYPES = ['question', 'answer', 'reply', 'photo', 'field-log'] as const;
export type ModeratedType = (typeof MODERATED_TYPES)[number];

export const FLAG_REASONS = ['spam', 'unsafe', 'rude', 'off-topic', 'other'] as const;
export type FlagReason = (typeof FLAG_REASONS)[number];

/** The review queue's actions (the audit log also records the automatic hide). */
export const MODERATION_ACTIONS = [
  'dismiss',
  'hide',
  'restore',
  'delete',
  'lock',
  'unlock',
  'retag',
  'warn',
  'suspend',
] as const;
export type ModerationAction = (typeof MODERATION_ACTIONS)[number];

/** Actions that only make sense on a question (the thread as a whole). */
export const QUESTION_ONLY_ACTIONS: readonly ModerationAction[] = ['lock', 'unlock', 'retag'];

/** A member's role, lowest first. */
export const ROLES = ['member', 'expert', 'moderator', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const DIGEST_FREQUENCIES = ['off', 'daily', 'weekly'] as const;
export type DigestFrequency = (typeof DIGEST_FREQUENCIES)[number];

/** An expert's verdict on a guide's safety. */
export const SAFETY_VERDICTS = ['sound', 'needs changes'] as const;
export type SafetyVerdict = (typeof SAFETY_VERDICTS)[number];

/** How a ram pump was made: the engine's efficiency bands differ between the two. */
export const PUMP_TYPES = ['homemade', 'commercial'] as const;
export type PumpType = (typeof PUMP_TYPES)[number];

/** Pipe materials the engine knows the roughness and wave speed of. */
export const PIPE_MATERIALS = ['steel', 'galvanized-steel', 'pvc', 'hdpe', 'hose'] as const;
export type PipeMaterial = (typeof PIPE_MATERIALS)[number];

/** Who may see a site: its owner only, anyone with its link, or anyone (listed on the owner's page). */
export const SITE_VISIBILITIES = ['private', 'link', 'public'] as const;
export type SiteVisibility = (typeof SITE_VISIBILITIES)[number];
