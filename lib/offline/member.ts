/**
 * The member this phone last knew, for pages opened with no signal: next-auth's session
 * comes from the server, so a page first opened at the water would not know who is
 * recording and would offer to sign in instead. Only what a page needs to offer the
 * field kit's forms is kept (id, handle, role, units), never a token: the server still
 * checks the real session when the outbox sends, and a record sent after the session
 * ended comes back refused (401) and stays for the member to send again after signing in.
 * Forgotten as soon as the server, reachable, says nobody is signed in (a sign-out).
 */
export interface KnownMember {
  id: number;
  handle: string;
  role: string;
  units: 'US' | 'metric';
}

const KEY = 'clackwater-member';

type Store = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;
const local = (): Store | null => (typeof localStorage === 'undefined' ? null : localStorage);

/** The kept member, if what is kept has the shape we wrote (anything else is dropped). */
export function parseKnownMember(raw: string | null): KnownMember | null {
  if (!raw) return null;
  try {
    const m = JSON.parse(raw) as Partial<KnownMember>;
    if (!Number.isInteger(m.id) || (m.id as number) <= 0) return null;
    if (typeof m.handle !== 'string' || typeof m.role !== 'string') return null;
    if (m.units !== 'US' && m.units !== 'metric') return null;
    return { id: m.id!, handle: m.handle, role: m.role, units: m.units };
  } catch {
    return null;
  }
}

export function rememberMember(m: KnownMember, store = local()) {
  const { id, handle, role, units } = m;
  store?.setItem(KEY, JSON.stringify({ id, handle, role, units }));
}

export const lastMember = (store = local()) => parseKnownMember(store?.getItem(KEY) ?? null);

export function forgetMember(store = local()) {
  store?.removeItem(KEY);
}

/**
 * Called when next-auth has no session: was that the server's answer, or no answer at
 * all? Asks the session endpoint once (only when a member is kept, so a visitor's pages
 * cost nothing). No answer (a network error) or a server error: the kept member, to
 * record into the outbox. An answer with nobody signed in: forgotten, and null.
 */
export async function memberWhenUnreachable(send: typeof fetch = fetch, store = local()): Promise<KnownMember | null> {
  const kept = lastMember(store);
  if (!kept) return null;
  let res: Response;
  try {
    res = await send('/api/auth/session', { cache: 'no-store', credentials: 'same-origin' });
  } catch {
    return kept;
  }
  if (res.status >= 500) return kept;
  const body = (await res.json().catch(() => null)) as { user?: { id?: unknown } } | null;
  if (res.ok && body?.user) return null; // signed in after all: the session will say so
  forgetMember(store);
  return null;
}
