import type { IncomingMessage, ServerResponse } from 'node:http';

type Handler = (req: IncomingMessage, res: ServerResponse) => unknown;

export const CACHEABLE_PATHS: RegExp[];
export const GLOBAL_KEY: symbol;
export const INSTANCE_ID: string;
export function hasSession(cookieHeader: string | undefined): boolean;
export function cacheKey(req: IncomingMessage): string;
export function isCacheableRequest(req: IncomingMessage, paths?: RegExp[]): boolean;
export function inlineScriptHashes(html: string): string[];
export function withoutNonce(body: Buffer, csp: string | undefined): { body: Buffer; csp: string | undefined } | null;
export function createResponseCache(opts?: {
  maxEntries?: number;
  maxBytes?: number;
  maxEntryBytes?: number;
  maxAgeMs?: number;
  now?: () => number;
  paths?: RegExp[];
  available?: () => boolean;
  onClear?: (reason: string) => void;
}): {
  wrap(handle: Handler): (req: IncomingMessage, res: ServerResponse) => Promise<unknown>;
  clear(reason?: string, opts?: { local?: boolean }): void;
  renderFailed(id: string): void;
  idle(): Promise<void>;
  stats: Record<'hits' | 'misses' | 'stored' | 'clears' | 'evictions' | 'passes', number>;
  readonly size: number;
  readonly bytes: number;
};
