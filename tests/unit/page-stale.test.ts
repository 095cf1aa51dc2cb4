import { afterEach, describe, expect, it, vi } from 'vitest';
import { onPageStale, threadChanged } from '@/lib/questions/after-write';

// lib/ marks pages stale only through the hook the app layer sets (instrumentation.ts).
describe('page stale hook', () => {
  afterEach(() => onPageStale(undefined));

  it('marks the thread page of the question written to', () => {
    const hook = vi.fn();
    onPageStale(hook);
    threadChanged(42);
    expect(hook).toHaveBeenCalledExactlyOnceWith('/questions/42');
  });

  it('marks nothing for a write outside a thread, nor without a hook', () => {
    const hook = vi.fn();
    onPageStale(hook);
    threadChanged(null);
    expect(hook).not.toHaveBeenCalled();
    onPageStale(undefined);
    expect(() => threadChanged(42)).not.toThrow();
  });

  it('a hook that throws outside a request does not fail the write', () => {
    onPageStale(() => {
      throw new Error('Invariant: static generation store missing in revalidatePath /questions/42');
    });
    expect(() => threadChanged(42)).not.toThrow();
  });
});
