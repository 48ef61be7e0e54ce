import { useMemo, useSyncExternalStore } from 'react';
import type { Awareness } from 'y-protocols/awareness';
import { peersOf, type PresencePeer } from './presence';

const none: PresencePeer[] = [];

/** The other people in the sheet, re-read whenever awareness changes. */
export function usePeers(awareness: Awareness | null): PresencePeer[] {
  const store = useMemo(() => peersStore(awareness), [awareness]);
  return useSyncExternalStore(store.subscribe, store.getSnapshot);
}

function peersStore(awareness: Awareness | null) {
  // Cursor moves change awareness constantly; hand out a new array only when the list changes.
  let cache = { key: '[]', peers: none };
  return {
    subscribe(listener: () => void) {
      if (!awareness) return () => {};
      awareness.on('change', listener);
      return () => awareness.off('change', listener);
    },
    getSnapshot(): PresencePeer[] {
      if (!awareness) return none;
      const peers = peersOf(awareness);
      const key = JSON.stringify(peers);
      if (key !== cache.key) cache = { key, peers };
      return cache.peers;
    },
  };
}
