import { COLLAB_MESSAGE, isFinalCloseCode, SAVING_STATE } from '@sheaf/sheet-doc';
import * as decoding from 'lib0/decoding';
import { WebsocketProvider } from 'y-websocket';
import type { Awareness } from 'y-protocols/awareness';
import * as Y from 'yjs';
import { stateAfterClose, stateAfterStatus, type ConnectionState } from './connectionState';

/** What a connection reports: where it stands, and whether the live document ever arrived. */
export interface ConnectionSnapshot {
  readonly state: ConnectionState;
  /** True once the server's copy of the document has been received (stays true afterwards). */
  readonly synced: boolean;
}

/** One open sheet: its live Y.Doc, the awareness of who is in it, and the websocket behind both. */
export interface SheetConnection {
  readonly doc: Y.Doc;
  readonly awareness: Awareness;
  subscribe(listener: () => void): () => void;
  getSnapshot(): ConnectionSnapshot;
  /** Close the socket, drop this client's presence and free the document. */
  destroy(): void;
}

/**
 * The client backs off up to this long between attempts. Higher than the library's 2.5 s, so a
 * server that is down or restarting is not hammered by every open sheet at once.
 */
export const MAX_BACKOFF_MS = 20_000;

/** `ws(s)://<this host>/collab`: the co-editing endpoint sits beside the page, same origin. */
export function collabUrl(location: Pick<Location, 'protocol' | 'host'> = window.location): string {
  return `${location.protocol === 'https:' ? 'wss' : 'ws'}://${location.host}/collab`;
}

/**
 * Open the live copy of a sheet over `/collab/:sheetId`. The provider syncs the document, keeps
 * edits made while offline and merges them on reconnect, and retries with backoff — except after
 * a final close code (signed out, no access), where it stops and the snapshot says why.
 * Cross-tab broadcast is off: every change goes through the server, which enforces read-only.
 */
export function createSheetConnection(sheetId: string, url = collabUrl()): SheetConnection {
  const doc = new Y.Doc();
  const provider = new WebsocketProvider(url, sheetId, doc, {
    maxBackoffTime: MAX_BACKOFF_MS,
    disableBc: true,
    shouldReconnect: (event: CloseEvent) => !isFinalCloseCode(event.code),
  });
  const listeners = new Set<() => void>();
  let snapshot: ConnectionSnapshot = { state: { kind: 'connecting' }, synced: false };
  const set = (next: ConnectionSnapshot) => {
    snapshot = next;
    for (const listener of listeners) listener();
  };
  let ended = false;
  // Told by the server on this connection; a new connection is told again if it still holds.
  let savingPaused = false;
  const connectedState = (): ConnectionState => (savingPaused ? { kind: 'saving-paused' } : { kind: 'live' });

  provider.messageHandlers[COLLAB_MESSAGE.saving] = (_encoder, decoder) => {
    savingPaused = decoding.readVarUint(decoder) === SAVING_STATE.paused;
    if (ended || !snapshot.synced || !provider.wsconnected) return;
    set({ synced: true, state: connectedState() });
  };
  provider.on('status', ({ status }) => {
    if (ended) return;
    if (status !== 'connected') savingPaused = false;
    const state = stateAfterStatus(status, snapshot.synced);
    set({ synced: snapshot.synced, state: state.kind === 'live' ? connectedState() : state });
  });
  provider.on('sync', (isSynced: boolean) => {
    if (ended || !isSynced) return;
    set({ synced: true, state: provider.wsconnected ? connectedState() : { kind: 'reconnecting' } });
  });
  provider.on('closed', (event: { code: number; reason: string }) => {
    const final = stateAfterClose(event.code, event.reason);
    if (!final) return;
    ended = true;
    set({ synced: snapshot.synced, state: final });
  });

  return {
    doc,
    awareness: provider.awareness,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    getSnapshot: () => snapshot,
    destroy() {
      ended = true;
      listeners.clear();
      provider.destroy();
      doc.destroy();
    },
  };
}
