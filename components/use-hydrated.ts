import { useSyncExternalStore } from 'react';

const noSubscription = () => () => {};

/** False while the server-rendered HTML is on screen, true once React has hydrated it. */
export function useHydrated(): boolean {
  return useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
}
