/**
 * A member's own pages kept for offline (their sites, their field log tests): private, so
 * never in the shared page cache. Each member's pages live in a cache named by the
 * member's id, and the phone remembers who is signed in (learned from the server's answer,
 * never guessed offline). A kept page is served only while that member is the one signed
 * in; when another member signs in, or nobody is, every other member's cache is deleted.
 * Plain Cache Storage, shared by the page (which keeps) and the service worker (which
 * serves and forgets), with no framework in it.
 */

const MEMBER_PREFIX = 'clackwater-member-';
const WHO_CACHE = 'clackwater-who';
const WHO_URL = '/__clackwater/who';
/** The field log form kept for the member the field kit confirmed (app/sw.ts). */
export const ENTRY_FORM_CACHE = 'clackwater-entry-form';
/** How many pages a member keeps by visiting; a page kept with the button stays until forgotten. */
export const VISITED_LIMIT = 20;

/** The member's own pages the worker may answer from the member's cache. */
export const MEMBER_PAGE = /^\/(sites\/[A-Za-z0-9_-]{4,40}|field-log\/\d{1,12})$/;

/** The marker a member's page carries, so a page fetched to be kept is known to be theirs. */
export const keptMarker = (memberId: string) => `data-keep-member="${memberId}"`;

const cacheName = (memberId: string) => `${MEMBER_PREFIX}${memberId}`;

/** Who the phone last heard is signed in, or null. */
export async function signedInMember(): Promise<string | null> {
  const r = await (await caches.open(WHO_CACHE)).match(WHO_URL);
  return r ? r.text() : null;
}

/**
 * The server said who is signed in (or that nobody is): remember it, and delete every
 * other member's kept pages, so the next person on this phone never gets them.
 */
export async function memberIs(memberId: string | null): Promise<void> {
  const who = await caches.open(WHO_CACHE);
  const before = await signedInMember();
  // the kept entry form is the member's too; a first answer (nobody known before) keeps it,
  // since the field kit may be keeping it for this very member at the same moment
  if (memberId === null || (before !== null && before !== memberId)) await caches.delete(ENTRY_FORM_CACHE);
  if (memberId) await who.put(WHO_URL, new Response(memberId));
  else await who.delete(WHO_URL);
  for (const name of await caches.keys())
    if (name.startsWith(MEMBER_PREFIX) && (memberId === null || name !== cacheName(memberId)))
      await caches.delete(name);
}

export type KeptHow = 'visited' | 'kept';

/**
 * Keeps one of the member's pages: fetched with the member's own cookie and kept only when
 * the answer is that member's page (a sign-in in another tab in between changes the answer).
 * `visited` pages are trimmed to the newest {@link VISITED_LIMIT}; `kept` ones stay.
 */
export async function keepPage(memberId: string, path: string, how: KeptHow): Promise<boolean> {
  const cache = await caches.open(cacheName(memberId));
  const prior = await cache.match(path);
  // a page the member let go is not kept again by a visit, only by the button
  if (how === 'visited' && prior?.headers.get('x-kept') === 'forgotten') return false;
  const res = await fetch(path, { credentials: 'same-origin', headers: { accept: 'text/html' } });
  if (!res.ok || res.redirected) return false;
  const html = await res.text();
  if (!html.includes(keptMarker(memberId))) return false;
  // a page the member kept with the button stays kept when they visit it again
  const keptHow = prior?.headers.get('x-kept') === 'kept' ? 'kept' : how;
  await cache.put(
    path,
    new Response(html, {
      headers: { 'content-type': 'text/html; charset=utf-8', 'x-kept': keptHow, 'x-kept-at': String(Date.now()) },
    }),
  );
  if (how === 'visited') await trimVisited(cache);
  return true;
}

async function trimVisited(cache: Cache) {
  const visited: { req: Request; at: number }[] = [];
  for (const req of await cache.keys()) {
    const r = await cache.match(req);
    if (r?.headers.get('x-kept') === 'visited') visited.push({ req, at: Number(r.headers.get('x-kept-at')) });
  }
  visited.sort((a, b) => b.at - a.at);
  for (const old of visited.slice(VISITED_LIMIT)) await cache.delete(old.req);
}

/** How a page is kept for this member, if it is. */
export async function keptHow(memberId: string, path: string): Promise<KeptHow | null> {
  if (!(await caches.has(cacheName(memberId)))) return null;
  const how = (await (await caches.open(cacheName(memberId))).match(path))?.headers.get('x-kept');
  return how === 'kept' || how === 'visited' ? how : null;
}

/** The member lets a kept page go; a mark stays (no page in it) so that a visit does not keep it again. */
export async function forgetPage(memberId: string, path: string): Promise<void> {
  await (await caches.open(cacheName(memberId))).put(path, new Response('', { headers: { 'x-kept': 'forgotten' } }));
}

/** For the worker with no signal: the page, only from the cache of the member signed in now. */
export async function keptForSignedIn(path: string): Promise<Response | undefined> {
  const memberId = await signedInMember();
  if (!memberId || !(await caches.has(cacheName(memberId)))) return undefined;
  const r = await (await caches.open(cacheName(memberId))).match(path);
  const how = r?.headers.get('x-kept');
  return how === 'kept' || how === 'visited' ? r : undefined;
}
