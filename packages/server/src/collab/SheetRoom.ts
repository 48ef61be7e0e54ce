/**
 * One sheet's live document while anyone has it open: the Y.Doc, the awareness (presence) and the
 * websocket connections, speaking the y-websocket protocol.
 *
 * Durability rule: an update from a writer is appended to the update log in PostgreSQL before it
 * is applied to the room's document, so nothing reaches another client (or a sync step 2 answer)
 * before it is stored (StoreThenApplyQueue). A failed append is retried with backoff, forever;
 * the update waits in memory meanwhile and nothing queued behind it is relayed either. What waits
 * is bounded: past the bound the room pauses saving (read-only for now, every client told) and
 * resumes, asking every writer for what it lacks, once the backlog is stored.
 */
import WebSocket from 'ws';
import * as awarenessProtocol from 'y-protocols/awareness';
import * as Y from 'yjs';
import type { AwarenessUser } from './awarenessUser';
import { stampAwarenessEntries } from './awarenessUser';
import { SAVING_STATE } from '@sheaf/sheet-doc';
import { COLLAB_CLOSE, COLLAB_CLOSE_REASON, type CollabCloseCode } from './closeCodes';
import { sheetMeta } from './sheetDoc';
import type { CollabLogger, CollabMetrics } from './collabMetrics';
import { SavingPausedError, SheetLockedError, type LoggedUpdate, type RoomPersistence, type SheetLockState } from './roomPersistence';
import { StoreThenApplyQueue, type Backlog } from './StoreThenApplyQueue';
import { changesNothing } from './updateNovelty';
import {
  awarenessMessage,
  decodeAwarenessUpdate,
  decodeClientMessage,
  encodeAwarenessUpdate,
  savingMessage,
  syncStep1Message,
  syncStep2Message,
  updateMessage,
} from './messages';

/**
 * Who a connection belongs to and whether their role lets them change the document. While the
 * sheet is in check the room treats every connection as read-only, whatever this says.
 */
export interface ConnectionIdentity {
  user: AwarenessUser;
  writable: boolean;
}

export interface RoomOptions {
  persistence: RoomPersistence;
  logger: CollabLogger;
  metrics: CollabMetrics;
  /** Compact once this many updates were logged since the last compaction. */
  compactAfterUpdates: number;
  /** Compact once the room has been quiet (no update stored) this long. */
  compactAfterIdleMs: number;
  /** Longest wait between two attempts to store an update. */
  maxStoreRetryDelayMs: number;
  /** Bounds on the edits waiting in memory to be stored; past one, saving pauses (see SheetRoom). */
  unsaved: UnsavedBounds;
}

/**
 * How much may wait in memory, unsaved, before the room pauses saving: a number of updates or of
 * bytes (whatever the database is doing), or a time during which storing keeps failing.
 */
export interface UnsavedBounds {
  maxUpdates: number;
  maxBytes: number;
  /** Pause once storing has failed for this long, so people learn soon that nothing is saved. */
  maxFailingMs: number;
}

export const DEFAULT_UNSAVED_BOUNDS: UnsavedBounds = { maxUpdates: 5_000, maxBytes: 8 * 1024 * 1024, maxFailingMs: 10_000 };

interface Connection {
  socket: WebSocket;
  identity: ConnectionIdentity;
  /** Awareness client ids this connection speaks for. */
  clientIds: Set<number>;
}

interface QueuedUpdate extends LoggedUpdate {
  /** The connection it came from; null for an edit made by the server itself. */
  origin: Connection | null;
  /** Set when the log refused it because the sheet went into check meanwhile. */
  refused?: boolean;
}
/** Awareness client ids one connection may hold (a tab holds one; a reload briefly two). */
const MAX_CLIENT_IDS_PER_CONNECTION = 4;

export class SheetRoom {
  readonly doc: Y.Doc;
  readonly awareness: awarenessProtocol.Awareness;
  private readonly connections = new Map<WebSocket, Connection>();
  private readonly owners = new Map<number, Connection>();
  private readonly queue: StoreThenApplyQueue<QueuedUpdate>;
  private logRowsSinceCompaction: number;
  private compacting: Promise<void> | null = null;
  private compactAgain = false;
  private idleTimer: NodeJS.Timeout | null = null;
  private destroyed = false;
  private gone = false;
  /** In check: nobody writes, whatever their role. */
  private locked: boolean;
  /** The backlog reached its bound while the log could not be written: edits are turned away. */
  private savingPaused = false;

