import { useCallback, useSyncExternalStore } from 'react';

// Same-tab writers announce changes with this event; other tabs get the browser's 'storage' event.
const LOCAL_CHANGE_EVENT = 'sheaf:local-storage';

function readItem(key: string): string | null {
  try {
    return window.localStorage.getItem(key);
  } catch {
    // Storage can be switched off (privacy modes); the app then simply forgets between visits.
    return null;
  }
}

function subscribe(onChange: () => void): () => void {
  window.addEventListener('storage', onChange);
  window.addEventListener(LOCAL_CHANGE_EVENT, onChange);
  return () => {
    window.removeEventListener('storage', onChange);
    window.removeEventListener(LOCAL_CHANGE_EVENT, onChange);
  };
}

/** A string remembered in localStorage under `key`, shared by every component that reads it. */
export function useLocalStorageState(key: string): [string | null, (value: string | null) => void] {
  const value = useSyncExternalStore(
    subscribe,
    () => readItem(key),
    () => null,
  );
  const setValue = useCallback(
    (next: string | null) => {
      try {
        if (next === null) window.localStorage.removeItem(key);
        else window.localStorage.setItem(key, next);
      } catch {
        return;
      }
      window.dispatchEvent(new Event(LOCAL_CHANGE_EVENT));
    },
    [key],
  );
  return [value, setValue];
}
