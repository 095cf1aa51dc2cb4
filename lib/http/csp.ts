import { createHash } from 'node:crypto';

/**
 * The Content-Security-Policy for pages, built per request by proxy.ts.
 *
 * Scripts never run from 'unsafe-inline'. Next puts its page data in inline scripts
 * (`self.__next_f.push(…)`), so each page says which inline scripts are its own:
 * - a page rendered for this request (most pages: they read the session or the
 *   query) gets a fresh nonce; Next reads it from the request's CSP header and puts
 *   it on every script it writes;
 * - a page built once and served to everyone (a guide) cannot carry a per-request
 *   nonce, so the policy lists the sha256 of each inline script of its built HTML
 *   (the built "not found" page is served for unknown paths, so a rendered page's
 *   policy lists its hashes too);
 * - a page kept by the page cache and regenerated while the site runs (a thread,
 *   ISR) has inline scripts that change with each regeneration; only for those does
 *   the policy keep 'unsafe-inline' for scripts, and those pages read nothing from
 *   the request, so nothing a visitor sends can be reflected into them.
 * A page rendered per request and then kept for signed-out readers by the production
 * server (scripts/response-cache.mjs) has its nonce taken out and the sha256 of each
 * inline script put in its place, so one nonce is never served twice.
 */
export type ScriptSource = { nonce: string; hashes?: string[] } | { hashes: string[] } | { unsafeInline: true };

export function contentSecurityPolicy(scripts: ScriptSource, dev = false): string {
  let scriptSrc: string;
  // No 'strict-dynamic': Next's chunks load from this origin, which 'self' allows, and
  // the site serves no script a member could upload (photos are re-encoded, nosniff).
  if ('unsafeInline' in scripts) scriptSrc = "'self' 'unsafe-inline'";
  else
    scriptSrc = ["'self'", ...('nonce' in scripts ? [`nonce-${scripts.nonce}`] : []), ...(scripts.hashes ?? [])]
      .map((s) => (s.startsWith("'") ? s : `'${s}'`))
      .join(' ');
  return [
    "default-src 'self'",
    `script-src ${scriptSrc}${dev ? " 'unsafe-eval'" : ''}`,
    // KaTeX and React style attributes need inline styles; styles cannot run code
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    `connect-src 'self'${dev ? ' ws:' : ''}`,
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/** A nonce of 128 random bits, base64 (CSP 3 asks for at least 128). */
export function newNonce(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}

/**
 * The CSP hash source of every inline script in an HTML page ('sha256-…'), in the
 * order they appear. Scripts with a src, and data blocks (JSON), are not inline code.
 */
export function inlineScriptHashes(html: string): string[] {
  const out = new Set<string>();
  for (const m of html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)) {
    const [, attrs = '', code = ''] = m;
    if (/\bsrc\s*=/i.test(attrs)) continue;
    const type = /\btype\s*=\s*["']?([^"'\s>]+)/i.exec(attrs)?.[1]?.toLowerCase();
    if (type && type !== 'text/javascript' && type !== 'module' && type !== 'application/javascript') continue;
    out.add(scriptHash(code));
  }
  return [...out];
}

/** The CSP hash source of one inline script's code ('sha256-…'). */
export function scriptHash(code: string): string {
  return `sha256-${createHash('sha256').update(code, 'utf8').digest('base64')}`;
}

/** Two years, the preload list's minimum (hstspreload.org), on the site and its subdomains. */
export const HSTS = 'max-age=63072000; includeSubDomains';

/** Whether the reader reached the site over https (directly, or through a proxy that says so). */
export function servedOverHttps(url: URL, headers: Headers): boolean {
  if (url.protocol === 'https:') return true;
  if ((process.env.SITE_URL ?? '').startsWith('https://')) return true;
  const [nearest = ''] = (headers.get('x-forwarded-proto') ?? '').split(',');
  return nearest.trim().toLowerCase() === 'https';
}