  private constructor(
    readonly sheetId: string,
    state: Uint8Array,
    logRows: number,
    lock: SheetLockState,
    private readonly options: RoomOptions,
  ) {
    this.doc = new Y.Doc();
    Y.applyUpdate(this.doc, state);
    this.logRowsSinceCompaction = logRows;
    this.locked = lock === 'in-check';
    this.queue = new StoreThenApplyQueue<QueuedUpdate>(
      sheetId,
      options,
      (batch) => this.applyStored(batch),
      () => this.closeAsGone(),
      (batch) => this.refuseLocked(batch),
      (backlog) => this.followBacklog(backlog),
    );
    this.awareness = new awarenessProtocol.Awareness(this.doc);
    // The server has no presence of its own.
    this.awareness.setLocalState(null);
    this.doc.on('update', this.relayUpdate);
    this.awareness.on('update', this.relayAwareness);
  }

  /** Load the sheet from the database and open a room for it. */
  static async open(sheetId: string, options: RoomOptions): Promise<SheetRoom> {
    const { state, logRows, title, lock } = await options.persistence.load(sheetId);
    const room = new SheetRoom(sheetId, state, logRows, lock, options);
    room.followStoredTitle(title);
    return room;
  }

  get connectionCount(): number {
    return this.connections.size;
  }

  /** True while the sheet is in check and every connection is read-only. */
  get isLocked(): boolean {
    return this.locked;
  }

  /**
   * Lock the room for a check (every connection read-only) or unlock it when the checker returns
   * the sheet. Writers' connections are closed with `statusChanged`, so their editors reconnect
   * and learn the new status; updates already queued are stored first (they were made before).
   */
  async setLocked(locked: boolean): Promise<void> {
    if (this.locked === locked) return;
    if (locked) await this.flush();
    this.locked = locked;
    for (const connection of this.connections.values()) {
      if (connection.identity.writable) {
        connection.socket.close(COLLAB_CLOSE.statusChanged, COLLAB_CLOSE_REASON[COLLAB_CLOSE.statusChanged]);
      }
    }
  }

  /** True while saving is paused: the room takes no edits until the backlog is stored. */
  get isSavingPaused(): boolean {
    return this.savingPaused;
  }

  /** True while updates wait to be stored or a compaction runs. */
  get busy(): boolean {
    return this.queue.pending || this.compacting !== null;
  }

  /**
   * Take a websocket into the room. `earlier` holds messages that arrived while the room loaded;
   * they are handled first, in order.
   */
  addConnection(socket: WebSocket, identity: ConnectionIdentity, earlier: readonly Uint8Array[] = []): void {
    if (this.destroyed) throw new Error(`addConnection: the room of sheet ${this.sheetId} is closed`);
    const connection: Connection = { socket, identity, clientIds: new Set() };
    this.connections.set(socket, connection);
    socket.on('message', (data: WebSocket.RawData) => this.handleMessage(connection, rawDataBytes(data)));
    socket.on('close', () => this.removeConnection(connection));
    // Ask a writer for what it has that the room lacks (offline edits). A read-only client is not
    // asked (nor anyone while the sheet is in check): its answer would be dropped anyway.
    if (identity.writable && !this.locked && !this.savingPaused) this.send(connection, syncStep1Message(this.doc));
    if (this.savingPaused) this.send(connection, savingMessage(SAVING_STATE.paused));
    const present = [...this.awareness.getStates().keys()];
    if (present.length > 0) this.send(connection, awarenessMessage(this.awareness, present));
    for (const data of earlier) this.handleMessage(connection, data);
  }

  /** Close every connection with `code` (they leave the room as their sockets close). */
  closeConnections(code: CollabCloseCode): void {
    for (const connection of this.connections.values()) connection.socket.close(code, COLLAB_CLOSE_REASON[code]);
  }

