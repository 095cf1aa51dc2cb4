/**
 * Members younger than this are "new": fewer posts an hour, fewer links a post, and
 * their flags do not count toward hiding a post. One rule for the flood limits, the
 * post rules and the flag rule alike.
 */
export const NEW_MEMBER_DAYS = 7;

export function isNewMember(user: { memberSince: Date }, now = Date.now()): boolean {
  return now - user.memberSince.getTime() < NEW_MEMBER_DAYS * 86_400_000;
}
