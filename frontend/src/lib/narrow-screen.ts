import { useSyncExternalStore } from 'react';

/** Phone width: below Primer's 544 px "small" break, the same query the entry forms' CSS modules use. */
export const NARROW_QUERY = '(max-width: 543.98px)';

function subscribe(listener: () => void): () => void {
  const query = window.matchMedia(NARROW_QUERY);
  query.addEventListener('change', listener);
  return () => query.removeEventListener('change', listener);
}

/** True while the screen is phone-width (follows rotation and resizing). */
export function useNarrowScreen(): boolean {
  return useSyncExternalStore(
    subscribe,
    () => window.matchMedia(NARROW_QUERY).matches,
    () => false,
  );
}
