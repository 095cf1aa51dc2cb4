import 'server-only';
import type { LoggerInstance } from 'next-auth';

/** Thrown by the jwt callback for a token the account's session version has left behind. */
export class SessionRevoked extends Error {
  constructor() {
    super('session ended: signed out everywhere, password reset, suspension or role change');
    this.name = 'SessionRevoked';
  }
}

/**
 * next-auth's logger. A session cookie that does not decode (junk, forged, signed
 * with another secret) or has been revoked is a signed-out visitor, not a server
 * fault: next-auth already clears it, and the log gets one short line, no stack —
 * anyone can send such cookies, and a stack per request would bury real faults.
 * Everything else is logged as next-auth would, as an error.
 */
function describe(metadata: unknown): { err: Error | null; text: string } {
  const m = metadata as { error?: unknown; message?: unknown } | undefined;
  const err = metadata instanceof Error ? metadata : m?.error instanceof Error ? m.error : null;
  const text = err?.message ?? (typeof m?.message === 'string' ? m.message : String(metadata ?? ''));
  return { err, text: text.replace(/\s+/g, ' ').slice(0, 160) };
}

export const authLogger: Partial<LoggerInstance> = {
  error(code, metadata) {
    const { err, text } = describe(metadata);
    if (code === 'JWT_SESSION_ERROR') {
      console.warn(
        err?.name === 'SessionRevoked'
          ? `next-auth: ${err.message}`
          : `next-auth: a session cookie that does not verify was ignored (${text})`,
      );
      return;
    }
    console.error(`next-auth ${code}: ${text}`, ...(err?.stack ? [err.stack] : []));
  },
  warn(code) {
    console.warn(`next-auth warning ${code}`);
  },
  debug() {},
};
