/**
 * The durability rule of a room, in one place: updates are appended to the log in arrival order,
 * and each is handed on (applied, hence relayed) only once the INSERT holding it has committed.
 * A failed append is logged and retried with exponential backoff, forever; everything queued
 * behind it waits too, so nothing unsaved ever leaves the server.
 */
import type { CollabLogger, CollabMetrics } from './collabMetrics';
import { SheetGoneError, SheetLockedError, type LoggedUpdate, type RoomPersistence } from './roomPersistence';

/** Updates stored per INSERT at most, so one statement stays small under a burst. */
const MAX_BATCH = 200;

export interface StoreThenApplyOptions {
  persistence: RoomPersistence;
  logger: CollabLogger;
  metrics: CollabMetrics;
  /** Longest wait between two attempts to store (read at each retry, so it can be tuned live). */
  maxStoreRetryDelayMs: number;
}

/** What waits in memory, unsaved: how many updates, how many bytes, and since when the store fails. */
export interface Backlog {
  updates: number;
  bytes: number;
  /** When the first failed attempt to store the oldest waiting batch was made; null while storing works. */
  failingSince: number | null;
}

export class StoreThenApplyQueue<Entry extends LoggedUpdate> {
  private readonly queue: Entry[] = [];
  private draining: Promise<void> | null = null;
  private gone = false;
  private waitingUpdates = 0;
  private waitingBytes = 0;
  private failingSince: number | null = null;

  /**
   * @param applyStored receives each stored batch, in order
   * @param onGone runs once if the sheet turns out to be deleted; the queue then drops everything
   * @param onRefused receives a batch the log refused because the sheet is in check: it was
   *   neither stored nor applied, so nobody else ever saw it
   * @param onBacklog hears after every failed attempt to store, and once everything waiting has
   *   been stored (with an empty backlog)
   */
  constructor(
    private readonly sheetId: string,
    private readonly options: StoreThenApplyOptions,
    private readonly applyStored: (batch: readonly Entry[]) => void,
    private readonly onGone: () => void,
    private readonly onRefused: (batch: readonly Entry[]) => void = () => undefined,
    private readonly onBacklog: (backlog: Backlog) => void = () => undefined,
  ) {}

  /** True while updates wait to be stored. */
  get pending(): boolean {
    return this.queue.length > 0 || this.draining !== null;
  }

  /** Updates received and not yet stored (queued or being stored). */
  get backlog(): Backlog {
    return { updates: this.waitingUpdates, bytes: this.waitingBytes, failingSince: this.failingSince };
  }

  push(entry: Entry): void {
    if (this.gone) return;
    this.queue.push(entry);
    this.waitingUpdates++;
    this.waitingBytes += entry.update.byteLength;
    this.startDraining();
  }

  /** Resolves once everything pushed so far is stored and handed on. */
  async flush(): Promise<void> {
    while (this.draining !== null) await this.draining;
  }

  private startDraining(): void {
    if (this.draining !== null || this.queue.length === 0) return;
    this.draining = this.drain().finally(() => {
      this.draining = null;
      // Anything pushed while the last batch was finishing.
      this.startDraining();
    });
  }

  private async drain(): Promise<void> {
    while (this.queue.length > 0 && !this.gone) {
      const batch = this.queue.splice(0, MAX_BATCH);
      try {
        await this.storeWithRetry(batch);
      } catch (error) {
        this.settled(batch);
        if (error instanceof SheetLockedError) {
          this.onRefused(batch);
          continue;
        }
        if (!(error instanceof SheetGoneError)) throw error;
        // Deleted while open: its edits have nowhere to go.
        this.gone = true;
        this.queue.length = 0;
        this.waitingUpdates = 0;
        this.waitingBytes = 0;
        this.onGone();
        return;
      }
      this.settled(batch);
      this.applyStored(batch);
    }
    if (this.queue.length === 0) this.onBacklog(this.backlog);
  }

  private settled(batch: readonly Entry[]): void {
    this.failingSince = null;
    this.waitingUpdates -= batch.length;
    for (const entry of batch) this.waitingBytes -= entry.update.byteLength;
  }

  private async storeWithRetry(batch: readonly Entry[]): Promise<void> {
    const updates = batch.map(({ update, userId }) => ({ update, userId }));
    for (let attempt = 1; ; attempt++) {
      try {
        await this.options.persistence.append(this.sheetId, updates);
        this.options.metrics.updatesStored += updates.length;
        if (attempt > 1) this.options.logger.info({ sheetId: this.sheetId, attempt }, 'stored the waiting updates');
        return;
      } catch (error) {
        if (error instanceof SheetGoneError || error instanceof SheetLockedError) throw error;
        this.options.metrics.storeFailures++;
        this.failingSince ??= Date.now();
        this.onBacklog(this.backlog);
        const delayMs = Math.min(this.options.maxStoreRetryDelayMs, 50 * 2 ** Math.min(attempt, 16));
        this.options.logger.error(
          { err: error, sheetId: this.sheetId, updates: updates.length, attempt, retryInMs: delayMs },
          'could not store updates in the log; they wait in memory and nothing after them is relayed',
        );
        await new Promise((resolve) => setTimeout(resolve, delayMs));
      }
    }
  }
}
