import { readFileSync } from 'node:fs';
import path from 'node:path';
import { inlineScriptHashes } from './csp';

/**
 * Which pages Next serves from its build or page cache rather than rendering for the
 * request, read from the build's prerender manifest: those cannot carry a per-request
 * nonce (see csp.ts). Read once per process; a missing manifest (next dev) means
 * every page is rendered per request.
 */
interface Manifest {
  routes: Record<string, { initialRevalidateSeconds?: number | false }>;
  dynamicRoutes: Record<string, { routeRegex: string; fallback?: unknown }>;
}

export type PageKind =
  { kind: 'rendered'; hashes: string[] } | { kind: 'static'; hashes: string[] } | { kind: 'regenerated' };

let manifest: { static: Set<string>; regenerated: Set<string>; dynamic: RegExp[] } | null | undefined;
const hashCache = new Map<string, string[] | null>();

function distDir(): string {
  return path.join(/* turbopackIgnore: true */ process.cwd(), '.next');
}

function load() {
  if (manifest !== undefined) return manifest;
  try {
    const m = JSON.parse(
      readFileSync(/* turbopackIgnore: true */ path.join(distDir(), 'prerender-manifest.json'), 'utf8'),
    ) as Manifest;
    const statics = new Set<string>();
    const regenerated = new Set<string>();
    for (const [route, r] of Object.entries(m.routes))
      (r.initialRevalidateSeconds === false ? statics : regenerated).add(route);
    // a dynamic route with fallback false (dynamicParams = false) only has its built paths
    const dynamic = Object.values(m.dynamicRoutes)
      .filter((r) => r.fallback !== false)
      .map((r) => new RegExp(r.routeRegex));
    manifest = { static: statics, regenerated, dynamic };
  } catch {
    manifest = null;
  }
  return manifest;
}

function builtHashes(route: string): string[] | null {
  if (hashCache.has(route)) return hashCache.get(route)!;
  let hashes: string[] | null = null;
  try {
    const file = route === '/' ? 'index' : route.replace(/^\//, '');
    hashes = inlineScriptHashes(
      readFileSync(/* turbopackIgnore: true */ path.join(distDir(), 'server', 'app', `${file}.html`), 'utf8'),
    );
  } catch {
    hashes = null;
  }
  if (hashCache.size < 4096) hashCache.set(route, hashes);
  return hashes;
}

export function pageKind(pathname: string): PageKind {
  const m = load();
  if (!m) return { kind: 'rendered', hashes: [] };
  const route = pathname.length > 1 ? pathname.replace(/\/$/, '') : pathname;
  if (m.static.has(route)) {
    const hashes = builtHashes(route);
    return hashes ? { kind: 'static', hashes } : { kind: 'regenerated' };
  }
  if (m.regenerated.has(route) || m.dynamic.some((r) => r.test(route))) return { kind: 'regenerated' };
  // Next answers an unknown path, or a notFound() from a page, with the built page
  const fallback = [...(builtHashes('/_not-found') ?? []), ...(builtHashes('/_global-error') ?? [])];
  return { kind: 'rendered', hashes: [...new Set(fallback)] };
}
