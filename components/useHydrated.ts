import { useSyncExternalStore } from 'react';

const noSubscription = () => () => {};

/**
 * False while the server renders and React hydrates, true after. Code fetched only once
 * this is true (React.lazy behind it) is no part of a page's first load, and the server's
 * HTML stands until then.
 */
export function useHydrated(): boolean {
  return useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
}
