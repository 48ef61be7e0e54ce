/**
 * The co-editing server: accepts authorized websockets into per-sheet rooms, loads a room on the
 * first connection and unloads it (after storing and compacting) when the last one leaves.
 * Authorization happens before a socket gets here; see attachUpgradeHandlers.ts.
 */
import type { IncomingMessage } from 'node:http';
import type { Duplex } from 'node:stream';
import WebSocket, { WebSocketServer } from 'ws';
import type * as Y from 'yjs';
import { COLLAB_CLOSE, COLLAB_CLOSE_REASON, type CollabCloseCode } from './closeCodes';
import { createCollabMetrics, type CollabLogger, type CollabMetrics } from './collabMetrics';
import { SheetGoneError, type RoomPersistence } from './roomPersistence';
import { DEFAULT_UNSAVED_BOUNDS, SheetRoom, type ConnectionIdentity, type RoomOptions, type UnsavedBounds } from './SheetRoom';
import { sheetContentFromDoc, type SheetFileContent } from './sheetDoc';

export interface CollabServerOptions {
  persistence: RoomPersistence;
  logger: CollabLogger;
  /** Compact after this many logged updates (default 200). */
  compactAfterUpdates?: number;
  /** Compact after this long without a stored update (default 10 s). */
  compactAfterIdleMs?: number;
  /** Longest wait between two attempts to store an update (default 5 s). */
  maxStoreRetryDelayMs?: number;
  /** Bounds on edits waiting in memory to be stored, per room (DEFAULT_UNSAVED_BOUNDS). */
  unsaved?: Partial<UnsavedBounds>;
  /** Largest websocket message accepted (default 16 MiB: a sheet with inline point rows is big). */
  maxMessageBytes?: number;
  /**
   * How often every socket is pinged (default 30 s). One that has not answered the previous ping
   * is cut, so a client that vanished without closing does not keep its room loaded.
   */
  pingIntervalMs?: number;
}

interface RoomSlot {
  /** Connections that joined or are waiting for the room to load. */
  users: number;
  room: Promise<SheetRoom>;
}

export class CollabServer {
  readonly metrics: CollabMetrics = createCollabMetrics();
  private readonly rooms = new Map<string, RoomSlot>();
  private readonly unloading = new Set<Promise<void>>();
  private readonly websockets: WebSocketServer;
  private readonly roomOptions: RoomOptions;
  private closing = false;
  private readonly unanswered = new WeakSet<WebSocket>();
  private pinger: NodeJS.Timeout;

  constructor(private readonly options: CollabServerOptions) {
    this.websockets = new WebSocketServer({ noServer: true, maxPayload: options.maxMessageBytes ?? 16 * 1024 * 1024 });
    this.pinger = setInterval(() => this.pingAll(), options.pingIntervalMs ?? 30_000);
    this.pinger.unref();
    this.roomOptions = {
      persistence: options.persistence,
      logger: options.logger,
      metrics: this.metrics,
      compactAfterUpdates: options.compactAfterUpdates ?? 200,
      compactAfterIdleMs: options.compactAfterIdleMs ?? 10_000,
      maxStoreRetryDelayMs: options.maxStoreRetryDelayMs ?? 5_000,
      unsaved: { ...DEFAULT_UNSAVED_BOUNDS, ...options.unsaved },
    };
  }

  /** Change the compaction, retry and ping settings, for open rooms too (tests and benchmarks tune these). */
  configure(
    settings: Partial<Pick<RoomOptions, 'compactAfterUpdates' | 'compactAfterIdleMs' | 'maxStoreRetryDelayMs'>> & {
      pingIntervalMs?: number;
      unsaved?: Partial<UnsavedBounds>;
    },
  ): void {
    const { pingIntervalMs, unsaved, ...room } = settings;
    Object.assign(this.roomOptions, room);
    if (unsaved !== undefined) Object.assign(this.roomOptions.unsaved, unsaved);
    if (pingIntervalMs !== undefined && !this.closing) {
      clearInterval(this.pinger);
      this.pinger = setInterval(() => this.pingAll(), pingIntervalMs);
      this.pinger.unref();
    }
  }

