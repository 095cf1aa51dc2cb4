import { NextResponse, type NextRequest } from 'next/server';
import { contentSecurityPolicy, HSTS, newNonce, scriptHash, servedOverHttps, type ScriptSource } from '@/lib/http/csp';
import { UNITS_FIRST_PAINT_SCRIPT } from '@/lib/units/first-paint';
import { pageKind, type PageKind } from '@/lib/http/page-cache-map';

// the root layout's one inline script of its own (no nonce: the layout stays static)
const FIRST_PAINT_HASH = scriptHash(UNITS_FIRST_PAINT_SCRIPT);

/**
 * Runs before every page (not the API, not static files): sets the page's
 * Content-Security-Policy with a fresh nonce where Next renders the page for this
 * request (Next reads the nonce from the request's CSP header), hashes or the page
 * cache's fallback where it does not (lib/http/csp.ts says why), and HSTS over https.
 */
export function proxy(request: NextRequest) {
  const dev = process.env.NODE_ENV === 'development';
  const page: PageKind = dev ? { kind: 'rendered', hashes: [] } : pageKind(request.nextUrl.pathname);
  let scripts: ScriptSource;
  let nonce: string | undefined;
  if (page.kind === 'rendered')
    scripts = { nonce: (nonce = newNonce()), hashes: [...new Set([...page.hashes, FIRST_PAINT_HASH])] };
  else if (page.kind === 'static') scripts = { hashes: page.hashes };
  else scripts = { unsafeInline: true };
  const csp = contentSecurityPolicy(scripts, dev);

  const requestHeaders = new Headers(request.headers);
  if (nonce) {
    requestHeaders.set('x-nonce', nonce);
    requestHeaders.set('content-security-policy', csp);
  }
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set('content-security-policy', csp);
  if (servedOverHttps(request.nextUrl, request.headers)) response.headers.set('strict-transport-security', HSTS);
  return response;
}

export const config = {
  matcher: [
    {
      // pages only: the API answers JSON (its headers come from next.config.mjs), and
      // matching it would make Next buffer every request body for the proxy
      source:
        '/((?!api/|_next/static|_next/image|favicon\\.ico|icon|apple-icon|robots\\.txt|sitemap\\.xml|manifest\\.webmanifest).*)',
      missing: [
        { type: 'header', key: 'next-router-prefetch' },
        { type: 'header', key: 'purpose', value: 'prefetch' },
      ],
    },
  ],
};
