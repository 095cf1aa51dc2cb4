export function encode(value: unknown): string;
export function decode(text: string): unknown;

/** Next 16's incremental cache handler interface (next/dist/server/lib/incremental-cache). */
export default class RedisCacheHandler {
  constructor(ctx: object);
  get(key: string, ctx: object): Promise<{ lastModified: number; value: unknown; cacheControl?: unknown } | null>;
  set(key: string, data: unknown, ctx: object): Promise<void>;
  revalidateTag(tags: string | string[], durations?: { expire?: number }): Promise<void>;
  resetRequestCache(): void;
}
