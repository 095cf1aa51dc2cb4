/** The review queue's plain words, shared by the flag form, the queue and the audit log. */
import {
  QUESTION_ONLY_ACTIONS,
  type FlagReason,
  type ModeratedType as PostType,
  type ModerationAction,
} from '@/lib/vocabulary';

export type { FlagReason, ModerationAction, PostType };

export const FLAG_REASON_WORDS: Record<FlagReason, string> = {
  spam: 'spam',
  unsafe: 'unsafe advice',
  rude: 'rude',
  'off-topic': 'off-topic',
  other: 'other',
};

export const ACTION_WORDS: Record<ModerationAction, string> = {
  dismiss: 'Dismiss the flags',
  hide: 'Hide the post',
  restore: 'Restore the post',
  delete: 'Delete the post',
  lock: 'Lock the thread',
  unlock: 'Unlock the thread',
  retag: 'Change the tags',
  warn: 'Warn the author',
  suspend: 'Suspend the author',
};

/** What the audit log calls each action it records, including the automatic hide. */
export const AUDIT_ACTION_WORDS: Record<string, string> = {
  dismiss: 'dismissed flags',
  hide: 'hid',
  restore: 'restored',
  delete: 'deleted',
  lock: 'locked',
  unlock: 'unlocked',
  retag: 'changed tags',
  warn: 'warned',
  suspend: 'suspended',
  'lift-suspension': 'lifted the suspension of',
  'auto-hide': 'hid automatically',
};

export const QUESTION_ONLY = QUESTION_ONLY_ACTIONS;