  /** Resolves once every update received so far is stored and applied. */
  async flush(): Promise<void> {
    await this.queue.flush();
  }

  /**
   * Change the document on the server's side (a REST request, say): `edit` runs on a copy, and
   * the resulting update takes the same path as a client's — stored, then applied and relayed to
   * everyone. Resolves once it is stored and applied.
   */
  async applyServerEdit(edit: (doc: Y.Doc) => void, userId: string | null): Promise<void> {
    if (this.destroyed) throw new Error(`applyServerEdit: the room of sheet ${this.sheetId} is closed`);
    if (this.locked) throw new SheetLockedError(this.sheetId);
    if (this.savingPaused) throw new SavingPausedError(this.sheetId);
    const copy = new Y.Doc();
    Y.applyUpdate(copy, Y.encodeStateAsUpdate(this.doc));
    const before = Y.encodeStateVector(copy);
    edit(copy);
    const update = Y.encodeStateAsUpdate(copy, before);
    copy.destroy();
    const entry = this.enqueue(update, null, userId);
    await this.flush();
    if (entry?.refused) throw new SheetLockedError(this.sheetId);
  }

  /** Compact now, unless nothing was logged since the last compaction; resolves when done. */
  async compactNow(): Promise<void> {
    this.clearIdleTimer();
    if (this.logRowsSinceCompaction > 0 || this.compacting !== null) this.requestCompaction();
    while (this.compacting !== null) await this.compacting;
  }

  /** Free the document and the awareness. Callers flush and compact first. */
  destroy(): void {
    if (this.destroyed) return;
    this.destroyed = true;
    this.clearIdleTimer();
    this.closeConnections(COLLAB_CLOSE.shuttingDown);
    this.doc.off('update', this.relayUpdate);
    this.awareness.off('update', this.relayAwareness);
    this.awareness.destroy();
    this.doc.destroy();
  }

  private handleMessage(connection: Connection, data: Uint8Array): void {
    if (this.destroyed || !this.connections.has(connection.socket)) return;
    try {
      const message = decodeClientMessage(data);
      switch (message.type) {
        case 'sync-step-1':
          this.send(connection, syncStep2Message(this.doc, message.stateVector));
          return;
        case 'sync-step-2':
        case 'update':
          if (!connection.identity.writable || this.locked) {
            this.options.metrics.readOnlyUpdatesDropped++;
            return;
          }
          if (this.savingPaused) {
            // Its sender keeps it and sends it again when saving resumes (asked by sync step 1).
            this.options.metrics.updatesTurnedAway++;
            return;
          }
          this.enqueue(message.update, connection, connection.identity.user.id);
          return;
        case 'awareness':
          this.applyAwareness(connection, message.update);
          return;
        case 'query-awareness':
          this.send(connection, awarenessMessage(this.awareness, [...this.awareness.getStates().keys()]));
          return;
      }
    } catch (error) {
      this.options.logger.warn(
        { err: error, sheetId: this.sheetId, userId: connection.identity.user.id },
        'closing a collab connection that sent a malformed message',
      );
      connection.socket.close(COLLAB_CLOSE.badRequest, COLLAB_CLOSE_REASON[COLLAB_CLOSE.badRequest]);
    }
  }

  /**
   * Queue a writer's update to be stored, then applied. What the room already has is cut out
   * first, so a reconnecting client's sync step 2 logs only what is new. Throws on an update
   * that does not decode: it must never reach the log, or every later load would fail on it.
   */
  private enqueue(received: Uint8Array, origin: Connection | null, userId: string | null): QueuedUpdate | null {
    const update = Y.diffUpdate(received, Y.encodeStateVector(this.doc));
    if (changesNothing(this.doc, update)) return null;
    const entry: QueuedUpdate = { update, origin, userId };
    this.queue.push(entry);
    this.followBacklog(this.queue.backlog);
    return entry;
  }

  /** Pause saving once the backlog passes a bound; resume once it is all stored. */
  private followBacklog(backlog: Backlog): void {
    if (this.destroyed) return;
    const bounds = this.options.unsaved;
    if (this.savingPaused) {
      if (backlog.updates === 0) this.resumeSaving();
      return;
    }
    const failingMs = backlog.failingSince === null ? 0 : Date.now() - backlog.failingSince;
    if (backlog.updates > bounds.maxUpdates || backlog.bytes > bounds.maxBytes || failingMs >= bounds.maxFailingMs) {
      this.pauseSaving(backlog, failingMs);
    }
  }

