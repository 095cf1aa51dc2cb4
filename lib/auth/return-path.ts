/**
 * Where to send the browser after sign-in: a path on this site, or '/'.
 *
 * `startsWith('/')` is not enough: "//host", "/\host" and "/<tab>/host" (a decoded
 * "%09") all start with a slash, yet a browser's URL parser resolves each to another
 * host. So the value is parsed the way the browser will parse it, against this site's
 * origin, and kept only when it stays on that origin; what is handed back is the
 * parsed path, which cannot start with two slashes either. Pure: forms use it in the
 * browser, pages and next-auth's redirect callback on the server.
 */
const HERE = 'https://clackwater.invalid';

export function safeReturnPath(raw: unknown, fallback = '/'): string {
  if (typeof raw !== 'string' || raw === '' || raw.length > 2000) return fallback;
  let url: URL;
  try {
    url = new URL(raw, HERE);
  } catch {
    return fallback;
  }
  if (url.origin !== HERE) return fallback;
  const path = `${url.pathname}${url.search}${url.hash}`;
  if (!path.startsWith('/') || path.startsWith('//') || path.startsWith('/\\')) return fallback;
  return path;
}

/** next-auth's redirect callback: same-origin absolute URLs and safe paths, on `baseUrl`; anything else goes home. */
export function sameSiteRedirect(url: string, baseUrl: string): string {
  const base = baseUrl.replace(/\/+$/, '');
  let target = url;
  try {
    const parsed = new URL(url, `${base}/`);
    if (parsed.origin !== new URL(`${base}/`).origin) return base;
    target = `${parsed.pathname}${parsed.search}${parsed.hash}`;
  } catch {
    return base;
  }
  return `${base}${safeReturnPath(target)}`;
}

/** The account pages themselves: signing in from one of them should not lead back to it. */
const NO_RETURN = ['/sign-in', '/sign-up', '/reset-password', '/verify-email', '/unsubscribe'];

/**
 * The sign-in link from the page at `here`: it carries the way back, so a reader who
 * signs in from a thread or a guide lands on it again instead of on the home page.
 */
export function signInPath(here: string | null | undefined): string {
  const back = safeReturnPath(here ?? '/');
  if (back === '/' || NO_RETURN.some((p) => back === p || back.startsWith(`${p}/`) || back.startsWith(`${p}?`)))
    return '/sign-in';
  return `/sign-in?callbackUrl=${encodeURIComponent(back)}`;
}