  /** True once close() was called: new connections are turned away with `shuttingDown`. */
  get isClosing(): boolean {
    return this.closing;
  }

  /** Sheets with a room in memory. */
  openSheetIds(): string[] {
    return [...this.rooms.keys()];
  }

  /** The room of a sheet, when it is loaded (for tests and the live content below). */
  async loadedRoom(sheetId: string): Promise<SheetRoom | undefined> {
    const slot = this.rooms.get(sheetId);
    return slot === undefined ? undefined : slot.room.catch(() => undefined);
  }

  /**
   * The sheet's content as the people editing it see it now, or null when no room is open (the
   * stored `sheets.content` is then current). Lets REST reads skip the compaction delay.
   */
  async liveContent(sheetId: string): Promise<SheetFileContent | null> {
    const room = await this.loadedRoom(sheetId);
    return room === undefined ? null : sheetContentFromDoc(room.doc);
  }

  /**
   * Change a sheet's live document from the server (a REST request that edits the sheet, say):
   * opens the room if nobody has it open, runs `edit` as a server edit (stored, then relayed to
   * everyone connected), and lets the room unload again. Throws SheetGoneError for a missing sheet.
   *
   * @example collab.editSheet(sheetId, (doc) => insertCell(doc, 0, cell), userId)
   */
  async editSheet(sheetId: string, edit: (doc: Y.Doc) => void, userId: string | null): Promise<void> {
    if (this.closing) throw new Error('editSheet: the co-editing server is shutting down');
    const slot = this.slotFor(sheetId);
    slot.users++;
    try {
      const room = await slot.room;
      await room.applyServerEdit(edit, userId);
    } finally {
      this.leave(sheetId, slot);
    }
  }

  /**
   * Tell an open room that its sheet went into check (`locked`) or came out of it: while locked,
   * every connection is read-only. Resolves once edits queued before the lock are stored. A sheet
   * without an open room needs nothing: a room reads the status when it loads, and the log
   * refuses edits for a sheet in check in any case.
   */
  async setSheetLocked(sheetId: string, locked: boolean): Promise<void> {
    const room = await this.loadedRoom(sheetId);
    if (room !== undefined) await room.setLocked(locked);
  }

  /** Complete the websocket handshake for an authorized request and put the socket in the sheet's room. */
  accept(request: IncomingMessage, socket: Duplex, head: Buffer, sheetId: string, identity: ConnectionIdentity): void {
    this.websockets.handleUpgrade(request, socket, head, (websocket) => {
      if (this.closing) {
        this.closeWith(websocket, COLLAB_CLOSE.shuttingDown);
        return;
      }
      void this.join(websocket, sheetId, identity);
    });
  }

  /** Complete the handshake only to close at once with `code`, so the client knows not to retry. */
  refuse(request: IncomingMessage, socket: Duplex, head: Buffer, code: CollabCloseCode): void {
    this.metrics.connectionsRefused++;
    this.websockets.handleUpgrade(request, socket, head, (websocket) => this.closeWith(websocket, code));
  }

  /**
   * Close every connection with `shuttingDown`, store what is queued and compact every open
   * sheet, then free the rooms. Waits at most `timeoutMs` for the database.
   */
  async close(timeoutMs = 10_000): Promise<void> {
    this.closing = true;
    clearInterval(this.pinger);
    for (const slot of this.rooms.values()) {
      void slot.room.then((room) => room.closeConnections(COLLAB_CLOSE.shuttingDown)).catch(() => undefined);
    }
    const settled = (async () => {
      await Promise.allSettled([...this.rooms.keys()].map((sheetId) => this.unloadWhenIdle(sheetId, true)));
      await Promise.allSettled([...this.unloading]);
    })();
    let timer: NodeJS.Timeout | undefined;
    const timedOut = new Promise<'timeout'>((resolve) => {
      timer = setTimeout(() => resolve('timeout'), timeoutMs);
    });
    const outcome = await Promise.race([settled.then(() => 'done' as const), timedOut]);
    clearTimeout(timer);
    if (outcome === 'timeout') {
      this.options.logger.error(
        { sheets: this.openSheetIds() },
        'shutdown: gave up waiting for the database; updates still queued were never relayed and clients resend them',
      );
    }
    for (const websocket of this.websockets.clients) websocket.terminate();
    this.websockets.close();
  }

