/// <reference lib="webworker" />
/**
 * The service worker, built by scripts/build-sw.mjs into public/sw.js after `next build`
 * (Serwist: precache of the build's static files, routes below).
 *
 * Privacy first: a member's pages must never be served to whoever uses the phone next.
 * Only public pages that read no session are kept, and only when the app marks the
 * response `Clackwater-Offline: public` (next.config.mjs), because Next marks every page
 * it renders per request `private, no-store` whether or not it is private, so the header
 * alone cannot tell /plan from /settings. Everything else goes to the network only, and
 * signing out empties the kept pages.
 */
import {
  CacheableResponsePlugin,
  ExpirationPlugin,
  NetworkFirst,
  NetworkOnly,
  Serwist,
  type PrecacheEntry,
  type RuntimeCaching,
} from 'serwist';
import { ENTRY_FORM_CACHE, MEMBER_PAGE, keptForSignedIn, memberIs } from '@/lib/offline/kept';

declare const self: ServiceWorkerGlobalScope & { __SW_MANIFEST: (PrecacheEntry | string)[] | undefined };

/** Pages a reader may keep: the same for everyone (the app marks them too). */
export const KEEP = /^\/(guides|calculators|plan|field-kit)(\/|$)/;
/** Never kept, whatever a response says: a member's own pages and every API answer. */
export const NEVER =
  /^\/(api|sites|settings|review|admin|people|questions\/ask|field-log\/new|sign-in|sign-up|moderation)(\/|$)/;
export const PAGES_CACHE = 'clackwater-pages';

function keepable(response: Response): boolean {
  if (!response.ok || response.type !== 'basic' || response.redirected) return false;
  if (response.headers.get('clackwater-offline') === 'public') return true;
  return !/\b(private|no-store)\b/i.test(response.headers.get('cache-control') ?? '');
}

// ---- The field log form, kept for its member ----------------------------------------
// /field-log/new is a member's page, so it never goes in the shared page cache above. It
// is kept alone, in a cache of its own (ENTRY_FORM_CACHE, lib/offline/kept.ts), for the
// member signed in when it was fetched: the field kit asks for it ('keep-entry-form') once
// it knows its member, and each visit with signal refreshes it; the same message keeps the
// field kit's own (public) pages, so one visit to the field kit is enough for the whole
// visit at the water. Who is signed in is followed below (`memberIs`), which forgets it on
// sign-out and when another member signs in. Only the bare form: a form opened from a site
// (?site=) names that site.
const ENTRY_FORM = '/field-log/new';
const keepForMember = (response: Response) => response.ok && response.type === 'basic' && !response.redirected;
const entryFormRoute = {
  matcher: ({ request, url, sameOrigin }: { request: Request; url: URL; sameOrigin: boolean }) =>
    sameOrigin && request.mode === 'navigate' && url.pathname === ENTRY_FORM && url.search === '',
  handler: new NetworkFirst({
    cacheName: ENTRY_FORM_CACHE,
    networkTimeoutSeconds: 6,
    plugins: [{ cacheWillUpdate: async ({ response }) => (keepForMember(response) ? response : null) }],
  }),
};
const FIELD_KIT_PAGES = ['/field-kit', '/field-kit/timer', '/field-kit/fall'];
async function fetchInto(url: string, cacheName: string, ok: (res: Response) => boolean) {
  const res = await fetch(url, { credentials: 'same-origin' }).catch(() => null);
  if (res && ok(res)) await (await caches.open(cacheName)).put(url, res);
}
self.addEventListener('message', (event) => {
  if (event.data?.type !== 'keep-entry-form') return;
  event.waitUntil(
    Promise.all([
      fetchInto(ENTRY_FORM, ENTRY_FORM_CACHE, keepForMember),
      ...FIELD_KIT_PAGES.map((url) => fetchInto(url, PAGES_CACHE, keepable)),
    ]),
  );
});

