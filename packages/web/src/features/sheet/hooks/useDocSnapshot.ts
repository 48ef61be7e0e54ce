import { useMemo, useSyncExternalStore } from 'react';
import type * as Y from 'yjs';

/**
 * A value read from a sheet's Y.Doc, read again after every transaction on it (a keystroke here,
 * an edit from someone else). `read` may build a new object each time: the component re-renders
 * only when the value's JSON changes, so typing in one cell does not re-render the others.
 * `read` and `fallback` must be stable (module-level or memoized).
 */
export function useDocSnapshot<T>(doc: Y.Doc | null, read: (doc: Y.Doc) => T, fallback: T): T {
  const store = useMemo(() => docSnapshotStore(doc, read, fallback), [doc, read, fallback]);
  return useSyncExternalStore(store.subscribe, store.getSnapshot);
}

function docSnapshotStore<T>(doc: Y.Doc | null, read: (doc: Y.Doc) => T, fallback: T) {
  let cache: { key: string; value: T } | null = null;
  return {
    subscribe(listener: () => void) {
      if (!doc) return () => {};
      doc.on('afterTransaction', listener);
      return () => doc.off('afterTransaction', listener);
    },
    getSnapshot(): T {
      if (!doc) return fallback;
      const value = read(doc);
      const key = JSON.stringify(value) ?? 'undefined';
      if (cache === null || cache.key !== key) cache = { key, value };
      return cache.value;
    },
  };
}
