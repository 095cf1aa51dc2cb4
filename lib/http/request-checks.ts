import { apiError } from './errors';

/**
 * Checks every state-changing request passes before a handler looks at it.
 *
 * Cross-site request forgery: the session cookie is SameSite=Lax, which still lets a
 * page on the same site (another port, a sibling subdomain) post forms as the reader.
 * So a write must come from the site's own origin. Browsers say where a request comes
 * from in `Origin` (every cross-origin POST/PUT/PATCH/DELETE, and same-origin ones too)
 * and `Sec-Fetch-Site`; a request with neither comes from no browser (curl, a mail
 * program's one-click unsubscribe) and so carries no reader's cookie by stealth.
 */

const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** The origins the site answers on: SITE_URL and NEXTAUTH_URL (they normally agree). */
export function siteOrigins(): string[] {
  const out = new Set<string>();
  for (const raw of [process.env.SITE_URL, process.env.NEXTAUTH_URL]) {
    if (!raw) continue;
    try {
      out.add(new URL(raw).origin);
    } catch {
      // a malformed setting is reported where it is used; here it simply matches nothing
    }
  }
  return [...out];
}

/**
 * Whether a state-changing request may proceed: its Origin is one of the site's own,
 * or names the very host the request was sent to (a development server reached as
 * localhost while SITE_URL says 127.0.0.1); without Origin, Sec-Fetch-Site must say
 * same-origin (or "none": typed by the reader). Safe methods always pass.
 */
export function isSameOriginWrite(request: Request): boolean {
  if (!STATE_CHANGING.has(request.method.toUpperCase())) return true;
  const origin = request.headers.get('origin');
  if (origin !== null) {
    if (origin === 'null') return false;
    let parsed: URL;
    try {
      parsed = new URL(origin);
    } catch {
      return false;
    }
    if (siteOrigins().includes(parsed.origin)) return true;
    const host = request.headers.get('host');
    return host !== null && parsed.host === host.toLowerCase();
  }
  const site = request.headers.get('sec-fetch-site');
  if (site !== null) return site === 'same-origin' || site === 'none';
  return true;
}

export function crossSiteRefusal(request: Request): Response | undefined {
  if (isSameOriginWrite(request)) return undefined;
  return apiError(
    403,
    'This request came from another site, so it was refused. Reload the page on Clackwater and try again.',
    undefined,
    'cross_site',
  );
}

/** Whether the request declares a JSON body (`application/json`, any parameters). */
export function isJsonContentType(request: Request): boolean {
  const type = request.headers.get('content-type');
  if (!type) return false;
  const [mediaType = ''] = type.split(';');
  return mediaType.trim().toLowerCase() === 'application/json';
}

/**
 * Largest JSON body a route reads, in bytes. A question is at most 20,000 characters
 * (60 kB as UTF-8 at worst) plus its site sheet; the CSV import carries up to a
 * million characters of file text.
 */
export const JSON_BODY_LIMIT = 256 * 1024;
const JSON_BODY_LIMITS: Record<string, number> = {
  '/api/field-log/import': 4 * 1024 * 1024,
};

export function jsonBodyLimit(request: Request): number {
  let path = '';
  try {
    path = new URL(request.url).pathname;
  } catch {
    // a relative URL in a test: the default applies
  }
  return JSON_BODY_LIMITS[path] ?? JSON_BODY_LIMIT;
}

export function tooLarge(limit: number): Response {
  return apiError(
    413,
    `the request body is too large (at most ${Math.round(limit / 1024).toLocaleString('en-US')} kB)`,
    undefined,
    'body_too_large',
  );
}

/**
 * Reads a body as UTF-8 text, refusing it with 413 once it passes `limit` bytes:
 * at once when Content-Length says so (nothing is read), else as soon as the
 * streamed count passes the limit (a chunked body has no length to check first).
 */
export async function readBodyText(
  request: Request,
  limit: number,
): Promise<{ text: string } | { response: Response }> {
  const declared = request.headers.get('content-length');
  if (declared !== null && /^\d+$/.test(declared.trim()) && Number(declared) > limit) {
    await request.body?.cancel().catch(() => undefined);
    return { response: tooLarge(limit) };
  }
  if (!request.body) return { text: '' };
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel().catch(() => undefined);
      return { response: tooLarge(limit) };
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    bytes.set(c, at);
    at += c.byteLength;
  }
  return { text: new TextDecoder('utf-8').decode(bytes) };
}