// ---- keep: a member's own pages (sites, field log tests), per member (lib/offline/kept.ts) ----

/**
 * The member's own pages go to the network; with none, the page kept in the cache of the
 * member signed in now (never another member's), else the offline page. The worker never
 * writes these pages itself: the page keeps them, after checking they are the member's.
 */
const memberPages: RuntimeCaching = {
  matcher: ({ request, url, sameOrigin }) =>
    sameOrigin && request.mode === 'navigate' && MEMBER_PAGE.test(url.pathname) && url.search === '',
  handler: async ({ request, url }) => {
    try {
      return await new Promise<Response>((resolve, reject) => {
        // one bar of signal at the creek: the kept page rather than a long wait
        const timer = setTimeout(() => reject(new Error('timeout')), 6000);
        fetch(request)
          .then(resolve, reject)
          .finally(() => clearTimeout(timer));
      });
    } catch {
      return (await keptForSignedIn(url.pathname)) ?? (await serwist.matchPrecache('/offline')) ?? Response.error();
    }
  },
};

self.addEventListener('fetch', (event) => {
  const url = new URL(event.request.url);
  if (url.origin !== self.location.origin) return;
  // the server's word on who is signed in (every page asks it): other members' pages go
  if (event.request.method === 'GET' && url.pathname === '/api/auth/session')
    event.respondWith(
      fetch(event.request).then((res) => {
        if (res.ok)
          event.waitUntil(
            res
              .clone()
              .json()
              .then((s: { user?: { id?: number | string } } | null) =>
                memberIs(s?.user?.id === undefined ? null : String(s.user.id)),
              )
              .catch(() => undefined),
          );
        return res;
      }),
    );
  if (event.request.method === 'POST' && url.pathname === '/api/auth/signout') event.waitUntil(memberIs(null));
  // a sign-in: whoever's form was kept is not this member's until the session says so
  if (url.pathname.startsWith('/api/auth/callback/')) event.waitUntil(caches.delete(ENTRY_FORM_CACHE));
});
self.addEventListener('message', (event) => {
  if (event.data?.type === 'forget-pages') event.waitUntil(memberIs(null));
});
// ---- end keep ----

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: false,
  runtimeCaching: [
    entryFormRoute,
    {
      matcher: ({ request, url, sameOrigin }) =>
        sameOrigin &&
        request.mode === 'navigate' &&
        KEEP.test(url.pathname) &&
        !NEVER.test(url.pathname) &&
        // a calculator opened from a member's own site names that site
        !url.searchParams.has('site'),
      handler: new NetworkFirst({
        cacheName: PAGES_CACHE,
        // a creek bank with one bar of signal: show the kept page rather than wait on it
        networkTimeoutSeconds: 6,
        plugins: [
          { cacheWillUpdate: async ({ response }) => (keepable(response) ? response : null) },
          new CacheableResponsePlugin({ statuses: [200] }),
          new ExpirationPlugin({ maxEntries: 200, maxAgeSeconds: 60 * 60 * 24 * 60 }),
        ],
      }),
    },
    memberPages,
    // every other page: the network, or the offline page when there is none
    { matcher: ({ request }) => request.mode === 'navigate', handler: new NetworkOnly() },
  ],
  fallbacks: { entries: [{ url: '/offline', matcher: ({ request }) => request.destination === 'document' }] },
});

async function forgetPages() {
  await caches.delete(PAGES_CACHE);
}

// next-auth's signOut() posts here; the page navigates only after the answer, so the kept
// pages are gone before the next member can open anything
self.addEventListener('fetch', (event) => {
  const url = new URL(event.request.url);
  if (event.request.method === 'POST' && url.origin === self.location.origin && url.pathname === '/api/auth/signout')
    event.waitUntil(forgetPages());
});
self.addEventListener('message', (event) => {
  if (event.data?.type === 'forget-pages') event.waitUntil(forgetPages());
});

serwist.addEventListeners();
