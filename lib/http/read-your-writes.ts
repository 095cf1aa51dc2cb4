import 'server-only';
import { workUnitAsyncStorage } from 'next/dist/server/app-render/work-unit-async-storage.external';
import { PRIMARY_MARKER_COOKIE } from '@/lib/db/read-your-writes';

/**
 * With read replicas, which renders and route handlers outside guarded() read the primary
 * (registered with lib/db's `wantPrimaryWhen` in instrumentation.ts). Next serves each
 * request inside its work-unit store; reading that store, unlike calling `cookies()`,
 * neither takes a page out of the page cache nor throws during a prerender.
 * - a request whose member wrote in the last few seconds (the `cw_rw` marker): the
 *   primary, so they see what they just wrote;
 * - a render Next keeps and hands to every reader (a page-cache regeneration after a write
 *   marked the page stale, a prerender, a cached function): the primary, so the kept copy
 *   is never a replica's older one. There is at most one per page per revalidate period,
 *   so they cost the primary little.
 * - anything else (a request without the marker, work outside a request): a replica.
 */
export function renderWantsPrimary(): boolean {
  const store = workUnitAsyncStorage.getStore();
  if (!store) return false;
  if (store.type === 'request') return store.cookies.has(PRIMARY_MARKER_COOKIE);
  return true;
}
