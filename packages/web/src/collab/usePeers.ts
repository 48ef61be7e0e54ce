import { useCallback, useRef, useSyncExternalStore } from 'react';
import type { Awareness } from 'y-protocols/awareness';
import { peersOf, type PresencePeer } from './presence';

const none: PresencePeer[] = [];

/** The other people in the sheet, re-read whenever awareness changes. */
export function usePeers(awareness: Awareness | null): PresencePeer[] {
  const cache = useRef<{ key: string; peers: PresencePeer[] }>({ key: '', peers: none });
  const subscribe = useCallback(
    (listener: () => void) => {
      if (!awareness) return () => {};
      awareness.on('change', listener);
      return () => awareness.off('change', listener);
    },
    [awareness],
  );
  const getSnapshot = useCallback(() => {
    if (!awareness) return none;
    const peers = peersOf(awareness);
    // Cursor moves change awareness constantly; hand out a new array only when the bar changes.
    const key = JSON.stringify(peers);
    if (key !== cache.current.key) cache.current = { key, peers };
    return cache.current.peers;
  }, [awareness]);
  return useSyncExternalStore(subscribe, getSnapshot);
}