  private pauseSaving(backlog: Backlog, failingMs: number): void {
    this.savingPaused = true;
    this.options.metrics.savingPauses++;
    this.options.logger.warn(
      { sheetId: this.sheetId, updates: backlog.updates, bytes: backlog.bytes, failingMs },
      'pausing saving: edits waiting to be stored reached their bound; the room is read-only until they are stored',
    );
    this.broadcast(savingMessage(SAVING_STATE.paused));
  }

  /** Everything waiting is stored: edits are taken again, and writers send what the room lacks. */
  private resumeSaving(): void {
    this.savingPaused = false;
    this.options.logger.info({ sheetId: this.sheetId }, 'saving resumed');
    this.broadcast(savingMessage(SAVING_STATE.resumed));
    if (this.locked) return;
    const ask = syncStep1Message(this.doc);
    for (const connection of this.connections.values()) {
      if (connection.identity.writable) this.send(connection, ask);
    }
  }

  private broadcast(message: Uint8Array): void {
    for (const connection of this.connections.values()) this.send(connection, message);
  }

  /** Stored: now the room may apply them, which relays each to every other connection. */
  private applyStored(batch: readonly QueuedUpdate[]): void {
    for (const { update, origin } of batch) this.apply(update, origin);
    this.logRowsSinceCompaction += batch.length;
    this.scheduleCompaction();
  }

  /**
   * The log refused updates because the sheet went into check before they were stored (a
   * submission that raced them): they were never applied or relayed. Their senders reconnect
   * read-only and should reload.
   */
  private refuseLocked(batch: readonly QueuedUpdate[]): void {
    this.locked = true;
    this.options.metrics.readOnlyUpdatesDropped += batch.length;
    this.options.logger.warn({ sheetId: this.sheetId, updates: batch.length }, 'dropped edits that arrived after the sheet went into check');
    for (const entry of batch) {
      entry.refused = true;
      const socket = entry.origin?.socket;
      if (socket !== undefined) socket.close(COLLAB_CLOSE.statusChanged, COLLAB_CLOSE_REASON[COLLAB_CLOSE.statusChanged]);
    }
  }

  /** The sheet was deleted while open: everyone is told it is gone. */
  private closeAsGone(): void {
    this.gone = true;
    this.options.logger.warn({ sheetId: this.sheetId }, 'sheet deleted while open; closing its room');
    this.closeConnections(COLLAB_CLOSE.notFound);
  }

  private apply(update: Uint8Array, origin: Connection | null): void {
    try {
      Y.applyUpdate(this.doc, update, origin);
    } catch (error) {
      // It decoded, so this is a Yjs-level failure; the log row is skipped the same way on load.
      this.options.logger.error({ err: error, sheetId: this.sheetId }, 'a stored update does not apply');
    }
  }

  private scheduleCompaction(): void {
    if (this.logRowsSinceCompaction >= this.options.compactAfterUpdates) {
      this.clearIdleTimer();
      this.requestCompaction();
      return;
    }
    this.clearIdleTimer();
    this.idleTimer = setTimeout(() => {
      this.idleTimer = null;
      this.requestCompaction();
    }, this.options.compactAfterIdleMs);
    this.idleTimer.unref();
  }

  private requestCompaction(): void {
    if (this.compacting !== null) {
      this.compactAgain = true;
      return;
    }
    const rowsBefore = this.logRowsSinceCompaction;
    this.compacting = this.options.persistence
      .compact(this.sheetId)
      .then(({ title }) => {
        this.options.metrics.compactions++;
        this.followStoredTitle(title);
        // Rows appended while the compaction ran may or may not be folded in; counting them again
        // only brings the next compaction forward.
        this.logRowsSinceCompaction = Math.max(0, this.logRowsSinceCompaction - rowsBefore);
      })
      .catch((error: unknown) => {
        this.options.metrics.compactionFailures++;
        this.options.logger.error({ err: error, sheetId: this.sheetId }, 'could not compact the update log; it stays as it is');
      })
      .finally(() => {
        this.compacting = null;
        if (this.compactAgain) {
          this.compactAgain = false;
          this.requestCompaction();
        }
      });
  }

