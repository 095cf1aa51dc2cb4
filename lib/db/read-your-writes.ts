import 'server-only';
import { AsyncLocalStorage } from 'node:async_hooks';

/**
 * Read-your-writes with read replicas. A replica applies the primary's changes a moment
 * later, so a member who has just written must not be shown the replica's older copy:
 * their requests for a short while after a write read from the primary.
 *
 * The request says so with a marker cookie the server sets on every accepted write
 * (lib/http/guard.ts); the work that serves such a request runs inside `onPrimary`,
 * and lib/db/replication.ts sends every query made inside it to the primary.
 * AsyncLocalStorage carries the choice through the awaits down to the pool, so no
 * query function needs to know about replicas. Transactions use the primary anyway.
 *
 * Reads that do not pass through guarded() (pages, public API lists) are covered by a
 * check the app layer registers at start-up (`wantPrimaryWhen`, in instrumentation.ts):
 * it looks at the request the framework is serving, which lib/ cannot see by itself.
 */
export const PRIMARY_MARKER_COOKIE = 'cw_rw';

/**
 * How long the marker lasts: comfortably longer than the lag the replicas are allowed
 * (on loopback they trail by milliseconds; a replica that falls seconds behind is a fault
 * to fix, not a state to serve from). Common practice, no source.
 */
export const PRIMARY_MARKER_S = Number(process.env.DB_READ_YOUR_WRITES_S ?? 10);

const context = new AsyncLocalStorage<{ primary: true }>();

/** Runs `work` with every query it makes (however deeply awaited) sent to the primary. */
export function onPrimary<T>(work: () => T): T {
  return context.run({ primary: true }, work);
}

let frameworkCheck: (() => boolean) | undefined;

/** Registers the app layer's "does the request being served want the primary?" check. */
export function wantPrimaryWhen(check: () => boolean): void {
  frameworkCheck = check;
}

export function primaryWanted(): boolean {
  if (context.getStore()?.primary === true) return true;
  try {
    return frameworkCheck?.() === true;
  } catch {
    return false;
  }
}

/** Whether a request's Cookie header carries the marker of a recent write. */
export function hasPrimaryMarker(cookieHeader: string | null | undefined): boolean {
  if (!cookieHeader) return false;
  return cookieHeader.split(';').some((part) => part.trim().startsWith(`${PRIMARY_MARKER_COOKIE}=`));
}

/** The Set-Cookie value for the marker; HttpOnly, it is only for the server. */
export function primaryMarkerCookie(secure: boolean): string {
  return `${PRIMARY_MARKER_COOKIE}=1; Max-Age=${PRIMARY_MARKER_S}; Path=/; HttpOnly; SameSite=Lax${secure ? '; Secure' : ''}`;
}
