export const CHANNEL: string;
export function redisInvalidation(
  url: string,
  self: string,
  onRemoteClear: (reason: string) => void,
): { connected(): boolean; publish(reason: string): void; close(): Promise<void> };
