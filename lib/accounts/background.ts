/**
 * Work that runs after the answer is sent: account e-mails whose look-up and SMTP
 * wait would otherwise make a request for an existing account measurably slower
 * than one for an unknown address. A failure is logged, never thrown: the caller
 * has already answered. Tests and shutdown wait with `backgroundSettled()`.
 */
const pending = new Set<Promise<void>>();

export function inBackground(what: string, work: () => Promise<void>): void {
  const p = (async () => {
    // let the caller's response go out first
    await new Promise<void>((r) => setImmediate(r));
    await work();
  })()
    .catch((err) => console.error(`${what}: not done: ${err instanceof Error ? err.message : String(err)}`))
    .finally(() => pending.delete(p));
  pending.add(p);
}

/** Resolves when everything started so far has finished. */
export async function backgroundSettled(): Promise<void> {
  while (pending.size) await Promise.allSettled([...pending]);
}
