import type { SessionUser } from '@/lib/auth/session';
import { isNewMember } from '@/lib/accounts/new-member';
import { ForumError } from './errors';
import type { PostType } from './visibility';

/** New members (see NEW_MEMBER_DAYS) may put at most this many links in one post, new or edited. */
export const NEW_MEMBER_LINK_LIMIT = 2;

/**
 * The length of a post's text, in characters, by kind. The zod schemas of the forms
 * say the same to the browser; these are what the server holds every write to, so
 * a post and its later edits cannot drift apart.
 */
export const TEXT_LIMITS: Record<PostType, { body: [number, number]; title?: [number, number] }> = {
  question: { title: [10, 160], body: [20, 20_000] },
  answer: { body: [20, 20_000] },
  reply: { body: [2, 5_000] },
};

/**
 * Links in member text as the Markdown renderer (remark-gfm) would make them: any
 * scheme://, mailto:, bare www. addresses (autolinked) and protocol-relative link
 * targets, in any letter case. Spam hides links in each of these forms.
 */
const LINK =
  /\b[a-z][a-z0-9+.-]*:\/\/|\bmailto:|(?<![\w./@:-])www\.[a-z0-9-]+\.[a-z]|(?:\]\(\s*<?|^\s*\[[^\]\n]*\]:\s*<?)\/\//gim;

export function countLinks(text: string): number {
  return (text.match(LINK) ?? []).length;
}

function within(field: 'title' | 'body', text: string, [min, max]: [number, number]) {
  const n = text.trim().length;
  if (n < min) throw new ForumError(400, `${field} must be at least ${min} characters`, field);
  if (n > max) throw new ForumError(400, `${field} must be at most ${max.toLocaleString('en-US')} characters`, field);
}

/**
 * The rules every question, answer and reply is held to when it is written and each
 * time it is edited: its length, and the new-member link limit.
 */
export function checkPostText(user: SessionUser, postType: PostType, text: { title?: string; body: string }): void {
  const limits = TEXT_LIMITS[postType];
  if (limits.title && text.title !== undefined) within('title', text.title, limits.title);
  within('body', text.body, limits.body);
  if (isNewMember(user) && countLinks(text.body) > NEW_MEMBER_LINK_LIMIT) {
    throw new ForumError(422, `body: new members can include at most ${NEW_MEMBER_LINK_LIMIT} links in a post`, 'body');
  }
}