  private async join(websocket: WebSocket, sheetId: string, identity: ConnectionIdentity): Promise<void> {
    // Messages that arrive while the room loads are kept and handled first, in order.
    const earlier: Uint8Array[] = [];
    const keep = (data: WebSocket.RawData): void => {
      earlier.push(Array.isArray(data) ? Buffer.concat(data) : new Uint8Array(data as ArrayBuffer));
    };
    websocket.on('message', keep);
    websocket.on('pong', () => this.unanswered.delete(websocket));
    websocket.on('error', (error) =>
      this.options.logger.warn({ err: error, sheetId, userId: identity.user.id }, 'collab socket error'),
    );
    const slot = this.slotFor(sheetId);
    slot.users++;
    let room: SheetRoom;
    try {
      room = await slot.room;
    } catch (error) {
      websocket.off('message', keep);
      this.leave(sheetId, slot);
      if (error instanceof SheetGoneError) {
        this.closeWith(websocket, COLLAB_CLOSE.notFound);
      } else {
        this.options.logger.error({ err: error, sheetId }, 'could not load a sheet for co-editing');
        this.closeWith(websocket, COLLAB_CLOSE.unavailable);
      }
      return;
    }
    websocket.off('message', keep);
    if (websocket.readyState !== WebSocket.OPEN) {
      this.leave(sheetId, slot);
      return;
    }
    websocket.on('close', () => this.leave(sheetId, slot));
    room.addConnection(websocket, identity, earlier);
    this.metrics.connectionsOpened++;
  }

  private pingAll(): void {
    for (const websocket of this.websockets.clients) {
      if (this.unanswered.has(websocket)) {
        websocket.terminate();
        continue;
      }
      this.unanswered.add(websocket);
      websocket.ping();
    }
  }

  private slotFor(sheetId: string): RoomSlot {
    const existing = this.rooms.get(sheetId);
    if (existing !== undefined) return existing;
    const slot: RoomSlot = { users: 0, room: SheetRoom.open(sheetId, this.roomOptions) };
    this.rooms.set(sheetId, slot);
    slot.room.then(
      () => this.metrics.roomsLoaded++,
      () => {
        // A failed load is forgotten, so the next connection tries again.
        if (this.rooms.get(sheetId) === slot) this.rooms.delete(sheetId);
      },
    );
    return slot;
  }

  private leave(sheetId: string, slot: RoomSlot): void {
    slot.users--;
    if (slot.users === 0 && this.rooms.get(sheetId) === slot) {
      const unload = this.unloadWhenIdle(sheetId).finally(() => this.unloading.delete(unload));
      this.unloading.add(unload);
    }
  }

  /**
   * Store what is queued, compact, and free the room once nobody is in it. Someone who joins
   * meanwhile keeps the room open; the check and the removal happen with no await between them.
   */
  private async unloadWhenIdle(sheetId: string, force = false): Promise<void> {
    const slot = this.rooms.get(sheetId);
    if (slot === undefined) return;
    let room: SheetRoom;
    try {
      room = await slot.room;
    } catch {
      return;
    }
    for (;;) {
      await room.flush();
      await room.compactNow();
      if (this.rooms.get(sheetId) !== slot) return;
      if (slot.users > 0 && !force) return;
      if (room.busy) continue;
      this.rooms.delete(sheetId);
      room.destroy();
      this.metrics.roomsUnloaded++;
      return;
    }
  }

  private closeWith(websocket: WebSocket, code: CollabCloseCode): void {
    websocket.close(code, COLLAB_CLOSE_REASON[code]);
  }
}
