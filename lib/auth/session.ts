/**
 * Who is asking. Sign-in is not built yet (the accounts issue adds next-auth), so
 * every request is anonymous for now and actions that need a member answer 401.
 */
export interface SessionUser {
  id: number;
  role: 'member' | 'expert' | 'moderator' | 'admin';
}

export async function currentUser(): Promise<SessionUser | null> {
  return null;
}
