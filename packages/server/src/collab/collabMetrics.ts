/** Counters of the co-editing endpoint, for logs, the health page and tests. */
export interface CollabMetrics {
  /** Websocket connections accepted into a room. */
  connectionsOpened: number;
  /** Upgrade requests refused (by HTTP status before the upgrade, or by a 44xx close code after it). */
  connectionsRefused: number;
  /** Sync step 2 and update messages from read-only connections, dropped unread. */
  readOnlyUpdatesDropped: number;
  /** Document updates appended to the update log. */
  updatesStored: number;
  /** Failed attempts to append to the update log (each is retried; nothing is relayed before it is stored). */
  storeFailures: number;
  /** Times a room paused saving because edits waiting to be stored reached their bound. */
  savingPauses: number;
  /** Updates from writers turned away while saving was paused (their senders resend them on resume). */
  updatesTurnedAway: number;
  /** Compactions of the update log into the sheet's state. */
  compactions: number;
  compactionFailures: number;
  roomsLoaded: number;
  roomsUnloaded: number;
}

export function createCollabMetrics(): CollabMetrics {
  return {
    connectionsOpened: 0,
    connectionsRefused: 0,
    readOnlyUpdatesDropped: 0,
    updatesStored: 0,
    storeFailures: 0,
    savingPauses: 0,
    updatesTurnedAway: 0,
    compactions: 0,
    compactionFailures: 0,
    roomsLoaded: 0,
    roomsUnloaded: 0,
  };
}

/** The slice of a pino logger the co-editing code writes to. */
export interface CollabLogger {
  info(details: object, message: string): void;
  warn(details: object, message: string): void;
  error(details: object, message: string): void;
}