  /**
   * The title block belongs to the REST API (`sheets.title`); the document's `meta.title` follows
   * it, by a server edit whenever a load or a compaction finds the two apart.
   */
  private followStoredTitle(title: string | null): void {
    if (title === null || this.destroyed || this.gone || sheetMeta(this.doc).get('title') === title) return;
    this.applyServerEdit((doc) => sheetMeta(doc).set('title', title), null).catch((error: unknown) =>
      this.options.logger.error({ err: error, sheetId: this.sheetId }, 'could not bring the title in line with the sheet'),
    );
  }

  private clearIdleTimer(): void {
    if (this.idleTimer !== null) clearTimeout(this.idleTimer);
    this.idleTimer = null;
  }

  private applyAwareness(connection: Connection, received: Uint8Array): void {
    const stamped = stampAwarenessEntries(decodeAwarenessUpdate(received), connection.identity.user, (clientId) =>
      this.mayClaim(connection, clientId),
    );
    if (stamped.length === 0) return;
    awarenessProtocol.applyAwarenessUpdate(this.awareness, encodeAwarenessUpdate(stamped), connection);
  }

  /**
   * A connection may speak for a client id nobody holds (up to a few), or take one over from
   * another connection of the same user (a reconnect before the old socket was seen to close).
   */
  private mayClaim(connection: Connection, clientId: number): boolean {
    const owner = this.owners.get(clientId);
    if (owner === connection) return true;
    if (owner !== undefined && owner.identity.user.id !== connection.identity.user.id) return false;
    return connection.clientIds.size < MAX_CLIENT_IDS_PER_CONNECTION;
  }

  private readonly relayUpdate = (update: Uint8Array, origin: unknown): void => {
    const message = updateMessage(update);
    for (const connection of this.connections.values()) {
      if (connection !== origin) this.send(connection, message);
    }
  };

  private readonly relayAwareness = (
    { added, updated, removed }: { added: number[]; updated: number[]; removed: number[] },
    origin: unknown,
  ): void => {
    const from = this.connectionOf(origin);
    if (from !== undefined) {
      for (const clientId of [...added, ...updated]) {
        const previous = this.owners.get(clientId);
        if (previous !== undefined && previous !== from) previous.clientIds.delete(clientId);
        this.owners.set(clientId, from);
        from.clientIds.add(clientId);
      }
    }
    for (const clientId of removed) {
      this.owners.get(clientId)?.clientIds.delete(clientId);
      this.owners.delete(clientId);
    }
    const changed = [...added, ...updated, ...removed];
    if (changed.length === 0) return;
    // Sent to everyone, the sender too: a quiet client counts its own echoes as signs of life.
    const message = awarenessMessage(this.awareness, changed);
    for (const connection of this.connections.values()) this.send(connection, message);
  };

  /** The connection an event came from, when its origin is one of this room's connections. */
  private connectionOf(origin: unknown): Connection | undefined {
    if (typeof origin !== 'object' || origin === null || !('socket' in origin)) return undefined;
    const connection = this.connections.get(origin.socket as WebSocket);
    return connection === origin ? connection : undefined;
  }

  private removeConnection(connection: Connection): void {
    if (!this.connections.delete(connection.socket)) return;
    const clientIds = [...connection.clientIds];
    if (clientIds.length > 0 && !this.destroyed) awarenessProtocol.removeAwarenessStates(this.awareness, clientIds, null);
  }

  private send(connection: Connection, message: Uint8Array): void {
    if (connection.socket.readyState !== WebSocket.OPEN) return;
    connection.socket.send(message, (error) => {
      if (error) connection.socket.terminate();
    });
  }
}

function rawDataBytes(data: WebSocket.RawData): Uint8Array {
  if (Array.isArray(data)) return new Uint8Array(Buffer.concat(data));
  if (data instanceof ArrayBuffer) return new Uint8Array(data);
  return data;
}
