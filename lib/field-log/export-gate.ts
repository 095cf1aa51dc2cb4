/**
 * At most EXPORT_CONNECTIONS database reads for field log exports at a time, in this
 * process: the rest wait their turn here, not in the connection pool's queue, so
 * 500 exports at once leave the pool to the pages and writes (issue 17, item 15).
 */
export const EXPORT_CONNECTIONS = 2;

let running = 0;
const waiting: (() => void)[] = [];

export async function exportSlot<T>(work: () => Promise<T>): Promise<T> {
  if (running >= EXPORT_CONNECTIONS) await new Promise<void>((resolve) => waiting.push(resolve));
  else running++;
  try {
    return await work();
  } finally {
    const nextInLine = waiting.shift();
    if (nextInLine) nextInLine();
    else running--;
  }
}
